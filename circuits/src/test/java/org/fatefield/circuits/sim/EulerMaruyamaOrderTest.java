package org.fatefield.circuits.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.circuits.random.RandomStreams;
import org.junit.jupiter.api.Test;

/**
 * Convergence orders of the Langevin stepper's Euler-Maruyama scheme on geometric Brownian
 * motion dX = mu X dt + sigma X dW, following Higham (2001), An algorithmic introduction to
 * numerical simulation of stochastic differential equations, SIAM Review 43:525 (X0 = 1, mu = 2,
 * sigma = 1, T = 1). GBM is written as a two-reaction circuit with propensities
 * (sigma^2 Omega X^2 +- mu X) / 2, whose chemical Langevin drift is mu X and noise variance
 * sigma^2 X^2; Omega = 1000 keeps both propensities positive. Strong error is measured against the
 * same Brownian paths at the finest step (the two reactions' Wiener increments summed), weak error
 * against the exact mean X0 e^(mu T). Slopes by least squares on log-log, with the tolerances
 * Higham's own experiment shows (about 0.5 and 1).
 */
class EulerMaruyamaOrderTest {

    private static final double MU = 2.0;
    private static final double OMEGA = 1000.0;

    private static CustomNetwork gbm() {
        return CustomNetwork.of(List.of("X"), List.of("mu", "s2o"), new double[] {MU, OMEGA}, List.of(
                new CustomNetwork.ReactionDefinition("up", new int[] {1}, "(s2o * X^2 + mu * X) / 2"),
                new CustomNetwork.ReactionDefinition("down", new int[] {-1}, "(s2o * X^2 - mu * X) / 2")));
    }

    @Test
    void strongOrderOneHalfAndWeakOrderOne() {
        CustomNetwork network = gbm();
        double[] p = network.defaultParameters();
        LangevinStepper stepper = LangevinStepper.of(network, OMEGA);
        int finest = 1 << 9;
        int[] factors = {16, 32, 64, 128};
        int paths = 5000;
        double[] strong = new double[factors.length];
        double[] mean = new double[factors.length];
        RandomStreams streams = RandomStreams.of(2001);
        double[][] xi = new double[finest][2];
        double[] sum = new double[2];
        double[] x = new double[1];
        for (int path = 0; path < paths; path++) {
            UniformRandomProvider rng = streams.stream(path);
            ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
            for (double[] row : xi) {
                row[0] = g.sample();
                row[1] = g.sample();
            }
            x[0] = 1.0;
            double h = 1.0 / finest;
            for (double[] row : xi) {
                stepper.advance(x, p, h, row);
            }
            double reference = x[0];
            for (int f = 0; f < factors.length; f++) {
                int r = factors[f];
                double coarse = h * r;
                x[0] = 1.0;
                for (int k = 0; k < finest / r; k++) {
                    // Coarse Wiener increment = sum of fine ones: xi_coarse = sum(xi_fine) / sqrt(r).
                    sum[0] = 0;
                    sum[1] = 0;
                    for (int q = 0; q < r; q++) {
                        sum[0] += xi[k * r + q][0];
                        sum[1] += xi[k * r + q][1];
                    }
                    sum[0] /= Math.sqrt(r);
                    sum[1] /= Math.sqrt(r);
                    stepper.advance(x, p, coarse, sum);
                }
                strong[f] += Math.abs(x[0] - reference) / paths;
                mean[f] += x[0] / paths;
            }
        }
        double[] logH = new double[factors.length];
        double[] logStrong = new double[factors.length];
        double[] logWeak = new double[factors.length];
        double exactMean = Math.exp(MU);
        for (int f = 0; f < factors.length; f++) {
            logH[f] = Math.log((double) factors[f] / finest);
            logStrong[f] = Math.log(strong[f]);
            logWeak[f] = Math.log(Math.abs(mean[f] - exactMean));
        }
        assertEquals(0.5, slope(logH, logStrong), 0.15, "strong order");
        assertEquals(1.0, slope(logH, logWeak), 0.3, "weak order");
    }

    private static double slope(double[] x, double[] y) {
        double mx = 0;
        double my = 0;
        for (int i = 0; i < x.length; i++) {
            mx += x[i] / x.length;
            my += y[i] / y.length;
        }
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < x.length; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
        }
        return sxy / sxx;
    }
}
