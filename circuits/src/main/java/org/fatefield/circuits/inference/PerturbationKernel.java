package org.fatefield.circuits.inference;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.linear.CholeskyDecomposition;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

/**
 * The multivariate normal move of population Monte Carlo ABC: a particle drawn from the previous
 * population by weight is moved by N(0, Sigma) with Sigma twice the weighted covariance of that
 * population (Beaumont, Cornuet, Marin &amp; Robert 2009, Adaptive approximate Bayesian
 * computation, Biometrika 96:983). The proposal density q(u) = sum_j W_j N(u; u_j, Sigma) gives the
 * importance weight pi(u) / q(u) of an accepted particle.
 *
 * <p>A covariance that is not positive definite (a population collapsed onto a line or a point)
 * falls back to its diagonal, and a zero variance to a small fraction of the prior's spread, so a
 * move is always possible.
 */
final class PerturbationKernel {

    private final double[][] centres;
    private final double[] weights;
    private final double[][] lower;
    private final double[][] inverseLower;
    private final double logNormaliser;

    private PerturbationKernel(double[][] centres, double[] weights, double[][] lower) {
        this.centres = centres;
        this.weights = weights;
        this.lower = lower;
        int k = lower.length;
        RealMatrix l = MatrixUtils.createRealMatrix(lower);
        this.inverseLower = MatrixUtils.inverse(l).getData();
        double logDet = 0;
        for (int i = 0; i < k; i++) {
            logDet += Math.log(lower[i][i]);
        }
        this.logNormaliser = -0.5 * k * Math.log(2 * Math.PI) - logDet;
    }

    /**
     * The kernel around {@code centres} (working space, one row per particle) with normalised
     * {@code weights}; {@code fallbackSd} is the spread used for a coordinate that does not vary.
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
        for (int a = 0; a < k; a++) {
            if (!(cov[a][a] > 1e-24 * fallbackSd[a] * fallbackSd[a])) {
                for (int b = 0; b < k; b++) {
                    cov[a][b] = 0;
                    cov[b][a] = 0;
                }
                cov[a][a] = fallbackSd[a] * fallbackSd[a];
            }
        }
        double[][] lower;
        try {
            lower = new CholeskyDecomposition(MatrixUtils.createRealMatrix(cov), 1e-10, 1e-300).getL().getData();
        } catch (MathIllegalArgumentException e) {
            lower = new double[k][k];
            for (int a = 0; a < k; a++) {
                lower[a][a] = Math.sqrt(cov[a][a]);
            }
        }
        return new PerturbationKernel(centres, weights, lower);
    }

    /** A proposal: a centre drawn by weight, moved by the normal kernel. */
    double[] propose(UniformRandomProvider random, ZigguratSampler.NormalizedGaussian gaussian) {
        double r = random.nextDouble();
        int j = 0;
        double cumulative = weights[0];
        while (r >= cumulative && j < weights.length - 1) {
            j++;
            cumulative += weights[j];
        }
        int k = lower.length;
        double[] z = new double[k];
        for (int a = 0; a < k; a++) {
            z[a] = gaussian.sample();
        }
        double[] u = centres[j].clone();
        for (int a = 0; a < k; a++) {
            for (int b = 0; b <= a; b++) {
                u[a] += lower[a][b] * z[b];
            }
        }
        return u;
    }

    /** Log of the proposal density q(u), the weighted mixture of kernels around every centre. */
    double logDensity(double[] u) {
        int k = lower.length;
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
                    y += inverseLower[a][b] * diff[b];
                }
                quad += y * y;
            }
            logTerms[j] = Math.log(weights[j]) + logNormaliser - 0.5 * quad;
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

    /** The Cholesky factor of the kernel covariance (for tests). */
    double[][] lower() {
        return lower.clone();
    }
}
