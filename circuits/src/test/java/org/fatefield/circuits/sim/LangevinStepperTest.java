package org.fatefield.circuits.sim;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.random.RandomStreams;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * The Langevin stepper on the birth-death process (birth k, death gamma n, in molecule counts),
 * whose stationary law has mean and variance k / gamma (Gillespie 2000, J. Chem. Phys.
 * 113:297). Euler–Maruyama with step h on this linear drift has an exactly known stationary
 * variance: iterating x' = x - gamma h (x - mu) + sigma sqrt(h) xi gives
 * Var = sigma^2 h / (1 - (1 - gamma h)^2) = (k / gamma) / (1 - gamma h / 2), using
 * E[sigma^2] = k + gamma E[n] = 2k (Kloeden &amp; Platen 1992, ch. 9; derived here). The mean is
 * unbiased.
 */
class LangevinStepperTest {

    private static final double OMEGA = 100.0;
    private static final int SAMPLES = 20_000;

    @ParameterizedTest
    @ValueSource(doubles = {0.01, 0.2})
    void stationaryMeanAndVarianceMatchTheExactEulerMaruyamaLaw(double h) {
        BirthDeath network = new BirthDeath();
        double[] p = {1.0, 1.0};
        double mean = OMEGA * p[0] / p[1];
        double expectedVariance = mean / (1.0 - p[1] * h / 2.0);
        LangevinStepper stepper = LangevinStepper.of(network, OMEGA);
        RandomStreams streams = RandomStreams.of(20261202L);
        int steps = (int) Math.ceil(25.0 / h);
        double sum = 0;
        double sumSq = 0;
        double[] x = new double[1];
        for (int s = 0; s < SAMPLES; s++) {
            UniformRandomProvider rng = streams.stream(s);
            x[0] = p[0] / p[1];
            for (int i = 0; i < steps; i++) {
                stepper.advance(x, p, h, rng);
            }
            double n = x[0] * OMEGA;
            sum += n;
            sumSq += n * n;
        }
        double sampleMean = sum / SAMPLES;
        double sampleVariance = (sumSq - SAMPLES * sampleMean * sampleMean) / (SAMPLES - 1);
        // Independent trajectories: standard error of the mean sqrt(V/N), of the variance
        // V sqrt(2/(N-1)) for a near-normal law; accept within 4 standard errors.
        double meanError = Math.sqrt(expectedVariance / SAMPLES);
        double varianceError = expectedVariance * Math.sqrt(2.0 / (SAMPLES - 1));
        assertEquals(mean, sampleMean, 4 * meanError, "mean");
        assertEquals(expectedVariance, sampleVariance, 4 * varianceError, "variance");
        if (h > 0.1) {
            // At this step the bias (11%) is far larger than the test's resolution: the check has teeth.
            assertTrue(Math.abs(sampleVariance - mean) > 4 * varianceError);
        }
    }

    @Test
    void sameStreamGivesTheSameTrajectory() {
        LangevinStepper stepper = LangevinStepper.of(new BirthDeath(), OMEGA);
        double[] p = {1.0, 1.0};
        double[] a = {0.5};
        double[] b = {0.5};
        UniformRandomProvider r1 = RandomStreams.of(7).stream(3);
        UniformRandomProvider r2 = RandomStreams.of(7).stream(3);
        for (int i = 0; i < 1000; i++) {
            stepper.advance(a, p, 0.01, r1);
            stepper.advance(b, p, 0.01, r2);
        }
        assertArrayEquals(a, b, 0.0);
    }

    @Test
    void stateNeverGoesNegative() {
        LangevinStepper stepper = LangevinStepper.of(new BirthDeath(), 2.0);
        double[] p = {0.01, 5.0};
        double[] x = {0.0};
        UniformRandomProvider rng = RandomStreams.of(1).stream(1);
        for (int i = 0; i < 10_000; i++) {
            stepper.advance(x, p, 0.05, rng);
            assertTrue(x[0] >= 0.0);
        }
    }

    @Test
    void rejectsNonPositiveSystemSize() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LangevinStepper.of(new BirthDeath(), 0.0));
        assertTrue(e.getMessage().contains("system size"));
    }
}
