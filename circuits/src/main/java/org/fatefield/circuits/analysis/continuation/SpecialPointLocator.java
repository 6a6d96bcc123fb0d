package org.fatefield.circuits.analysis.continuation;

import java.util.Arrays;
import java.util.function.ToDoubleFunction;
import org.fatefield.circuits.analysis.Spectra;
import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;

/**
 * Locates a special point between two consecutive branch points, checks that it really is one,
 * and classifies it.
 *
 * <p>Location is by the Illinois variant of regula falsi on the arclength, each trial point
 * corrected onto the branch. A located point is listed only if it is verified: the residual of
 * the steady-state equations is below {@code 1e-7 (1 + |x|)}, the point lies within one step of
 * the segment it was bracketed in, and the Jacobian is singular to {@code 1e-6 (1 + |J|)} in the
 * way the type demands (a zero singular value for folds and branch points, a pair of eigenvalues
 * on the imaginary axis with non-zero frequency for Hopf points). Sign changes of a test function
 * caused by a jump between branches, or by a test function's own discontinuities, fail these
 * checks. Branch points are then told apart by their quadratic coefficient (pitchfork when it
 * vanishes), and pitchforks and Hopf points get their criticality ({@link NormalFormCoefficients}).
 */
final class SpecialPointLocator {

    static final double IMAGINARY_TOLERANCE = 1e-9;
    private static final double SINGULAR = 1e-6;
    private static final double SINGULAR_POLISHED = 1e-9;

    private final ParametrisedSystem system;
    private final PseudoArclength arclength;
    private final int n;

    SpecialPointLocator(ParametrisedSystem system, PseudoArclength arclength) {
        this.system = system;
        this.arclength = arclength;
        this.n = system.dimension();
    }

    /** A verified special point and the full (state, parameter) vector where it lies. */
    record Located(SpecialPoint point, double[] y) {
    }

    /**
     * The special point of kind {@code type} (for branch points: either kind) whose test function
     * changes sign between {@code ya} and {@code yb}, or null if none is verified there.
     */
    Located locate(SpecialPointType type, double[] ya, double[] ta, double[] yb, ToDoubleFunction<double[]> test) {
        double[] diff = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            diff[i] = yb[i] - ya[i];
        }
        double a = 0;
        double b = Vectors.dot(diff, ta);
        double fa = test.applyAsDouble(ya);
        double fb = test.applyAsDouble(yb);
        double[] best = fb == 0 ? yb : ya;
        int side = 0;
        for (int k = 0; k < 100 && fa != 0 && fb != 0; k++) {
            double c = (a * fb - b * fa) / (fb - fa);
            double[] yc = arclength.correct(Vectors.add(ya, ta, c), ta);
            if (yc == null) {
                // Exactly at a branch point the bordered corrector matrix is singular: step aside.
                yc = arclength.correct(Vectors.add(ya, ta, c + 1e-9 * (b - a)), ta);
            }
            if (yc == null) {
                break;
            }
            double fc = test.applyAsDouble(yc);
            best = yc;
            if (fc == 0) {
                break;
            }
            if (fc * fb > 0) {
                b = c;
                fb = fc;
                if (side == -1) {
                    fa *= 0.5;
                }
                side = -1;
            } else {
                a = c;
                fa = fc;
                if (side == 1) {
                    fb *= 0.5;
                }
                side = 1;
            }
            if (Math.abs(b - a) <= 1e-13 * (1 + Math.abs(b))) {
                break;
            }
        }
        return verified(type, best, ya, yb);
    }

    private Located verified(SpecialPointType type, double[] located, double[] ya, double[] yb) {
        double[] y = located;
        if (type != SpecialPointType.HOPF) {
            double[] polished = type == SpecialPointType.SADDLE_NODE ? SpecialPointPolish.fold(system, located)
                    : SpecialPointPolish.branchPoint(system, located);
            if (polished != null && distance(polished, located) <= distance(ya, yb)) {
                y = polished;
            }
        }
        double[] x = Arrays.copyOf(y, n);
        double lambda = y[n];
        double[] residual = new double[n];
        system.value(x, lambda, residual);
        if (!(PseudoArclength.maxAbs(residual) <= 1e-7 * (1 + PseudoArclength.maxAbs(x)))) {
            return null;
        }
        if (!(segmentDistance(y, ya, yb) <= 1.0 * distance(ya, yb) + 1e-12)) {
            return null;
        }
        double[][] jac = new double[n][n];
        system.jacobian(x, lambda, jac);
        double[] singular = new SingularValueDecomposition(new Array2DRowRealMatrix(jac, false)).getSingularValues();
        double scale = 1 + singular[0];
        Complex[] eigen = Spectra.eigenvalues(jac);
        NormalFormCoefficients forms = NormalFormCoefficients.at(system, x, lambda);
        switch (type) {
            case SADDLE_NODE -> {
                if (!(singular[n - 1] <= SINGULAR_POLISHED * scale)) {
                    return null;
                }
                return located(SpecialPointType.SADDLE_NODE, y, eigen, Double.NaN, Criticality.NOT_APPLICABLE,
                        Double.NaN);
            }
            case PITCHFORK, BRANCH_POINT -> {
                if (!(singular[n - 1] <= SINGULAR_POLISHED * scale)) {
                    return null;
                }
                double[] k = forms.branchPointCoefficients();
                boolean symmetric = Math.abs(k[0]) <= 1e-4 * k[2] + 1e-7 * scale;
                if (!symmetric) {
                    return located(SpecialPointType.BRANCH_POINT, y, eigen, Double.NaN, Criticality.NOT_APPLICABLE,
                            Double.NaN);
                }
                return located(SpecialPointType.PITCHFORK, y, eigen, Double.NaN,
                        Criticality.ofCoefficient(k[1], 1e-5 * scale), k[1]);
            }
            case HOPF -> {
                double re = Spectra.criticalPairRealPart(eigen, IMAGINARY_TOLERANCE);
                double omega = Spectra.criticalPairFrequency(eigen, IMAGINARY_TOLERANCE);
                if (!(Math.abs(re) <= SINGULAR * scale) || !(omega > SINGULAR * scale)) {
                    return null;
                }
                double l1 = forms.firstLyapunov(omega);
                return located(SpecialPointType.HOPF, y, eigen, omega, Criticality.ofCoefficient(l1, 1e-5 * scale),
                        l1);
            }
            default -> throw new IllegalArgumentException("cannot locate a " + type.label() + " on a branch");
        }
    }

    private Located located(SpecialPointType type, double[] y, Complex[] eigen, double frequency,
            Criticality criticality, double coefficient) {
        return new Located(new SpecialPoint(type, y[n], Arrays.copyOf(y, n), eigen, frequency, criticality,
                coefficient), y);
    }

    /** Euclidean distance from {@code y} to the segment from {@code a} to {@code b}. */
    static double segmentDistance(double[] y, double[] a, double[] b) {
        double dot = 0;
        double length = 0;
        for (int i = 0; i < y.length; i++) {
            dot += (y[i] - a[i]) * (b[i] - a[i]);
            length += (b[i] - a[i]) * (b[i] - a[i]);
        }
        double t = length > 0 ? Math.max(0, Math.min(1, dot / length)) : 0;
        double d = 0;
        for (int i = 0; i < y.length; i++) {
            double e = y[i] - (a[i] + t * (b[i] - a[i]));
            d += e * e;
        }
        return Math.sqrt(d);
    }

    static double distance(double[] a, double[] b) {
        double d = 0;
        for (int i = 0; i < a.length; i++) {
            d += (a[i] - b[i]) * (a[i] - b[i]);
        }
        return Math.sqrt(d);
    }
}
