package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.hipparchus.stat.descriptive.DescriptiveStatistics;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportCommandTest {

    @TempDir
    Path tmp;

    @Test
    void reportEmbedsEveryFigureAndTheTables() throws Exception {
        Path scenario = ShortDemo.write(tmp, "12.0");
        Path run = tmp.resolve("run");
        PrintWriter quiet = new PrintWriter(new StringWriter());
        assertEquals(0, FatefieldCommand.execute(quiet, quiet, "run", scenario.toString(), "--out", run.toString(),
                "--quiet", "--frames", "3"));
        assertTrue(Files.size(run.resolve("tissue.gif")) > 0);
        assertTrue(Files.exists(run.resolve("frames").resolve("frame-00000000.png")));
        assertEquals(0, FatefieldCommand.execute(quiet, quiet, "report", run.toString()));
        String html = Files.readString(run.resolve("report.html"));
        assertTrue(html.startsWith("<!DOCTYPE html>"));
        assertTrue(html.contains("not for clinical"));
        assertTrue(html.contains("photocyte") && html.contains("SHA-256"));
        Matcher images = Pattern.compile("src=\"data:image/(png|gif);base64,([A-Za-z0-9+/=]+)\"").matcher(html);
        int count = 0;
        while (images.find()) {
            byte[] bytes = Base64.getDecoder().decode(images.group(2));
            assertTrue(ImageIO.read(new ByteArrayInputStream(bytes)) != null, "image " + count + " decodes");
            count++;
        }
        assertEquals(6, count, "proportions, tissue, animation, profile, bifurcation, landscape");
        assertTrue(!html.contains("http://") && !html.contains("https://"), "the page needs no network");
    }

    @Test
    void replicateSetReportGivesThePositionalErrorAndEachTissuesReport() throws Exception {
        Path scenario = ShortDemo.write(tmp, "10.0");
        Path set = tmp.resolve("set");
        PrintWriter quiet = new PrintWriter(new StringWriter());
        assertEquals(0, FatefieldCommand.execute(quiet, quiet, "replicates", scenario.toString(), "--runs", "3",
                "--out", set.toString()));
        assertEquals(0, FatefieldCommand.execute(quiet, quiet, "report", set.toString()));
        String html = Files.readString(set.resolve("report.html"));
        assertTrue(html.contains("not for clinical") && html.contains("Positional error"));
        Matcher images = Pattern.compile("src=\"data:image/png;base64,").matcher(html);
        int count = 0;
        while (images.find()) {
            count++;
        }
        assertEquals(3, count, "one replicate profile per fate");
        for (int seed = 1; seed <= 3; seed++) {
            assertTrue(html.contains("href=\"seed-" + seed + "/report.html\""));
            assertTrue(Files.exists(set.resolve("seed-" + seed).resolve("report.html")));
        }
        // The positional error shown is the sample SD of the progenitor boundary across the
        // tissues, recomputed here from replicates.csv with Hipparchus as the reference.
        DescriptiveStatistics sd = new DescriptiveStatistics();
        for (String line : Files.readAllLines(set.resolve("replicates.csv"))) {
            if (line.matches("\\d+,boundary_um,progenitor,.+")) {
                sd.addValue(Double.parseDouble(line.split(",")[3]));
            }
        }
        assertEquals(3, sd.getN(), "one progenitor boundary per tissue in the long replicates.csv");
        String expected = String.format(Locale.ROOT, "<td>progenitor</td><td>3</td><td>%.1f</td><td>%.1f</td>",
                sd.getMean(), sd.getStandardDeviation());
        assertTrue(html.contains(expected), "table row " + expected);
    }
}
