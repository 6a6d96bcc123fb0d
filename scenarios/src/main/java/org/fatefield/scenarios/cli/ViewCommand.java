package org.fatefield.scenarios.cli;

import java.awt.GraphicsEnvironment;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.lang.reflect.InvocationTargetException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import javax.swing.SwingUtilities;
import org.fatefield.engine.control.ControlCircuit;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.format.Overrides;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.format.ScenarioReader;
import org.fatefield.viz.live.TissueWindow;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/** {@code fatefield view}: watch a scenario's tissue live. */
@Command(name = "view", mixinStandardHelpOptions = true,
        description = {"Open a window that runs a scenario live: the tissue over its morphogen, fate proportions,"
                + " and every cell on the circuit's bifurcation branches. Colour cells by fate, by the first"
                + " species, by clone or by commitment (pale: fate only just entered). Click a cell to see its"
                + " state, its circuit trace back through its ancestors, and the circuit's landscape at its"
                + " local control parameter. Change settings (key = value; ...) and press Reset to run again."})
final class ViewCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "a scenario file, or a built-in name (demo)")
    private String scenario;

    @Mixin
    private SharedOptions.Seed seed;

    @Mixin
    private SharedOptions.Settings settings;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        // The scenario and its --set values are checked first, so a mistake is reported with or without a display.
        Scenario loaded = ScenarioArgument.loadOrReport(scenario, settings.overrides(), spec.commandLine().getErr());
        if (loaded == null) {
            return FatefieldCommand.INVALID_INPUT;
        }
        if (GraphicsEnvironment.isHeadless()) {
            spec.commandLine().getErr().println("view needs a display; on a cluster use: fatefield run SCENARIO --frames"
                    + " HOURS (PNG frames and an animated GIF)");
            return FatefieldCommand.INVALID_INPUT;
        }
        long runSeed = seed.orElse(loaded.seed());
        CountDownLatch closed = new CountDownLatch(1);
        try {
            SwingUtilities.invokeAndWait(() -> {
                TissueWindow window = open(loaded, runSeed);
                window.addWindowListener(new WindowAdapter() {
                    @Override
                    public void windowClosed(WindowEvent e) {
                        closed.countDown();
                    }
                });
                window.setVisible(true);
            });
            // The command lasts as long as the window: main exits when it returns.
            closed.await();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (InvocationTargetException e) {
            spec.commandLine().getErr().println("the live window could not be opened: " + e.getCause());
            return FatefieldCommand.OUTPUT_ERROR;
        }
        return 0;
    }

    /** A window for {@code loaded} (not yet visible); call on the event dispatch thread. */
    static TissueWindow open(Scenario loaded, long runSeed) {
        int threads = Runtime.getRuntime().availableProcessors();
        ControlCircuit circuit = ControlCircuit.of(loaded.tissue(), 60);
        // The slice slider names the plane shown, which it moves; the title only says the view is a slice.
        String slice = loaded.tissue().domain().threeD() ? " (3-D, shown as a slice through the depth)" : "";
        return new TissueWindow("Fatefield: " + loaded.name() + slice, settings -> new Tissue(variant(loaded, settings).tissue(),
                runSeed, threads), circuit == null ? List.of() : circuit.branches(),
                circuit == null ? "control" : circuit.parameter(), circuit == null ? null : circuit.landscape());
    }

    private static Scenario variant(Scenario base, String settings) {
        if (settings == null || settings.isBlank()) {
            return base;
        }
        Overrides variant = Overrides.none();
        for (String item : settings.split(";")) {
            if (item.isBlank()) {
                continue;
            }
            int equals = item.indexOf('=');
            if (equals < 0) {
                throw new IllegalArgumentException("write settings as key = value; key = value, got '" + item.trim() + "'");
            }
            variant = variant.with(item.substring(0, equals).trim(), Overrides.parseValue(item.substring(equals + 1)));
        }
        try {
            return ScenarioReader.parse(base.source(), base.name(), base.text().getBytes(StandardCharsets.UTF_8),
                    sourceFolder(base), variant);
        } catch (ScenarioException e) {
            throw new IllegalArgumentException(e.problems().get(0).keyPath() + ": " + e.problems().get(0).message(), e);
        }
    }

    /** The folder a scenario file's includes are found in; null for a built-in scenario. */
    private static Path sourceFolder(Scenario scenario) {
        return scenario.source().startsWith("builtin:") ? null : Path.of(scenario.source()).toAbsolutePath().getParent();
    }
}
