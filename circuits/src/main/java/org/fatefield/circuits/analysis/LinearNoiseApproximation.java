package org.fatefield.circuits.analysis;

import org.fatefield.circuits.model.ReactionNetwork;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealMatrix;

/**
 * Stationary covariance of the fluctuations about a stable steady state in the linear noise
 * approximation: the solution {@code C} of the Lyapunov equation {@code A C + C A^T + B / Omega = 0},
 * with {@code A} the drift's Jacobian and {@code B = sum_j nu_j nu_j^T a_j} (van Kampen, N. G.
 * 2007, Stochastic Processes in Physics and Chemistry, 3rd ed., Elsevier, ch. X; Elf &amp;
 * Ehrenberg 2003, Genome Res. 13:2475). Solved as a linear system in the entries of {@code C}
 * (Kronecker form), fine for the small circuits it is meant for.
 */
public final class LinearNoiseApproximation {

    private LinearNoiseApproximation() {
    }

    /**
     * Covariance matrix in concentration units at steady state {@code x}; multiply by
     * {@code Omega^2} for molecule counts.
     */
    public static double[][] covariance(ReactionNetwork network, double[] x, double[] params, double systemSize) {
        int n = network.speciesCount();
        int m = network.reactionCount();
        double[][] a = new double[n][n];
        network.jacobian(x, params, a);
        double[] propensity = new double[m];
        network.propensities(x, params, propensity);
        double[][] b = new double[n][n];
        for (int j = 0; j < m; j++) {
            for (int i = 0; i < n; i++) {
                for (int k = 0; k < n; k++) {
                    b[i][k] += network.stoichiometry(j, i) * network.stoichiometry(j, k) * propensity[j] / systemSize;
                }
            }
        }
        // vec(A C + C A^T) = (I kron A + A kron I) vec(C), with vec stacking columns.
        RealMatrix kron = new Array2DRowRealMatrix(n * n, n * n);
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                for (int l = 0; l < n; l++) {
                    kron.addToEntry(k * n + i, k * n + l, a[i][l]);
                    kron.addToEntry(k * n + i, l * n + i, a[k][l]);
                }
            }
        }
        double[] rhs = new double[n * n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                rhs[k * n + i] = -b[i][k];
            }
        }
        double[] vec = new LUDecomposition(kron).getSolver().solve(new ArrayRealVector(rhs, false)).toArray();
        double[][] c = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                c[i][k] = vec[k * n + i];
            }
        }
        return c;
    }
}
