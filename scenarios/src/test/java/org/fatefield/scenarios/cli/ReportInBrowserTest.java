package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.io.File;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Opens a generated report in a real headless browser (Chromium) and checks that every embedded
 * image decoded: the page's own script writes "loaded/total" into {@code data-images-loaded} once
 * the load event fires, and the browser's serialised DOM is read back; no console message may be
 * logged; and a screenshot of the drawn page is kept at {@code target/report-screenshot.png}. Skipped when no Chromium
 * is installed, unless {@code FATEFIELD_REQUIRE_BROWSER=1} (set by {@code .ci/run}) makes a
 * missing browser a failure.
 */
class ReportInBrowserTest {

    @TempDir
    Path tmp;

    @Test
    void everyEmbeddedImageLoadsInChromium() throws Exception {
        String browser = findBrowser();
        boolean required = "1".equals(System.getenv("FATEFIELD_REQUIRE_BROWSER"));
        if (required) {
            assertTrue(browser != null, "FATEFIELD_REQUIRE_BROWSER=1 but no chromium on PATH");
        }
        assumeTrue(browser != null, "no chromium on PATH; report browser test skipped");

        Path scenario = ShortDemo.write(tmp, "8.0");
        Path run = tmp.resolve("run");
        PrintWriter quiet = new PrintWriter(new StringWriter());
        assertEquals(0, FatefieldCommand.execute(quiet, quiet, "run", scenario.toString(), "--out", run.toString(),
                "--quiet", "--frames", "4"));
        assertEquals(0, FatefieldCommand.execute(quiet, quiet, "report", run.toString()));

        Path profile = Files.createDirectories(tmp.resolve("browser-profile"));
        String page = run.resolve("report.html").toUri().toString();
        Path log = tmp.resolve("browser.log");
        Process process = new ProcessBuilder(List.of(browser, "--headless", "--no-sandbox", "--disable-gpu",
                "--user-data-dir=" + profile, "--enable-logging=stderr", "--v=0", "--virtual-time-budget=5000",
                "--dump-dom", page))
                .redirectError(log.toFile())
                .start();
        String dom = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(process.waitFor(120, TimeUnit.SECONDS), "browser finished within 120 s");
        // With --enable-logging the browser copies every console message to stderr as ":CONSOLE" lines.
        List<String> console = Files.readAllLines(log).stream().filter(l -> l.contains(":CONSOLE")).toList();
        assertEquals(List.of(), console, "no console messages while the report loads");
        Matcher loaded = Pattern.compile("data-images-loaded=\"(\\d+)/(\\d+)\"").matcher(dom);
        assertTrue(loaded.find(), "the page's load script ran; browser log in " + tmp.resolve("browser.log"));
        assertEquals("6", loaded.group(2), "proportions, tissue, animation, profile, bifurcation, landscape");
        assertEquals(loaded.group(2), loaded.group(1), "every embedded image decoded in the browser");

        // A screenshot of the page as the browser draws it, kept as a test artifact.
        Path shot = Path.of("target", "report-screenshot.png").toAbsolutePath();
        Files.deleteIfExists(shot);
        Process screenshot = new ProcessBuilder(List.of(browser, "--headless", "--no-sandbox", "--disable-gpu",
                "--user-data-dir=" + Files.createDirectories(tmp.resolve("browser-profile-2")), "--hide-scrollbars",
                "--window-size=1200,2400", "--virtual-time-budget=5000", "--screenshot=" + shot, page))
                .redirectErrorStream(true).redirectOutput(tmp.resolve("screenshot.log").toFile())
                .start();
        assertTrue(screenshot.waitFor(120, TimeUnit.SECONDS), "screenshot finished within 120 s");
        BufferedImage image = ImageIO.read(shot.toFile());
        assertTrue(image != null && image.getWidth() == 1200, "a 1200 px wide screenshot at " + shot);
        Set<Integer> colours = new HashSet<>();
        for (int y = 0; y < image.getHeight(); y += 4) {
            for (int x = 0; x < image.getWidth(); x += 4) {
                colours.add(image.getRGB(x, y));
            }
        }
        assertTrue(colours.size() > 200, "the drawn page is not blank: " + colours.size() + " colours");
    }

    private static String findBrowser() {
        for (String name : List.of("chromium", "chromium-browser", "google-chrome")) {
            for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
                File candidate = new File(dir, name);
                if (candidate.canExecute()) {
                    return candidate.getPath();
                }
            }
        }
        return null;
    }
}
