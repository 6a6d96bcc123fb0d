package org.fatefield.scenarios.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * The worked examples the README runs read cleanly, with the settings the README describes (its
 * runs themselves are measured by hand and reported in the README, not repeated here).
 */
class CalibrationExampleTest {

    @Test
    void theShippedExampleReads() throws Exception {
        CalibrationDefinition d = CalibrationDefinition.read(Path.of("examples", "calibration",
                "glassfin-calibration.toml"));
        assertEquals(1, d.models().size());
        assertEquals(2, d.models().get(0).parameters().size());
        assertEquals(3, d.data().observations().size());
        assertEquals(80, d.settings().particles());
    }

    @Test
    void theShippedModelChoiceExampleReads() throws Exception {
        CalibrationDefinition d = CalibrationDefinition.read(Path.of("examples", "calibration", "partition-choice.toml"));
        assertEquals(2, d.models().size());
        assertEquals("binomial shares", d.models().get(0).name());
        assertEquals("equal shares", d.models().get(1).name());
        assertEquals(2, d.data().observations().size());
    }
}
