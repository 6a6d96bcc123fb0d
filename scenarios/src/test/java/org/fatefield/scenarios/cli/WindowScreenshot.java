package org.fatefield.scenarios.cli;

import java.awt.Rectangle;
import java.awt.Robot;
import java.awt.image.BufferedImage;
import java.io.File;
import java.nio.charset.StandardCharsets;
import javax.imageio.ImageIO;
import javax.swing.SwingUtilities;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioReader;
import org.fatefield.viz.live.TissueGui;
import org.fatefield.viz.live.TissueWindow;

/**
 * Opens the live window on a short demo in a real (X) display, steps it, and saves a screenshot
 * of the window taken from the screen (and one each coloured by commitment, by the first species
 * and by clone); prints the number of recorded rows. Run by the window
 * test in its own, non-headless JVM.
 */
public final class WindowScreenshot {

    private WindowScreenshot() {
    }

    public static void main(String[] args) throws Exception {
        String text = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = 24.0");
        Scenario scenario = ScenarioReader.parse("demo", "demo", text.getBytes(StandardCharsets.UTF_8));
        TissueWindow[] window = new TissueWindow[1];
        SwingUtilities.invokeAndWait(() -> {
            window[0] = ViewCommand.open(scenario, 1);
            window[0].setLocation(0, 0);
            window[0].setVisible(true);
        });
        for (int i = 0; i < 40; i++) {
            SwingUtilities.invokeAndWait(() -> window[0].advance(50));
        }
        SwingUtilities.invokeAndWait(() -> {
            var cells = window[0].gui().tissue().cells();
            window[0].inspect(cells.get(cells.size() / 2));
            window[0].advance(5);
        });
        Thread.sleep(1500);
        Rectangle[] bounds = new Rectangle[1];
        SwingUtilities.invokeAndWait(() -> bounds[0] = window[0].getBounds());
        BufferedImage shot = new Robot().createScreenCapture(bounds[0]);
        ImageIO.write(shot, "png", new File(args[0]));
        SwingUtilities.invokeAndWait(() -> {
            window[0].setColourMode(TissueGui.ColourMode.COMMITMENT);
        });
        Thread.sleep(1000);
        ImageIO.write(new Robot().createScreenCapture(bounds[0]), "png",
                new File(args[0].replace(".png", "-commitment.png")));
        for (TissueGui.ColourMode mode : new TissueGui.ColourMode[] {TissueGui.ColourMode.SPECIES,
            TissueGui.ColourMode.CLONE}) {
            SwingUtilities.invokeAndWait(() -> window[0].setColourMode(mode));
            Thread.sleep(700);
            ImageIO.write(new Robot().createScreenCapture(bounds[0]), "png",
                    new File(args[0].replace(".png", "-" + mode.name().toLowerCase(java.util.Locale.ROOT) + ".png")));
        }
        System.out.println("rows " + window[0].gui().tissue().series().rows().size());
        System.out.println("cells " + window[0].gui().tissue().cells().size());
        System.out.println("trace " + window[0].selectedTraceSamples());
        System.exit(0);
    }
}
