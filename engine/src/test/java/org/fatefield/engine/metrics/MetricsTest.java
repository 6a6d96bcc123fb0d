package org.fatefield.engine.metrics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.lineage.Ancestry;
import org.hipparchus.distribution.continuous.ChiSquaredDistribution;
import org.junit.jupiter.api.Test;

class MetricsTest {

    private static Cell cell(long id, long parent, double x, int fate) {
        Cell c = new Cell(id, parent, 0, 0, 1, new double[] {0}, RandomStreams.of(1).seedWords(id), x, 1, 1.0, 1.0);
        c.setFate(fate, 0);
        return c;
    }

    @Test
    void lineageDistancesCountSistersAndCousinsExactly() {
        // Founder 0 -> 1, 2; 1 -> 3, 4; 2 -> 5, 6. Fates of 3..6: A A B A (counted by hand).
        Ancestry ancestry = new Ancestry();
        long[] parents = {-1, 0, 0, 1, 1, 2, 2};
        for (int id = 0; id < parents.length; id++) {
            ancestry.add(id, parents[id]);
        }
        List<Cell> live = List.of(cell(3, 1, 0, 0), cell(4, 1, 0, 0), cell(5, 2, 0, 1), cell(6, 2, 0, 0));
        LineageStatistics stats = LineageStatistics.of(live, ancestry, 2);
        assertEquals(2L, stats.pairs().get(2));
        assertEquals(0.5, stats.sisterAgreement(), 1e-15);
        assertEquals(4L, stats.pairs().get(4));
        assertEquals(0.5, stats.sameFate().get(4), 1e-15);
        assertArrayEquals(new int[] {3, 1}, stats.clones().get(0L));
    }

    /**
     * French-flag readout of an exponential gradient c = c0 exp(-x / lambda) by the threshold
     * theta puts the boundary at x = lambda ln(c0 / theta) (Wolpert 1969, J. Theor. Biol. 25:1).
     */
    @Test
    void frenchFlagBoundaryOfAnExponentialGradient() {
        double lambda = 50;
        double c0 = 10;
        double theta = 0.8;
        List<Cell> cells = new ArrayList<>();
        for (int i = 0; i < 3000; i++) {
            double x = (i + 0.5) * 600.0 / 3000;
            cells.add(cell(i, -1, x, c0 * Math.exp(-x / lambda) > theta ? 0 : 1));
        }
        FateProfile profile = FateProfile.of(cells, 2, 600, 60);
        assertEquals(lambda * Math.log(c0 / theta), profile.boundary(0), 600.0 / 60);
        assertEquals(profile.boundary(0), profile.boundary(1), 1e-9);
    }

    /**
     * Positional error of a threshold readout: with the amplitude fluctuating by a relative
     * standard deviation s between embryos, the boundary x* = lambda ln(c0 (1 + eps) / theta)
     * moves with standard deviation sigma_x = sigma_c / |dc/dx| = lambda s to first order (Gregor,
     * Tank, Wieschaus &amp; Bialek 2007, Cell 130:153). Over N = 300 replicate gradients the sample
     * variance must fall inside its 99% chi-square interval.
     */
    @Test
    void positionalErrorOfANoisyGradient() {
        double lambda = 50;
        double c0 = 10;
        double theta = 0.8;
        double s = 0.05;
        int replicates = 300;
        UniformRandomProvider rng = RandomStreams.of(8).stream(0);
        ZigguratSampler.NormalizedGaussian gaussian = ZigguratSampler.NormalizedGaussian.of(rng);
        double[] boundaries = new double[replicates];
        for (int r = 0; r < replicates; r++) {
            double amplitude = c0 * (1 + s * gaussian.sample());
            List<Cell> cells = new ArrayList<>();
            for (int i = 0; i < 6000; i++) {
                double x = (i + 0.5) * 600.0 / 6000;
                cells.add(cell(i, -1, x, amplitude * Math.exp(-x / lambda) > theta ? 0 : 1));
            }
            boundaries[r] = FateProfile.of(cells, 2, 600, 600).boundary(0);
        }
        double mean = 0;
        for (double b : boundaries) {
            mean += b / replicates;
        }
        double variance = 0;
        for (double b : boundaries) {
            variance += (b - mean) * (b - mean) / (replicates - 1);
        }
        double expected = lambda * s;
        ChiSquaredDistribution chi = new ChiSquaredDistribution(replicates - 1);
        double low = expected * expected * chi.inverseCumulativeProbability(0.005) / (replicates - 1);
        double high = expected * expected * chi.inverseCumulativeProbability(0.995) / (replicates - 1);
        assertTrue(variance > low && variance < high, "variance " + variance + " outside [" + low + ", " + high + "]");
    }
}
