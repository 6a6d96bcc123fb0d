package org.fatefield.scenarios.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.metrics.FateProfile;
import org.fatefield.engine.metrics.MixedZone;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioReader;
import org.junit.jupiter.api.Test;

/**
 * Multi-rate stepping: mechanics on its own, longer step (set from the repulsion time scale)
 * against mechanics at every step, on the demo with slower repulsion (4/h) and a finer circuit
 * step (0.005 h), where the automatic mechanics step is 5 steps (4 × 0.025 = 0.1). The
 * population is the same exactly (division does not depend on mechanics); the relaxed packing
 * and the fate pattern agree within the tolerances stated at each check, over two seeds.
 */
class MultiRateMechanicsTest {

    private static final double CELL_RADIUS = 5.0;

    private static Tissue run(String mechanicsStep, long seed) throws Exception {
        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("step = 0.01 ", "step = 0.005\nmechanics_step = " + mechanicsStep + " ")
                .replace("repulsion = 20.0", "repulsion = 4.0");
        Scenario scenario = ScenarioReader.parse("multi-rate.toml", "multi-rate", demo.getBytes(StandardCharsets.UTF_8));
        Tissue tissue = new Tissue(scenario.tissue(), seed, 2);
        tissue.start();
        tissue.runToEnd();
        tissue.finish();
        return tissue;
    }

    /** Mean overlap (µm) of touching neighbours and mean distance (µm) to the nearest neighbour. */
    private static double[] packing(List<Cell> cells) {
        double overlap = 0;
        long contacts = 0;
        double nearest = 0;
        for (Cell a : cells) {
            double best = Double.POSITIVE_INFINITY;
            for (Cell b : cells) {
                if (a == b) {
                    continue;
                }
                double d = Math.hypot(a.x() - b.x(), a.y() - b.y());
                best = Math.min(best, d);
                double reach = a.radius(CELL_RADIUS) + b.radius(CELL_RADIUS);
                if (d < reach) {
                    overlap += reach - d;
                    contacts++;
                }
            }
            nearest += best;
        }
        return new double[] {overlap / contacts, nearest / cells.size()};
    }

    @Test
    void theAutomaticMechanicsStepKeepsThePackingAndThePattern() throws Exception {
        for (long seed : new long[] {1, 2}) {
            Tissue every = run("0.005", seed);
            Tissue multi = run("0", seed);
            assertEquals(every.cells().size(), multi.cells().size(), "the same divisions, seed " + seed);
            double[] a = packing(every.cells());
            double[] b = packing(multi.cells());
            // Explicit Euler at rate x step = 0.1 relaxes 5% slower per unit time than at 0.02
            // (ln 0.9 / 0.1 against ln 0.98 / 0.02); growth holds the packing near a steady
            // state, where that rate matters less: the overlaps must agree to 3% and the
            // neighbour distances to 1% (measured: 0.3% and 0.15%).
            assertEquals(a[0], b[0], 0.03 * a[0], "mean overlap (µm), seed " + seed);
            assertEquals(a[1], b[1], 0.01 * a[1], "mean nearest-neighbour distance (µm), seed " + seed);
            // The pattern: boundaries within half a profile bin (600 µm / 38 bins ≈ 15.8 µm),
            // about the spread of the progenitor boundary between seeds.
            FateProfile pe = FateProfile.of(every);
            FateProfile pm = FateProfile.of(multi);
            int progenitor = 2;
            assertEquals(pe.boundary(progenitor), pm.boundary(progenitor), 8.0, "progenitor boundary, seed " + seed);
            List<String> fates = every.spec().fates().fateNames();
            double ce = MixedZone.of(every.cells(), fates.size(), pe, every.spec().width()).committedBoundary();
            double cm = MixedZone.of(multi.cells(), fates.size(), pm, multi.spec().width()).committedBoundary();
            assertEquals(ce, cm, 8.0, "committed boundary, seed " + seed);
            double largest = 0;
            for (int f = 0; f < fates.size(); f++) {
                for (int bin = 0; bin < pe.centres().length; bin++) {
                    double d = Math.abs(pe.fractions()[f][bin] - pm.fractions()[f][bin]);
                    largest = Double.isNaN(d) ? largest : Math.max(largest, d);
                }
            }
            System.err.printf(java.util.Locale.ROOT, "multi-rate, seed %d: overlap %.4f / %.4f um, nearest %.4f / %.4f"
                    + " um, progenitor boundary %.1f / %.1f um, committed %.1f / %.1f um, largest fraction"
                    + " difference %.3f%n", seed, a[0], b[0], a[1], b[1], pe.boundary(progenitor),
                    pm.boundary(progenitor), ce, cm, largest);
            assertTrue(largest < 0.1, "largest difference of a binned fate fraction, seed " + seed + ": " + largest);
        }
    }
}
