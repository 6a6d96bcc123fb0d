package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * --quiet silences the progress lines and nothing else: the same tables are written and the
 * summary line still comes.
 */
class QuietTest {

    @TempDir
    Path tmp;

    @Test
    void quietAnalysisPrintsNoProgressButTheSameResults() throws Exception {
        String scenario = Path.of("src", "test", "resources", "one-gene-switch.toml").toString();
        StringWriter loudErr = new StringWriter();
        StringWriter quietErr = new StringWriter();
        StringWriter quietOut = new StringWriter();
        assertEquals(0, FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(loudErr), "analyze",
                scenario, "--out", tmp.resolve("loud").toString()));
        assertEquals(0, FatefieldCommand.execute(new PrintWriter(quietOut), new PrintWriter(quietErr), "analyze",
                scenario, "--out", tmp.resolve("quiet").toString(), "--quiet"));
        assertTrue(loudErr.toString().contains("analyze: steady states"), loudErr.toString());
        assertEquals("", quietErr.toString());
        assertTrue(quietOut.toString().startsWith("Analysed one-gene-switch"), quietOut.toString());
        assertEquals(Files.readString(tmp.resolve("loud").resolve("steady-states.csv")),
                Files.readString(tmp.resolve("quiet").resolve("steady-states.csv")));
    }
}
