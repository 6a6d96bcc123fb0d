package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tomlj.Toml;

/**
 * Every file shipped under scenarios/examples works as its comments say: each scenario
 * validates and runs (cut to half an hour of simulated time with --set, so the million-cell
 * example stays quick), and the example sweep plans, runs and collects a table with one row per
 * run. Calibration examples are read by CalibrationExampleTest; their full runs are timed in the
 * README.
 */
class ExamplesTest {

    @TempDir
    Path tmp;

    @Test
    void everyExampleScenarioValidatesAndRuns() throws Exception {
        List<Path> scenarios;
        try (Stream<Path> walk = Files.walk(Path.of("examples"))) {
            scenarios = walk.filter(p -> p.toString().endsWith(".toml")).filter(ExamplesTest::isScenario).sorted()
                    .toList();
        }
        assertTrue(scenarios.size() >= 2, "example scenarios: " + scenarios);
        for (Path scenario : scenarios) {
            assertEquals(0, FatefieldCommandAccess.run("validate", scenario.toString()), scenario.toString());
            Path out = tmp.resolve(scenario.getFileName().toString());
            assertEquals(0, FatefieldCommandAccess.run("run", scenario.toString(), "--set", "run.duration=0.5",
                    "--set", "run.record_every=0.5", "--out", out.toString(), "--quiet"), scenario.toString());
            assertTrue(Files.exists(out.resolve("run.json")), scenario + " finished");
        }
    }

    @Test
    void theExampleSweepPlansRunsAndCollects() throws Exception {
        Path sweep = Path.of("examples", "sweeps", "glim-decay-sweep.toml");
        assertEquals(0, FatefieldCommandAccess.run("validate", sweep.toString(),
                Path.of("examples", "calibration", "glassfin-calibration.toml").toString(),
                Path.of("examples", "calibration", "partition-choice.toml").toString()), "validate reads sweep and"
                        + " calibration files");
        Path out = tmp.resolve("sweep");
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", sweep.toString(), "--out", out.toString()));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "run", out.toString(), "--workers", "2"));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "collect", out.toString()));
        List<String> rows = Files.readAllLines(out.resolve("runs.csv"));
        assertEquals("run_id,point,replicate,seed,morphogen.decay,status,metric,fate,value", rows.get(0));
        assertEquals(3 * 2, rows.stream().skip(1).map(r -> r.substring(0, r.indexOf(','))).distinct().count(),
                "rows of every run (3 decay rates x 2 replicates)");
        assertTrue(rows.stream().skip(1).allMatch(r -> r.contains(",complete,")), "every run complete");
    }

    private static boolean isScenario(Path p) {
        try {
            return Toml.parse(Files.readString(p)).contains("tissue");
        } catch (java.io.IOException e) {
            return false;
        }
    }
}
