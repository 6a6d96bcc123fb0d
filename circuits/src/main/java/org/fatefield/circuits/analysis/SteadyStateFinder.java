package org.fatefield.circuits.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.fatefield.circuits.model.ReactionNetwork;
import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealVector;

/**
 * Finds every steady state of a circuit inside a box of concentrations, with its stability.
 *
 * <p>Damped Newton iterations start from a regular grid of points in the box; converged points
 * are deduplicated and classified by the eigenvalues of the Jacobian ({@link Spectra}). For
 * two species a grid check follows: on a grid four times finer than the starts, every cell in
 * which both drift components change sign (both nullclines pass through it) must hold a found
 * root, and Newton's method is started again from any such cell that does not.
 */
public final class SteadyStateFinder {

    private static final int MAX_ITERATIONS = 100;
    private static final int MAX_HALVINGS = 30;

    private final ReactionNetwork network;
    private final int startsPerAxis;
    private final double residualTolerance;
    private final double zeroEigenvalueTolerance;

    private SteadyStateFinder(ReactionNetwork network, int startsPerAxis, double residualTolerance,
            double zeroEigenvalueTolerance) {
        this.network = network;
        this.startsPerAxis = startsPerAxis;
        this.residualTolerance = residualTolerance;
        this.zeroEigenvalueTolerance = zeroEigenvalueTolerance;
    }

    /** A finder with 24 starts per axis, residual tolerance 1e-12 and zero-eigenvalue tolerance 1e-10. */
    public static SteadyStateFinder of(ReactionNetwork network) {
        return new SteadyStateFinder(network, 24, 1e-12, 1e-10);
    }

    /** A copy using {@code starts} Newton starts per axis (at least 2). */
    public SteadyStateFinder withStartsPerAxis(int starts) {
        if (starts < 2) {
            throw new IllegalArgumentException("starts per axis must be at least 2, got " + starts);
        }
        return new SteadyStateFinder(network, starts, residualTolerance, zeroEigenvalueTolerance);
    }

    /**
     * All steady states in the box {@code [lower, upper]}, sorted by the first species.
     *
     * @param params parameter vector, not modified
     * @param lower  lower corner (concentrations), not modified
     * @param upper  upper corner, each entry greater than the lower one, not modified
     */
    public List<SteadyState> find(double[] params, double[] lower, double[] upper) {
        int n = network.speciesCount();
        if (lower.length != n || upper.length != n) {
            throw new IllegalArgumentException("box corners need " + n + " entries, got "
                    + lower.length + " and " + upper.length);
        }
        for (int i = 0; i < n; i++) {
            if (!(upper[i] > lower[i])) {
                throw new IllegalArgumentException("box upper corner must exceed the lower one in "
                        + network.speciesNames().get(i) + ": " + lower[i] + " .. " + upper[i]);
            }
        }
        List<double[]> roots = new ArrayList<>();
        int total = (int) Math.pow(startsPerAxis, n);
        double[] start = new double[n];
        for (int index = 0; index < total; index++) {
            int rest = index;
            for (int i = 0; i < n; i++) {
                int k = rest % startsPerAxis;
                rest /= startsPerAxis;
                start[i] = lower[i] + (upper[i] - lower[i]) * (k + 0.5) / startsPerAxis;
            }
            double[] root = newton(start.clone(), params, lower, upper);
            if (root != null && inside(root, lower, upper) && isNew(root, roots)) {
                roots.add(root);
            }
        }
        if (n == 2) {
            gridCheck(params, lower, upper, roots);
        }
        List<SteadyState> result = new ArrayList<>();
        for (double[] root : roots) {
            result.add(classify(root, params));
        }
        result.sort(Comparator.comparingDouble(s -> s.state()[0]));
        return result;
    }

    private void gridCheck(double[] params, double[] lower, double[] upper, List<double[]> roots) {
        int cells = 4 * startsPerAxis;
        double hx = (upper[0] - lower[0]) / cells;
        double hy = (upper[1] - lower[1]) / cells;
        double[][][] f = new double[cells + 1][cells + 1][];
        double[] work = new double[network.reactionCount()];
        for (int j = 0; j <= cells; j++) {
            for (int i = 0; i <= cells; i++) {
                double[] out = new double[2];
                network.drift(new double[] {lower[0] + i * hx, lower[1] + j * hy}, params, out, work);
                f[j][i] = out;
            }
        }
        for (int j = 0; j < cells; j++) {
            for (int i = 0; i < cells; i++) {
                if (!changesSign(f, i, j, 0) || !changesSign(f, i, j, 1)) {
                    continue;
                }
                double x0 = lower[0] + i * hx;
                double y0 = lower[1] + j * hy;
                boolean covered = roots.stream().anyMatch(r -> r[0] >= x0 - hx && r[0] <= x0 + 2 * hx
                        && r[1] >= y0 - hy && r[1] <= y0 + 2 * hy);
                if (!covered) {
                    double[] root = newton(new double[] {x0 + hx / 2, y0 + hy / 2}, params, lower, upper);
                    if (root != null && inside(root, lower, upper) && isNew(root, roots)) {
                        roots.add(root);
                    }
                }
            }
        }
    }

    private static boolean changesSign(double[][][] f, int i, int j, int component) {
        double a = f[j][i][component];
        double b = f[j][i + 1][component];
        double c = f[j + 1][i][component];
        double d = f[j + 1][i + 1][component];
        double min = Math.min(Math.min(a, b), Math.min(c, d));
        double max = Math.max(Math.max(a, b), Math.max(c, d));
        return min <= 0 && max >= 0;
    }

    /**
     * Refines a steady state by Newton's method from {@code guess}, or returns null if the
     * iteration does not converge (no box constraint).
     */
    public SteadyState refine(double[] guess, double[] params) {
        int n = network.speciesCount();
        double[] lower = new double[n];
        double[] upper = new double[n];
        Arrays.fill(lower, Double.NEGATIVE_INFINITY);
        Arrays.fill(upper, Double.POSITIVE_INFINITY);
        double[] root = newton(guess.clone(), params, lower, upper);
        return root == null ? null : classify(root, params);
    }

    /** Classifies the point {@code x} (assumed to be a steady state) by its Jacobian's eigenvalues. */
    public SteadyState classify(double[] x, double[] params) {
        int n = network.speciesCount();
        double[][] jac = new double[n][n];
        network.jacobian(x, params, jac);
        Complex[] eigen = Spectra.eigenvalues(jac);
        return new SteadyState(x, eigen, typeOf(eigen));
    }

    private SteadyStateType typeOf(Complex[] eigen) {
        boolean anyPositive = false;
        boolean anyNegative = false;
        boolean complex = false;
        for (Complex lambda : eigen) {
            double re = lambda.getReal();
            if (Math.abs(re) <= zeroEigenvalueTolerance) {
                return SteadyStateType.NON_HYPERBOLIC;
            }
            anyPositive |= re > 0;
            anyNegative |= re < 0;
            complex |= Math.abs(lambda.getImaginary()) > zeroEigenvalueTolerance;
        }
        if (anyPositive && anyNegative) {
            return SteadyStateType.SADDLE;
        }
        if (anyNegative) {
            return complex ? SteadyStateType.STABLE_FOCUS : SteadyStateType.STABLE_NODE;
        }
        return complex ? SteadyStateType.UNSTABLE_FOCUS : SteadyStateType.UNSTABLE_NODE;
    }

    /**
     * Damped Newton iteration. It stops when no further step reduces the residual, and accepts
     * the point if the residual is then within tolerance, so a converged root is as accurate as
     * rounding allows, also near a bifurcation where convergence slows to linear.
     */
    private double[] newton(double[] x, double[] params, double[] lower, double[] upper) {
        int n = x.length;
        double[] f = new double[n];
        double[] trial = new double[n];
        double[] work = new double[network.reactionCount()];
        double[][] jac = new double[n][n];
        network.drift(x, params, f, work);
        double norm = maxAbs(f);
        for (int iteration = 0; iteration < MAX_ITERATIONS && norm > 0.0; iteration++) {
            network.jacobian(x, params, jac);
            DecompositionSolver solver = new LUDecomposition(new Array2DRowRealMatrix(jac, false), 1e-300).getSolver();
            if (!solver.isNonSingular()) {
                break;
            }
            RealVector step = solver.solve(new ArrayRealVector(f, false));
            double lambda = 1.0;
            double trialNorm = Double.POSITIVE_INFINITY;
            for (int h = 0; h <= MAX_HALVINGS; h++) {
                for (int i = 0; i < n; i++) {
                    trial[i] = x[i] - lambda * step.getEntry(i);
                }
                network.drift(trial, params, f, work);
                trialNorm = maxAbs(f);
                if (trialNorm < norm) {
                    break;
                }
                lambda *= 0.5;
            }
            if (!(trialNorm < norm)) {
                break;
            }
            System.arraycopy(trial, 0, x, 0, n);
            norm = trialNorm;
            if (outside(x, lower, upper)) {
                return null;
            }
        }
        return norm <= residualTolerance * (1.0 + maxAbs(x)) ? x : null;
    }

    private static boolean outside(double[] x, double[] lower, double[] upper) {
        for (int i = 0; i < x.length; i++) {
            double width = upper[i] - lower[i];
            double margin = Double.isFinite(width) ? 0.5 * width : 0.0;
            if (!Double.isFinite(x[i]) || x[i] < lower[i] - margin || x[i] > upper[i] + margin) {
                return true;
            }
        }
        return false;
    }

    private static boolean inside(double[] x, double[] lower, double[] upper) {
        for (int i = 0; i < x.length; i++) {
            double slack = 1e-9 * (upper[i] - lower[i]);
            if (x[i] < lower[i] - slack || x[i] > upper[i] + slack) {
                return false;
            }
        }
        return true;
    }

    private static boolean isNew(double[] root, List<double[]> roots) {
        for (double[] other : roots) {
            double distance = 0.0;
            double scale = 1.0;
            for (int i = 0; i < root.length; i++) {
                distance = Math.max(distance, Math.abs(root[i] - other[i]));
                scale = Math.max(scale, Math.abs(root[i]));
            }
            if (distance <= 1e-7 * scale) {
                return false;
            }
        }
        return true;
    }

    private static double maxAbs(double[] v) {
        double m = 0.0;
        for (double value : v) {
            m = Math.max(m, Math.abs(value));
        }
        return m;
    }
}
