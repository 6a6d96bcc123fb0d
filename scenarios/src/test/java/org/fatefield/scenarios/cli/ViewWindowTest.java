package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.fatefield.viz.palette.FatePalette;
import org.junit.jupiter.api.Test;

/**
 * The live window in a real X display (Xvfb in CI): opened on the demo, stepped, photographed
 * from the screen. The screenshot must not be blank, the canvas must show the fate colours, and
 * the charts must have data. The screenshot is kept as target/view-screenshot.png. Skipped,
 * saying why, without a display; never skipped when FATEFIELD_REQUIRE_DISPLAY=1 (as in CI).
 */
class ViewWindowTest {

    @Test
    void windowShowsTheTissueAndItsCharts() throws Exception {
        RequiredDisplay.check("ViewWindowTest");
        Path shot = Path.of("target", "view-screenshot.png").toAbsolutePath();
        Files.createDirectories(shot.getParent());
        Process process = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), WindowScreenshot.class.getName(), shot.toString())
                .redirectErrorStream(true).start();
        assertTrue(process.waitFor(180, TimeUnit.SECONDS), "the window run finished");
        String out = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(0, process.exitValue(), out);
        BufferedImage image = ImageIO.read(shot.toFile());
        Set<Integer> colours = new HashSet<>();
        int photocyte = 0;
        int shieldcyte = 0;
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                int rgb = image.getRGB(x, y) & 0xFFFFFF;
                colours.add(rgb);
                photocyte += rgb == (FatePalette.fate(0, 3).getRGB() & 0xFFFFFF) ? 1 : 0;
                shieldcyte += rgb == (FatePalette.fate(1, 3).getRGB() & 0xFFFFFF) ? 1 : 0;
            }
        }
        assertTrue(colours.size() > 200, "not blank: " + colours.size() + " colours");
        assertTrue(photocyte > 500 && shieldcyte > 500, "fate colours on the canvas: " + photocyte + ", " + shieldcyte);
        int rows = Integer.parseInt(out.lines().filter(l -> l.startsWith("rows ")).findFirst().orElseThrow()
                .substring(5).trim());
        assertTrue(rows > 10, "the fate chart has data: " + rows + " rows");
        int trace = Integer.parseInt(out.lines().filter(l -> l.startsWith("trace ")).findFirst().orElseThrow()
                .substring(6).trim());
        // 2005 steps were sampled; the clicked cell inherits its ancestors' history, so its trace is full.
        assertEquals(400, trace, "the clicked cell's trace runs back through its ancestors");
    }
}
