package org.fatefield.engine.metrics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Mixed-fate metrics: the Wilson interval against published values, the step fit and single crossings by hand. */
class MixedZoneTest {

    /**
     * Wilson score 95% intervals of Newcombe, R. G. (1998), Two-sided confidence intervals for the
     * single proportion, Stat. Med. 17:857, Table I (values quoted to 4 decimals; from memory):
     * 81/263 -> 0.2553-0.3662, 15/148 -> 0.0624-0.1605, 0/20 -> 0-0.1611, 1/29 -> 0.0061-0.1718.
     */
    @Test
    void wilsonIntervalsMatchThePublishedTable() {
        double[][] cases = {{81, 263, 0.2553, 0.3662}, {15, 148, 0.0624, 0.1605}, {0, 20, 0.0, 0.1611},
            {1, 29, 0.0061, 0.1718}};
        for (double[] c : cases) {
            double[] ci = MixedZone.wilson((long) c[0], (long) c[1], 1.959963984540054);
            assertEquals(c[2], ci[0], 5e-5, c[0] + "/" + c[1]);
            assertEquals(c[3], ci[1], 5e-5, c[0] + "/" + c[1]);
        }
    }

    /**
     * 100 cells at x = 0, 1, ..., 99, committed below x = 40 except x = 10 and 20, and two
     * committed cells at 60 and 70 beyond. Every split between 39 and 40 misplaces exactly those
     * four; any other misplaces more, so the step fit is at 39.5 (counted by hand).
     */
    @Test
    void stepFitPutsTheMostCellsOnTheirSide() {
        double[][] points = new double[100][];
        for (int i = 0; i < 100; i++) {
            boolean committed = i < 40 && i != 10 && i != 20 || i == 60 || i == 70;
            points[i] = new double[] {i, committed ? 1 : 0};
        }
        assertEquals(39.5, MixedZone.stepFit(points), 0.0);
        // Mirrored (committed on the right) the fit is mirrored too.
        for (double[] p : points) {
            p[0] = 99 - p[0];
        }
        assertEquals(59.5, MixedZone.stepFit(points), 0.0);
    }

    /** A fraction crossing 1/2 three times has no boundary; crossing once, the interpolated point. */
    @Test
    void boundaryNeedsASingleCrossing() {
        int[] counts = {10, 10, 10, 10, 10};
        int[][] mixed = {{8, 2, 8, 2, 2}, {2, 8, 2, 8, 8}};
        FateProfile profile = FateProfile.fromCounts(50, counts, mixed);
        assertEquals(3, profile.crossings(0, 0.5).length);
        assertTrue(Double.isNaN(profile.boundary(0)));
        int[][] banded = {{9, 7, 3, 1, 0}, {1, 3, 7, 9, 10}};
        FateProfile clean = FateProfile.fromCounts(50, counts, banded);
        // Bin centres 5, 15, 25, ...: 0.7 at 15 and 0.3 at 25, so 1/2 is crossed at 20.
        assertEquals(20.0, clean.boundary(0), 1e-12);
    }
}
