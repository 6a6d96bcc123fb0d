package org.fatefield.circuits.analysis.continuation;

import java.util.Arrays;
import java.util.function.Function;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.SingularValueDecomposition;

/**
 * Newton refinement of a located fold or branch point on a regular defining system, so its
 * position is accurate to rounding even where tracing is ill-conditioned (next to a crossing
 * branch, where the corrector may land on either branch).
 *
 * <p>Folds: {@code F(x, l) = 0, F_x v = 0, v0 . v = 1} (Govaerts, W. 2000, Numerical Methods for
 * Bifurcations of Dynamical Equilibria, SIAM, §3.2). Simple branch points: Moore's extended
 * system {@code F(x, l) + b psi = 0, F_x^T psi = 0, F_l . psi = 0, psi . psi = 1}, regular at a
 * simple branch point with {@code b = 0} there (Moore, G. 1980, SIAM J. Numer. Anal. 17:567).
 * The Newton matrix is taken by central differences of the system; only the convergence rate,
 * not the converged point, depends on it.
 */
final class SpecialPointPolish {

    private SpecialPointPolish() {
    }

    /** The fold nearest {@code y} (state then parameter), or null if Newton's method fails. */
    static double[] fold(ParametrisedSystem system, double[] y) {
        int n = system.dimension();
        double[] v0 = nullVector(system, y, false);
        double[] z0 = Arrays.copyOf(y, 2 * n + 1);
        System.arraycopy(v0, 0, z0, n + 1, n);
        double[] solution = newton(z -> {
            double[] x = Arrays.copyOf(z, n);
            double lambda = z[n];
            double[] g = new double[2 * n + 1];
            double[] f = new double[n];
            system.value(x, lambda, f);
            System.arraycopy(f, 0, g, 0, n);
            double[][] jac = new double[n][n];
            system.jacobian(x, lambda, jac);
            double norm = 0;
            for (int i = 0; i < n; i++) {
                double s = 0;
                for (int j = 0; j < n; j++) {
                    s += jac[i][j] * z[n + 1 + j];
                }
                g[n + i] = s;
                norm += v0[i] * z[n + 1 + i];
            }
            g[2 * n] = norm - 1;
            return g;
        }, z0);
        return solution == null ? null : Arrays.copyOf(solution, n + 1);
    }

    /** The simple branch point nearest {@code y}, or null if Newton's method fails. */
    static double[] branchPoint(ParametrisedSystem system, double[] y) {
        int n = system.dimension();
        double[] psi0 = nullVector(system, y, true);
        double[] z0 = new double[2 * n + 2];
        System.arraycopy(y, 0, z0, 0, n + 1);
        System.arraycopy(psi0, 0, z0, n + 2, n);
        double[] solution = newton(z -> {
            double[] x = Arrays.copyOf(z, n);
            double lambda = z[n];
            double beta = z[n + 1];
            double[] psi = Arrays.copyOfRange(z, n + 2, 2 * n + 2);
            double[] g = new double[2 * n + 2];
            double[] f = new double[n];
            system.value(x, lambda, f);
            double[][] jac = new double[n][n];
            system.jacobian(x, lambda, jac);
            double[] fl = new double[n];
            system.parameterDerivative(x, lambda, fl);
            double along = 0;
            double length = 0;
            for (int i = 0; i < n; i++) {
                g[i] = f[i] + beta * psi[i];
                double s = 0;
                for (int j = 0; j < n; j++) {
                    s += jac[j][i] * psi[j];
                }
                g[n + i] = s;
                along += fl[i] * psi[i];
                length += psi[i] * psi[i];
            }
            g[2 * n] = along;
            g[2 * n + 1] = length - 1;
            return g;
        }, z0);
        return solution == null ? null : Arrays.copyOf(solution, n + 1);
    }

    /** Right (or left) singular vector of the smallest singular value of {@code F_x} at {@code y}. */
    private static double[] nullVector(ParametrisedSystem system, double[] y, boolean left) {
        int n = system.dimension();
        double[][] jac = new double[n][n];
        system.jacobian(Arrays.copyOf(y, n), y[n], jac);
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(jac, false));
        return (left ? svd.getU() : svd.getV()).getColumn(n - 1);
    }

    private static double[] newton(Function<double[], double[]> g, double[] z0) {
        double[] z = z0.clone();
        int m = z.length;
        double[] best = null;
        double bestResidual = Double.POSITIVE_INFINITY;
        for (int iteration = 0; iteration < 30; iteration++) {
            double[] r = g.apply(z);
            double residual = PseudoArclength.maxAbs(r);
            if (!Double.isFinite(residual)) {
                break;
            }
            if (residual < bestResidual) {
                bestResidual = residual;
                best = z.clone();
            }
            if (residual <= 1e-14 * (1 + PseudoArclength.maxAbs(z))) {
                return z;
            }
            double[][] jac = new double[m][m];
            for (int j = 0; j < m; j++) {
                double h = 1e-7 * (1 + Math.abs(z[j]));
                double[] up = z.clone();
                double[] down = z.clone();
                up[j] += h;
                down[j] -= h;
                double[] gu = g.apply(up);
                double[] gd = g.apply(down);
                for (int i = 0; i < m; i++) {
                    jac[i][j] = (gu[i] - gd[i]) / (2 * h);
                }
            }
            DecompositionSolver solver = new LUDecomposition(new Array2DRowRealMatrix(jac, false), 1e-300).getSolver();
            if (!solver.isNonSingular()) {
                break;
            }
            double[] step = solver.solve(new ArrayRealVector(r, false)).toArray();
            double size = 0;
            for (int i = 0; i < m; i++) {
                z[i] -= step[i];
                size = Math.max(size, Math.abs(step[i]));
            }
            if (!Double.isFinite(size) || size <= 1e-13 * (1 + PseudoArclength.maxAbs(z))) {
                break;
            }
        }
        // Rounding in the differenced parameter derivative leaves a residual near 1e-10: the best
        // iterate counts as converged if its residual is small.
        if (best != null) {
            double[] r = g.apply(z);
            if (PseudoArclength.maxAbs(r) < bestResidual) {
                bestResidual = PseudoArclength.maxAbs(r);
                best = z.clone();
            }
        }
        return best != null && bestResidual <= 1e-9 * (1 + PseudoArclength.maxAbs(best)) ? best : null;
    }
}
