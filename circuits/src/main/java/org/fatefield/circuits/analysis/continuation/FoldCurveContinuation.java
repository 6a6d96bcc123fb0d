package org.fatefield.circuits.analysis.continuation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.fatefield.circuits.analysis.Spectra;
import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;

/**
 * The curve of saddle-node folds in a plane of two parameters: the boundary of the bistable
 * region, with cusps where two folds meet.
 *
 * <p>Minimally augmented system (Govaerts, W. 2000, Numerical Methods for Bifurcations of
 * Dynamical Equilibria, SIAM, ch. 4): unknowns {@code (x, mu, nu)}, equations
 * {@code F(x; mu, nu) = 0} and {@code g = 0}, where {@code g} is the last component of the
 * solution of the bordered system {@code [F_x b; c^T 0] [v; g] = [0; 1]} with {@code b}, {@code c}
 * the left and right singular vectors of {@code F_x} at the starting fold. The curve is followed
 * by pseudo-arclength continuation with a finite-difference Jacobian. A cusp is where the fold
 * curve's tangent has no component in either parameter (both turn together).
 */
public final class FoldCurveContinuation {

    private final TwoParameterSystem system;
    private final ContinuationSettings settings;
    private final int n;
    private double[] border;
    private double[] borderLeft;

    private FoldCurveContinuation(TwoParameterSystem system, ContinuationSettings settings) {
        this.system = system;
        this.settings = settings;
        this.n = system.dimension();
    }

    /** A fold-curve continuation of {@code system}. */
    public static FoldCurveContinuation of(TwoParameterSystem system, ContinuationSettings settings) {
        return new FoldCurveContinuation(system, settings);
    }

    /**
     * One point of a fold curve.
     *
     * @param mu    first parameter
     * @param nu    second parameter
     * @param state the fold's steady state
     */
    public record FoldPoint(double mu, double nu, double[] state) {

        /** Copies the state. */
        public FoldPoint {
            state = state.clone();
        }

        @Override
        public double[] state() {
            return state.clone();
        }
    }

    /**
     * A traced fold curve.
     *
     * @param points the curve in order
     * @param cusps  cusps found on it
     */
    public record FoldCurve(List<FoldPoint> points, List<FoldPoint> cusps) {

        /** Copies the lists. */
        public FoldCurve {
            points = List.copyOf(points);
            cusps = List.copyOf(cusps);
        }
    }

    /**
     * The fold curve through the fold at {@code (state, mu)} with the second parameter at
     * {@code nu}, followed both ways inside the box {@code [muMin, muMax] x [nuMin, nuMax]}.
     */
    public FoldCurve trace(double[] state, double mu, double nu, double muMin, double muMax, double nuMin,
            double nuMax) {
        chooseBorders(state, mu, nu);
        UnderdeterminedSystem augmented = new Augmented();
        PseudoArclength arclength = new PseudoArclength(augmented, settings.tolerance(), 15);
        double[] y = new double[n + 2];
        System.arraycopy(state, 0, y, 0, n);
        y[n] = mu;
        y[n + 1] = nu;
        double[] fixNu = new double[n + 2];
        fixNu[n + 1] = 1.0;
        double[] start = arclength.correct(y, fixNu);
        if (start == null) {
            throw new IllegalArgumentException("the start point is not close enough to a fold at (" + mu + ", " + nu + ")");
        }
        double[] up = new double[n + 2];
        up[n + 1] = 1.0;
        double[] tangent = arclength.tangent(start, up);
        if (tangent == null) {
            throw new IllegalStateException("the fold curve has no tangent at its start; try another start");
        }
        List<FoldPoint> backward = new ArrayList<>();
        List<FoldPoint> cusps = new ArrayList<>();
        follow(arclength, start, Vectors.negate(tangent), muMin, muMax, nuMin, nuMax, backward, cusps);
        List<FoldPoint> forward = new ArrayList<>();
        follow(arclength, start, tangent, muMin, muMax, nuMin, nuMax, forward, cusps);
        List<FoldPoint> points = new ArrayList<>();
        for (int i = backward.size() - 1; i >= 1; i--) {
            points.add(backward.get(i));
        }
        points.addAll(forward);
        return new FoldCurve(points, cusps);
    }

    private void follow(PseudoArclength arclength, double[] start, double[] startTangent, double muMin,
            double muMax, double nuMin, double nuMax, List<FoldPoint> points, List<FoldPoint> cusps) {
        double[] y = start.clone();
        double[] t = startTangent.clone();
        points.add(point(y));
        double h = settings.initialStep();
        while (points.size() < settings.maxPoints()) {
            double[] next = arclength.correct(Vectors.add(y, t, h), t);
            double[] nextTangent = next == null ? null : arclength.tangent(next, t);
            if (next == null || nextTangent == null || Vectors.dot(t, nextTangent) < 0.9) {
                h *= 0.5;
                if (h < settings.minStep()) {
                    return;
                }
                continue;
            }
            if (Math.signum(t[n + 1]) * Math.signum(nextTangent[n + 1]) < 0
                    || Math.signum(t[n]) * Math.signum(nextTangent[n]) < 0) {
                double[] cusp = locateCusp(arclength, y, t, next);
                if (cusp != null) {
                    cusps.add(point(cusp));
                }
            }
            if (next[n] < muMin || next[n] > muMax || next[n + 1] < nuMin || next[n + 1] > nuMax) {
                return;
            }
            points.add(point(next));
            int iterations = arclength.lastIterations();
            y = next;
            t = nextTangent;
            h = Math.min(settings.maxStep(), iterations <= 3 ? 1.5 * h : iterations >= 6 ? 0.7 * h : h);
        }
    }

    /** Bisection on the parameter-plane speed; a cusp only if both parameter components vanish. */
    private double[] locateCusp(PseudoArclength arclength, double[] ya, double[] ta, double[] yb) {
        double[] diff = new double[n + 2];
        for (int i = 0; i < n + 2; i++) {
            diff[i] = yb[i] - ya[i];
        }
        double a = 0;
        double b = Vectors.dot(diff, ta);
        int component = Math.signum(ta[n + 1]) * Math.signum(arclength.tangent(yb, ta)[n + 1]) < 0 ? n + 1 : n;
        double fa = ta[component];
        double[] best = null;
        double[] bestTangent = null;
        for (int k = 0; k < 60; k++) {
            double c = 0.5 * (a + b);
            double[] yc = arclength.correct(Vectors.add(ya, ta, c), ta);
            if (yc == null) {
                return null;
            }
            double[] tc = arclength.tangent(yc, ta);
            if (tc == null) {
                return null;
            }
            best = yc;
            bestTangent = tc;
            if (Math.signum(tc[component]) == Math.signum(fa)) {
                a = c;
            } else {
                b = c;
            }
        }
        boolean both = bestTangent != null && Math.hypot(bestTangent[n], bestTangent[n + 1]) < 1e-3;
        return both ? best : null;
    }

    private FoldPoint point(double[] y) {
        return new FoldPoint(y[n], y[n + 1], Arrays.copyOf(y, n));
    }

    private void chooseBorders(double[] state, double mu, double nu) {
        double[][] jac = new double[n][n];
        system.jacobian(state, mu, nu, jac);
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(jac, false));
        RealMatrix u = svd.getU();
        RealMatrix v = svd.getV();
        borderLeft = u.getColumn(n - 1);
        border = v.getColumn(n - 1);
    }

    /** The fold test function g at (x; mu, nu). */
    private double foldFunction(double[] x, double mu, double nu) {
        double[][] jac = new double[n][n];
        system.jacobian(x, mu, nu, jac);
        double[][] m = new double[n + 1][n + 1];
        for (int i = 0; i < n; i++) {
            System.arraycopy(jac[i], 0, m[i], 0, n);
            m[i][n] = borderLeft[i];
            m[n][i] = border[i];
        }
        DecompositionSolver solver = new LUDecomposition(new Array2DRowRealMatrix(m, false), 1e-300).getSolver();
        double[] rhs = new double[n + 1];
        rhs[n] = 1.0;
        return solver.solve(new ArrayRealVector(rhs, false)).getEntry(n);
    }

    /** Eigenvalues of the Jacobian at a fold point (one is zero there). */
    public Complex[] eigenvalues(FoldPoint point) {
        double[][] jac = new double[n][n];
        system.jacobian(point.state(), point.mu(), point.nu(), jac);
        return Spectra.eigenvalues(jac);
    }

    /** The augmented system (F, g) in (x, mu, nu) with a central-difference Jacobian. */
    private final class Augmented implements UnderdeterminedSystem {

        @Override
        public int equations() {
            return n + 1;
        }

        @Override
        public void residual(double[] y, double[] out) {
            double[] x = Arrays.copyOf(y, n);
            double[] f = new double[n];
            system.value(x, y[n], y[n + 1], f);
            System.arraycopy(f, 0, out, 0, n);
            out[n] = foldFunction(x, y[n], y[n + 1]);
        }

        @Override
        public void jacobian(double[] y, double[][] out) {
            double[] up = new double[n + 1];
            double[] down = new double[n + 1];
            for (int k = 0; k < n + 2; k++) {
                double h = 1e-7 * (1 + Math.abs(y[k]));
                double[] yu = y.clone();
                double[] yd = y.clone();
                yu[k] += h;
                yd[k] -= h;
                residual(yu, up);
                residual(yd, down);
                for (int i = 0; i <= n; i++) {
                    out[i][k] = (up[i] - down[i]) / (2 * h);
                }
            }
        }
    }
}
