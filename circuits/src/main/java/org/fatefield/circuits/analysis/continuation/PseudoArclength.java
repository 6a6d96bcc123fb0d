package org.fatefield.circuits.analysis.continuation;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealVector;

/**
 * Predictor and Newton corrector of pseudo-arclength continuation.
 *
 * <p>Keller, H. B. (1977). Numerical solution of bifurcation and nonlinear eigenvalue problems.
 * In P. H. Rabinowitz (ed.), Applications of Bifurcation Theory, Academic Press, pp. 359-384.
 * The tangent {@code t} solves the bordered system {@code [G_y; t_prev^T] t = e_(m+1)}; the
 * corrector solves {@code G(y) = 0, t . (y - y_pred) = 0} by Newton's method, so it converges
 * through folds where the parameter turns back.
 */
public final class PseudoArclength {

    private final UnderdeterminedSystem system;
    private final double tolerance;
    private final int maxIterations;
    private int lastIterations;

    /**
     * @param system        the equations
     * @param tolerance     residual and step tolerance of the corrector
     * @param maxIterations Newton iterations before a corrector step counts as failed
     */
    public PseudoArclength(UnderdeterminedSystem system, double tolerance, int maxIterations) {
        this.system = system;
        this.tolerance = tolerance;
        this.maxIterations = maxIterations;
    }

    /** The equations. */
    public UnderdeterminedSystem system() {
        return system;
    }

    /** Newton iterations of the last successful {@link #correct}. */
    public int lastIterations() {
        return lastIterations;
    }

    /** The Jacobian of the system at {@code y}. */
    public double[][] jacobian(double[] y) {
        int m = system.equations();
        double[][] jac = new double[m][m + 1];
        system.jacobian(y, jac);
        return jac;
    }

    /**
     * Unit tangent at {@code y}, oriented to have a positive dot product with {@code orientation},
     * or null where the bordered matrix is singular.
     */
    public double[] tangent(double[] y, double[] orientation) {
        int m = system.equations();
        double[][] bordered = bordered(jacobian(y), orientation);
        DecompositionSolver solver = new LUDecomposition(new Array2DRowRealMatrix(bordered, false), 1e-300).getSolver();
        if (!solver.isNonSingular()) {
            return null;
        }
        double[] rhs = new double[m + 1];
        rhs[m] = 1.0;
        double[] t = solver.solve(new ArrayRealVector(rhs, false)).toArray();
        double norm = norm(t);
        if (!(norm > 0) || !Double.isFinite(norm)) {
            return null;
        }
        for (int i = 0; i <= m; i++) {
            t[i] /= norm;
        }
        return t;
    }

    /** Determinant of {@code [G_y(y); row^T]}: changes sign at a simple branch point. */
    public double borderedDeterminant(double[] y, double[] row) {
        return new LUDecomposition(new Array2DRowRealMatrix(bordered(jacobian(y), row), false), 1e-300)
                .getDeterminant();
    }

    /**
     * Corrects {@code predicted} onto the solution curve within the hyperplane through it normal
     * to {@code normal}; null if Newton's method does not converge.
     */
    public double[] correct(double[] predicted, double[] normal) {
        int m = system.equations();
        double[] y = predicted.clone();
        double[] g = new double[m];
        double[] rhs = new double[m + 1];
        for (int iteration = 1; iteration <= maxIterations; iteration++) {
            system.residual(y, g);
            double constraint = 0;
            for (int i = 0; i <= m; i++) {
                constraint += normal[i] * (y[i] - predicted[i]);
            }
            System.arraycopy(g, 0, rhs, 0, m);
            rhs[m] = constraint;
            DecompositionSolver solver = new LUDecomposition(
                    new Array2DRowRealMatrix(bordered(jacobian(y), normal), false), 1e-300).getSolver();
            if (!solver.isNonSingular()) {
                return null;
            }
            RealVector step = solver.solve(new ArrayRealVector(rhs, false));
            double stepNorm = 0;
            for (int i = 0; i <= m; i++) {
                y[i] -= step.getEntry(i);
                stepNorm = Math.max(stepNorm, Math.abs(step.getEntry(i)));
            }
            if (!Double.isFinite(stepNorm)) {
                return null;
            }
            if (stepNorm <= tolerance * (1 + maxAbs(y))) {
                system.residual(y, g);
                if (maxAbs(g) <= 1e-6 * (1 + maxAbs(y))) {
                    lastIterations = iteration;
                    return y;
                }
                return null;
            }
        }
        return null;
    }

    private static double[][] bordered(double[][] jac, double[] row) {
        int m = jac.length;
        double[][] out = new double[m + 1][];
        for (int i = 0; i < m; i++) {
            out[i] = jac[i].clone();
        }
        out[m] = row.clone();
        return out;
    }

    static double norm(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x * x;
        }
        return Math.sqrt(s);
    }

    static double maxAbs(double[] v) {
        double m = 0;
        for (double x : v) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }
}
