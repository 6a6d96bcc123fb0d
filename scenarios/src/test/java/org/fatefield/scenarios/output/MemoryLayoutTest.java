package org.fatefield.scenarios.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.format.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The population's memory order (how often it is reordered in space and relocated) is a
 * speed device only: the same scenario and seed give byte-identical tables whatever the
 * intervals, and every cell's position and state agree bit for bit. The scenario is the demo with every order-sensitive stage switched on: divisions,
 * deaths, adhesion, cell secretion and uptake, and inherited extrinsic noise.
 */
class MemoryLayoutTest {

    private static Scenario scenario() throws ScenarioException {
        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = 14.0")
                .replace("founders = 120", "founders = 150\nadhesion = 2.0")
                .replace("partition = \"binomial\"", "partition = \"binomial\"\ndeath_rate = 0.02")
                .replace("initial = 0.0", "initial = 0.0\nsecreted_by = \"photocyte\"\nsecretion_rate = 40.0\n"
                        + "uptake = 0.05")
                + "\n[[extrinsic]]\nparameter = \"degradation\"\ncv = 0.1\ninheritance = 0.8\n";
        return ScenarioReader.parse("layout-test.toml", "layout-test", demo.getBytes(StandardCharsets.UTF_8));
    }

    /** The run's tables, lineage included, as text: cells, time series, lineage. */
    private static String[] tables(Scenario scenario, int reorder, int relocate, int threads, Path dir)
            throws IOException {
        Files.createDirectories(dir);
        Tissue tissue = new Tissue(scenario.tissue(), 5, threads);
        tissue.setMemoryLayout(reorder, relocate);
        try (LineageFiles lineage = LineageFiles.start(dir, scenario.tissue().fates().fateNames())) {
            tissue.setLineageSink(lineage);
            tissue.start();
            tissue.runToEnd();
            tissue.finish();
        }
        StringWriter cells = new StringWriter();
        RunTables.writeCells(tissue, cells);
        StringWriter series = new StringWriter();
        RunTables.writeTimeSeries(tissue.series(), series);
        StringBuilder exact = new StringBuilder();
        for (Cell cell : tissue.cellsById()) {
            exact.append(cell.id()).append(' ').append(Double.doubleToLongBits(cell.x())).append(' ')
                    .append(Double.doubleToLongBits(cell.y())).append(' ')
                    .append(Arrays.toString(cell.state())).append('\n');
        }
        return new String[] {cells.toString(), series.toString(),
            Files.readString(dir.resolve(RunLayout.LINEAGE), StandardCharsets.UTF_8), exact.toString()};
    }

    @Test
    void tablesDoNotDependOnReorderOrRelocateIntervals(@TempDir Path dir) throws Exception {
        Scenario scenario = scenario();
        String[] reference = tables(scenario, 10, 100, 2, dir.resolve("a"));
        long divisions = reference[2].lines().filter(l -> l.matches("^\\d+,\\d*,\\d+,[^,]+,[0-9.]+,.*")).count();
        assertTrue(divisions > 100, "the test needs many divisions, got " + divisions);
        assertTrue(reference[2].contains(",,") && reference[2].lines().anyMatch(l -> !l.endsWith(",,1,1")),
                "lineage rows present");
        int[][] layouts = {{7, 100}, {1, 1}, {3, 13}, {1000, 1000}};
        for (int[] layout : layouts) {
            String[] other = tables(scenario, layout[0], layout[1], layout[0] == 1 ? 1 : 2,
                    dir.resolve("l" + layout[0] + "-" + layout[1]));
            String label = "reorder every " + layout[0] + ", relocate every " + layout[1];
            assertEquals(reference[0], other[0], "cells.csv with " + label);
            assertEquals(reference[1], other[1], "timeseries.csv with " + label);
            assertEquals(reference[2], other[2], "lineage.csv with " + label);
            assertEquals(reference[3], other[3], "every cell's position and state, bit for bit, with " + label);
        }
    }
}
