package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportCommandTest {

    @TempDir
    Path tmp;

    @Test
    void reportEmbedsEveryFigureAndTheTables() throws Exception {
        Path scenario = tmp.resolve("short.toml");
        Files.writeString(scenario, new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = 12.0"));
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
}
