package org.fatefield.circuits.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.fatefield.circuits.analysis.LinearNoiseApproximation;
import org.fatefield.circuits.random.RandomStreams;
import org.hipparchus.distribution.discrete.PoissonDistribution;
import org.hipparchus.stat.inference.ChiSquareTest;
import org.junit.jupiter.api.Test;

/**
 * Exact and approximate stochastic simulation against stationary laws known in closed form.
 * Samples are the states of independent trajectories at a time long after the relaxation time,
 * so they are independent and identically distributed.
 */
class ExactStochasticTest {

    /** Samples of each species at time {@code horizon} from {@code samples} independent runs. */
    private static double[][] sample(CircuitStepper stepper, double[] start, double[] p, double horizon, int samples,
            long seed) {
        RandomStreams streams = RandomStreams.of(seed);
        double[][] out = new double[start.length][samples];
        for (int s = 0; s < samples; s++) {
            double[] x = start.clone();
            stepper.advance(x, p, horizon, streams.stream(s));
            for (int i = 0; i < x.length; i++) {
                out[i][s] = x[i];
            }
        }
        return out;
    }

    /**
     * Birth-death under Gillespie's direct method is Poisson(k / gamma) at stationarity
     * (Gillespie 1977, J. Phys. Chem. 81:2340). Chi-square at the 1% level against Hipparchus'
     * Poisson distribution, tails pooled so each expected count is at least 5 (common practice),
     * and the Kolmogorov-Smirnov distance below the 1% critical value 1.628 / sqrt(N), which is
     * conservative for a discrete law (Conover 1972, J. Am. Stat. Assoc. 67:591).
     */
    @Test
    void directMethodBirthDeathIsPoisson() {
        int samples = 4000;
        double mean = 20.0;
        double[] counts = sample(GillespieDirectStepper.of(new BirthDeath(), 1.0), new double[] {0},
                new double[] {mean, 1.0}, 12.0, samples, 314)[0];
        PoissonDistribution law = new PoissonDistribution(mean);
        int lo = 10;
        int hi = 31;
        long[] observed = new long[hi - lo + 1];
        for (double c : counts) {
            observed[(int) Math.min(Math.max(c, lo), hi) - lo]++;
        }
        double[] expected = new double[observed.length];
        for (int k = lo; k <= hi; k++) {
            double p = k == lo ? law.cumulativeProbability(lo)
                    : k == hi ? 1 - law.cumulativeProbability(hi - 1) : law.probability(k);
            expected[k - lo] = p * samples;
        }
        assertFalse(new ChiSquareTest().chiSquareTest(expected, observed, 0.01), "chi-square rejects Poisson");
        double ks = 0;
        for (int k = 0; k <= 60; k++) {
            int below = 0;
            for (double c : counts) {
                if (c <= k) {
                    below++;
                }
            }
            ks = Math.max(ks, Math.abs((double) below / samples - law.cumulativeProbability(k)));
        }
        assertTrue(ks < 1.628 / Math.sqrt(samples), "KS distance " + ks);
    }

    @Test
    void tauLeapingBirthDeathHasPoissonMeanAndVariance() {
        int samples = 4000;
        double mean = 200.0;
        double[] counts = sample(TauLeapingStepper.of(new BirthDeath(), 1.0), new double[] {mean},
                new double[] {mean, 1.0}, 10.0, samples, 2718)[0];
        double[] moments = moments(counts);
        assertEquals(mean, moments[0], 4 * Math.sqrt(mean / samples));
        assertEquals(mean, moments[1], 4 * mean * Math.sqrt(2.0 / (samples - 1)));
    }

    /**
     * Two-stage expression: protein Fano factor 1 + kp / (gm + gp) (Thattai &amp; van Oudenaarden
     * 2001, PNAS 98:8614). The linear noise approximation is exact for this linear network, so the
     * Lyapunov solution must match to rounding; SSA (at one molecule per unit, mRNA mean 2) and
 * Langevin (Omega = 20) samples within 4 standard errors
     * of the sample Fano factor, approximated by F sqrt(2.5 / N) to allow for mild excess kurtosis.
     */
    @Test
    void twoStageProteinFanoFactor() {
        TwoStageExpression network = new TwoStageExpression();
        double[] p = network.defaultParameters();
        double fano = 1 + p[2] / (p[1] + p[3]);
        double meanProtein = p[0] * p[2] / (p[1] * p[3]);
        double[] steady = {p[0] / p[1], meanProtein};
        double[][] covariance = LinearNoiseApproximation.covariance(network, steady, p, 1.0);
        assertEquals(fano, covariance[1][1] / meanProtein, 1e-10);
        assertEquals(p[0] / p[1], covariance[0][0], 1e-10);

        int samples = 6000;
        double tolerance = 4 * fano * Math.sqrt(2.5 / samples);
        double[][] exact = sample(GillespieDirectStepper.of(network, 1.0), steady, p, 80.0, samples, 99);
        double[] m = moments(exact[1]);
        assertEquals(fano, m[1] / m[0], tolerance, "direct method");

        // The Langevin equation needs many molecules: Omega = 20 gives 40 mRNAs on average, and
        // the Fano factor in molecule counts is the same expression.
        double omega = 20.0;
        LangevinStepper langevin = LangevinStepper.of(network, omega);
        RandomStreams streams = RandomStreams.of(100);
        double[] protein = new double[samples];
        for (int s = 0; s < samples; s++) {
            double[] x = steady.clone();
            var rng = streams.stream(s);
            for (int k = 0; k < 4000; k++) {
                langevin.advance(x, p, 0.02, rng);
            }
            protein[s] = x[1] * omega;
        }
        double[] l = moments(protein);
        assertEquals(fano, l[1] / l[0], tolerance, "chemical Langevin");
    }

    private static double[] moments(double[] values) {
        double sum = 0;
        double sumSq = 0;
        for (double v : values) {
            sum += v;
            sumSq += v * v;
        }
        double mean = sum / values.length;
        return new double[] {mean, (sumSq - values.length * mean * mean) / (values.length - 1)};
    }
}
