package org.fatefield.circuits.inference;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.linear.CholeskyDecomposition;
import org.hipparchus.linear.MatrixUtils;

/**
 * The multivariate normal move of ABC-SMC with the optimal local covariance matrix (OLCM) of
 * Filippi, Barnes, Cornebise &amp; Stumpf 2013 (On optimality of kernels for approximate Bayesian
 * computation using sequential Monte Carlo, Stat. Appl. Genet. Mol. Biol. 12:87): a particle u_i
 * drawn from the previous population by weight moves by N(0, Sigma_i) with Sigma_i = sum_k w~_k
 * (u~_k - u_i)(u~_k - u_i)^T over the previous particles u~_k already within the new tolerance
 * (weights renormalised among them). Centred on where the new tolerance lets particles be, it
 * accepts more often than the global kernel with twice the population covariance (Beaumont,
 * Cornuet, Marin &amp; Robert 2009, Biometrika 96:983), which it falls back to when fewer than
 * two previous particles are within the new tolerance. The proposal density q(u) = sum_j W_j
 * N(u; u_j, Sigma_j) gives the importance weight pi(u) / q(u) of an accepted particle.
 *
 * <p>A covariance that is not positive definite (particles on a line or a point) falls back to
 * its diagonal, and a zero variance to a small fraction of the prior's spread, so a move is
 * always possible.
 */
final class PerturbationKernel {

    private final double[][] centres;
    private final double[] weights;
    private final double[][][] lower;
    private final double[][][] inverseLower;
    private final double[] logNormaliser;

    private PerturbationKernel(double[][] centres, double[] weights, double[][][] lower) {
        this.centres = centres;
        this.weights = weights;
        this.lower = lower;
        int n = centres.length;
        int k = centres[0].length;
        this.inverseLower = new double[n][][];
        this.logNormaliser = new double[n];
        for (int j = 0; j < n; j++) {
            inverseLower[j] = MatrixUtils.inverse(MatrixUtils.createRealMatrix(lower[j])).getData();
            double logDet = 0;
            for (int i = 0; i < k; i++) {
                logDet += Math.log(lower[j][i][i]);
            }
            logNormaliser[j] = -0.5 * k * Math.log(2 * Math.PI) - logDet;
        }
    }

    /**
     * The global kernel (twice the weighted covariance) around {@code centres} (working space, one
     * row per particle) with normalised {@code weights}; {@code fallbackSd} is the spread used for
     * a coordinate that does not vary.
     */
    static PerturbationKernel of(double[][] centres, double[] weights, double[] fallbackSd) {
        int k = centres[0].length;
        double[] mean = new double[k];
        for (int j = 0; j < centres.length; j++) {
            for (int a = 0; a < k; a++) {
                mean[a] += weights[j] * centres[j][a];
            }
        }
        double[][] cov = new double[k][k];
        for (int j = 0; j < centres.length; j++) {
            for (int a = 0; a < k; a++) {
                for (int b = 0; b < k; b++) {
                    cov[a][b] += 2 * weights[j] * (centres[j][a] - mean[a]) * (centres[j][b] - mean[b]);
                }
            }
        }
        double[][] l = cholesky(cov, fallbackSd);
        double[][][] lower = new double[centres.length][][];
        java.util.Arrays.fill(lower, l);
        return new PerturbationKernel(centres, weights, lower);
    }

    /**
     * The OLCM kernel: around each of {@code centres}, the covariance towards the previous
     * particles whose {@code distances} are within {@code tolerance}; the global kernel if fewer
     * than two are.
     */
    static PerturbationKernel local(double[][] centres, double[] weights, double[] distances, double tolerance,
            double[] fallbackSd) {
        int k = centres[0].length;
        double total = 0;
        int within = 0;
        for (int j = 0; j < centres.length; j++) {
            if (distances[j] <= tolerance) {
                total += weights[j];
                within++;
            }
        }
        if (within < 2 || !(total > 0)) {
            return of(centres, weights, fallbackSd);
        }
        double[][][] lower = new double[centres.length][][];
        for (int i = 0; i < centres.length; i++) {
            double[][] cov = new double[k][k];
            for (int j = 0; j < centres.length; j++) {
                if (distances[j] > tolerance) {
                    continue;
                }
                double w = weights[j] / total;
                for (int a = 0; a < k; a++) {
                    for (int b = 0; b < k; b++) {
                        cov[a][b] += w * (centres[j][a] - centres[i][a]) * (centres[j][b] - centres[i][b]);
                    }
                }
            }
            lower[i] = cholesky(cov, fallbackSd);
        }
        return new PerturbationKernel(centres, weights, lower);
    }

    private static double[][] cholesky(double[][] cov, double[] fallbackSd) {
        int k = cov.length;
        for (int a = 0; a < k; a++) {
            if (!(cov[a][a] > 1e-24 * fallbackSd[a] * fallbackSd[a])) {
                for (int b = 0; b < k; b++) {
                    cov[a][b] = 0;
                    cov[b][a] = 0;
                }
                cov[a][a] = fallbackSd[a] * fallbackSd[a];
            }
        }
        try {
            return new CholeskyDecomposition(MatrixUtils.createRealMatrix(cov), 1e-10, 1e-300).getL().getData();
        } catch (MathIllegalArgumentException e) {
            double[][] l = new double[k][k];
            for (int a = 0; a < k; a++) {
                l[a][a] = Math.sqrt(cov[a][a]);
            }
            return l;
        }
    }

    /** A proposal: a centre drawn by weight, moved by the normal kernel. */
    double[] propose(UniformRandomProvider random, ZigguratSampler.NormalizedGaussian gaussian) {
        int j = Population.pick(weights, random.nextDouble());
        int k = centres[0].length;
        double[] z = new double[k];
        for (int a = 0; a < k; a++) {
            z[a] = gaussian.sample();
        }
        double[] u = centres[j].clone();
        for (int a = 0; a < k; a++) {
            for (int b = 0; b <= a; b++) {
                u[a] += lower[j][a][b] * z[b];
            }
        }
        return u;
    }

    /** Log of the proposal density q(u), the weighted mixture of kernels around every centre. */
    double logDensity(double[] u) {
        int k = centres[0].length;
        double[] logTerms = new double[centres.length];
        double max = Double.NEGATIVE_INFINITY;
        double[] diff = new double[k];
        for (int j = 0; j < centres.length; j++) {
            if (weights[j] == 0) {
                logTerms[j] = Double.NEGATIVE_INFINITY;
                continue;
            }
            for (int a = 0; a < k; a++) {
                diff[a] = u[a] - centres[j][a];
            }
            double quad = 0;
            for (int a = 0; a < k; a++) {
                double y = 0;
                for (int b = 0; b <= a; b++) {
                    y += inverseLower[j][a][b] * diff[b];
                }
                quad += y * y;
            }
            logTerms[j] = Math.log(weights[j]) + logNormaliser[j] - 0.5 * quad;
            max = Math.max(max, logTerms[j]);
        }
        if (max == Double.NEGATIVE_INFINITY) {
            return max;
        }
        double sum = 0;
        for (double t : logTerms) {
            sum += Math.exp(t - max);
        }
        return max + Math.log(sum);
    }

}
