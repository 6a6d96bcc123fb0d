package org.fatefield.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.fatefield.scenarios.format.ScenarioException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A sweep's own design matrix: every CSV row becomes one point with exactly its values (in the
 * header's key order) and the replicates asked for, and a cell that is not a number is reported
 * with its file, line, column and key.
 */
class TableDesignTest {

    @TempDir
    Path tmp;

    @Test
    void everyRowIsOnePointWithItsValues() throws Exception {
        Files.writeString(tmp.resolve("design.csv"), "morphogen.decay,coupling[1].gain\n0.2,1.5\n0.3,1.8\n0.25,2.0\n");
        Path file = tmp.resolve("sweep.toml");
        Files.writeString(file, "[sweep]\nscenario = \"demo\"\ndesign = \"table\"\ntable = \"design.csv\"\n"
                + "replicates = 2\n");
        SweepDefinition sweep = SweepDefinition.read(file);
        Manifest manifest = Manifest.plan(sweep);
        assertEquals(java.util.List.of("morphogen.decay", "coupling[1].gain"), manifest.keys());
        assertEquals(6, manifest.runs().size());
        assertArrayEquals(new double[] {0.3, 1.8}, manifest.runs().get(2).values(), 0.0);
        assertArrayEquals(new double[] {0.25, 2.0}, manifest.runs().get(5).values(), 0.0);
    }

    @Test
    void aBadCellIsNamedByLineColumnAndKey() throws Exception {
        Files.writeString(tmp.resolve("design.csv"), "morphogen.decay,coupling[1].gain\n0.2,1.5\n0.3,lots\n");
        Path file = tmp.resolve("sweep.toml");
        Files.writeString(file, "[sweep]\nscenario = \"demo\"\ndesign = \"table\"\ntable = \"design.csv\"\n");
        ScenarioException e = assertThrows(ScenarioException.class, () -> SweepDefinition.read(file));
        assertTrue(e.getMessage().contains("design.csv:3:2: coupling[1].gain = lots: must be a finite number"),
                e.getMessage());
    }
}
