package org.fatefield.circuits.inference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.distribution.multivariate.MultivariateNormalDistribution;
import org.junit.jupiter.api.Test;

/**
 * The proposal density of the ABC-SMC move against Hipparchus's multivariate normal density (a
 * general-purpose reference library), with the covariance Beaumont et al. (2009, Biometrika
 * 96:983) prescribe: twice the weighted covariance of the previous population.
 */
class PerturbationKernelTest {

    @Test
    void mixtureDensityMatchesTheReferenceNormalDensities() {
        double[][] centres = {{0.0, 1.0}, {1.0, 0.5}, {-0.5, 2.0}, {0.3, 1.2}};
        double[] weights = {0.1, 0.4, 0.3, 0.2};
        PerturbationKernel kernel = PerturbationKernel.of(centres, weights, new double[] {1, 1});
        double[] mean = new double[2];
        for (int j = 0; j < 4; j++) {
            mean[0] += weights[j] * centres[j][0];
            mean[1] += weights[j] * centres[j][1];
        }
        double[][] cov = new double[2][2];
        for (int j = 0; j < 4; j++) {
            for (int a = 0; a < 2; a++) {
                for (int b = 0; b < 2; b++) {
                    cov[a][b] += 2 * weights[j] * (centres[j][a] - mean[a]) * (centres[j][b] - mean[b]);
                }
            }
        }
        double[][] points = {{0.0, 0.0}, {0.7, 1.1}, {-2.0, 3.0}, {3.0, -1.0}};
        for (double[] u : points) {
            double reference = 0;
            for (int j = 0; j < 4; j++) {
                reference += weights[j] * new MultivariateNormalDistribution(centres[j], cov).density(u);
            }
            assertEquals(Math.log(reference), kernel.logDensity(u), 1e-12 * Math.abs(Math.log(reference)) + 1e-12);
        }
    }

    @Test
    void localCovarianceMixtureMatchesTheReferenceNormalDensities() {
        // Filippi et al. 2013 (Stat. Appl. Genet. Mol. Biol. 12:87): Sigma_i = sum_k w~_k (u~_k - u_i)(u~_k - u_i)^T
        // over the particles within the new tolerance (here distances 1, 2 and 0.5 are within 2).
        double[][] centres = {{0.0, 1.0}, {1.0, 0.5}, {-0.5, 2.0}, {0.3, 1.2}};
        double[] weights = {0.1, 0.4, 0.3, 0.2};
        double[] distances = {1.0, 2.0, 3.0, 0.5};
        PerturbationKernel kernel = PerturbationKernel.local(centres, weights, distances, 2.0, new double[] {1, 1});
        double[][] points = {{0.0, 0.0}, {0.7, 1.1}, {-2.0, 3.0}};
        for (double[] u : points) {
            double reference = 0;
            for (int i = 0; i < 4; i++) {
                double[][] cov = new double[2][2];
                double total = 0.1 + 0.4 + 0.2;
                for (int j : new int[] {0, 1, 3}) {
                    for (int a = 0; a < 2; a++) {
                        for (int b = 0; b < 2; b++) {
                            cov[a][b] += weights[j] / total * (centres[j][a] - centres[i][a]) * (centres[j][b] - centres[i][b]);
                        }
                    }
                }
                reference += weights[i] * new MultivariateNormalDistribution(centres[i], cov).density(u);
            }
            assertEquals(Math.log(reference), kernel.logDensity(u), 1e-12 * Math.abs(Math.log(reference)) + 1e-12);
        }
    }

    @Test
    void aCollapsedPopulationMovesByTheFallbackSpread() {
        double[][] centres = {{2.0}, {2.0}};
        PerturbationKernel kernel = PerturbationKernel.of(centres, new double[] {0.5, 0.5}, new double[] {0.01});
        // Normal density with sd 0.01 at its centre: 1 / (0.01 sqrt(2 pi)).
        assertEquals(-Math.log(0.01 * Math.sqrt(2 * Math.PI)), kernel.logDensity(new double[] {2.0}), 1e-12);
    }
}
