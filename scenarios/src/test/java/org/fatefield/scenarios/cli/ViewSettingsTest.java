package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/**
 * {@code view} takes {@code --set} as run does, and checks the scenario with its settings before
 * it looks for a display: a wrong value is reported the same way with or without one, and no
 * window opens.
 */
class ViewSettingsTest {

    @Test
    void aWrongSettingIsReportedBeforeAnyWindow() {
        StringWriter err = new StringWriter();
        assertEquals(FatefieldCommand.INVALID_INPUT, FatefieldCommand.execute(new PrintWriter(new StringWriter()),
                new PrintWriter(err), "view", "demo", "--set", "tissue.depth=40"));
        assertTrue(err.toString().contains("tissue.depth") && err.toString().contains("use shape = \"box\" or \"slab\""),
                err.toString());
        StringWriter malformed = new StringWriter();
        // A malformed --set is a usage error (exit code 2), as on run.
        assertEquals(2, FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(malformed),
                "view", "demo", "--set", "tissue.depth"));
        assertTrue(malformed.toString().contains("--set takes KEY=VALUE"), malformed.toString());
    }
}
