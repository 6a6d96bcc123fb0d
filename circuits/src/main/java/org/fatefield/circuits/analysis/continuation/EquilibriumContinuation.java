package org.fatefield.circuits.analysis.continuation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.ToDoubleFunction;
import org.fatefield.circuits.analysis.Spectra;
import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;

/**
 * Branches of steady states along one parameter, with their stability and special points.
 *
 * <p>Pseudo-arclength continuation ({@link PseudoArclength}; Keller 1977) with an adaptive step.
 * Between consecutive points three test functions are watched (Kuznetsov, Y. A. 2004, Elements of
 * Applied Bifurcation Theory, 3rd ed., Springer, ch. 10; Govaerts, W. 2000, Numerical Methods
 * for Bifurcations of Dynamical Equilibria, SIAM): the parameter component of the tangent
 * (saddle-node folds), the determinant of the bordered Jacobian (simple branch points) and the
 * real part of the complex eigenvalue pair nearest the imaginary axis (Hopf points). A sign change
 * is located by the Illinois variant of regula falsi on the arclength, each trial point corrected
 * onto the branch, to about 1e-10 in the parameter. At a branch point the second branch's
 * direction is the part of the two-dimensional null space of {@code [F_x | F_lambda]} orthogonal to
 * the known tangent (from a singular value decomposition), and it is traced both ways.
 */
public final class EquilibriumContinuation {

    private final ParametrisedSystem system;
    private final ContinuationSettings settings;
    private final PseudoArclength arclength;
    private final SpecialPointLocator locator;
    private final int n;

    private EquilibriumContinuation(ParametrisedSystem system, ContinuationSettings settings) {
        this.system = system;
        this.settings = settings;
        this.arclength = new PseudoArclength(new EquilibriumBranchSystem(system), settings.tolerance(), 12);
        this.locator = new SpecialPointLocator(system, arclength);
        this.n = system.dimension();
    }

    /** A continuation of {@code system} with the given step control. */
    public static EquilibriumContinuation of(ParametrisedSystem system, ContinuationSettings settings) {
        return new EquilibriumContinuation(system, settings);
    }

    /** A branch point found while tracing, with what is needed to switch branches there. */
    private record Crossing(double[] y, double[] tangent) {
    }

    /**
     * The steady-state branch through (near) {@code x0} at {@code lambda0}, followed both ways in
     * {@code [lambdaMin, lambdaMax]}, and, if {@code switchBranches}, the branches emerging from
     * its branch points (and theirs, up to {@code depth} levels).
     */
    public List<Branch> diagram(double[] x0, double lambda0, double lambdaMin, double lambdaMax, boolean switchBranches,
            int depth) {
        return diagram(x0, lambda0, lambdaMin, lambdaMax, switchBranches, depth, List.of());
    }

    /**
     * As {@link #diagram(double[], double, double, double, boolean, int)}, but tracing stops where
     * a branch runs onto one of the {@code known} branches (traced before, say from another start
     * point), so no stretch is traced twice.
     */
    public List<Branch> diagram(double[] x0, double lambda0, double lambdaMin, double lambdaMax, boolean switchBranches,
            int depth, List<Branch> known) {
        List<List<BranchPoint>> before = known.stream().map(Branch::points).toList();
        double[] start = new double[n + 1];
        System.arraycopy(x0, 0, start, 0, n);
        start[n] = lambda0;
        double[] y = null;
        // Fix the parameter first; at a fold that is singular, so then fix one state component.
        for (int fixed = n; fixed >= 0 && y == null; fixed--) {
            double[] normal = new double[n + 1];
            normal[fixed] = 1.0;
            y = arclength.correct(start, normal);
        }
        if (y == null) {
            throw new IllegalArgumentException("no steady state converged from the start point at parameter "
                    + lambda0 + "; start closer to a steady state");
        }
        double span = lambdaMax - lambdaMin;
        if (!(y[n] >= lambdaMin - 1e-9 * span && y[n] <= lambdaMax + 1e-9 * span)) {
            throw new IllegalArgumentException("the circuit has no steady state near its start for the parameter in ["
                    + lambdaMin + ", " + lambdaMax + "]: the nearest one found is at " + y[n]);
        }
        List<Branch> branches = new ArrayList<>();
        List<Crossing> crossings = new ArrayList<>();
        double[] tangent = null;
        // Orient along the parameter first; where the branch is vertical in it, along a state component.
        for (int axis = n; axis >= 0 && tangent == null; axis--) {
            double[] along = new double[n + 1];
            along[axis] = 1.0;
            tangent = arclength.tangent(y, along);
        }
        if (tangent == null) {
            throw new IllegalArgumentException("the steady states through " + Arrays.toString(y) + " do not form a"
                    + " curve that can be continued (the Jacobian is singular in every direction there)");
        }
        branches.add(joinBothWays(y, tangent, lambdaMin, lambdaMax, 0, crossings, before));
        List<Crossing> pending = new ArrayList<>(crossings);
        List<double[]> visited = new ArrayList<>();
        for (int level = 0; switchBranches && level < depth && !pending.isEmpty(); level++) {
            List<Crossing> next = new ArrayList<>();
            for (Crossing crossing : pending) {
                if (seen(crossing.y, visited)) {
                    continue;
                }
                visited.add(crossing.y);
                double[] direction = emergingDirection(crossing.y, crossing.tangent);
                if (direction == null) {
                    continue;
                }
                List<Crossing> found = new ArrayList<>();
                List<List<BranchPoint>> traced = new ArrayList<>(before);
                branches.forEach(b -> traced.add(b.points()));
                Branch emerging = joinBothWays(crossing.y, direction, lambdaMin, lambdaMax, branches.size(), found,
                        traced);
                if (emerging.points().size() > 1) {
                    branches.add(emerging);
                }
                found.removeIf(c -> maxDifference(c.y, crossing.y) < 1e-3);
                next.addAll(found);
            }
            pending = next;
        }
        return withoutRepeatedSpecials(branches);
    }

    /**
     * Each special point listed once: a branch point lies on both branches through it, and a
     * branch that passes through another branch's special point finds it again; the first
     * branch to report it keeps it.
     */
    public static List<Branch> withoutRepeatedSpecials(List<Branch> branches) {
        List<SpecialPoint> listed = new ArrayList<>();
        List<Branch> out = new ArrayList<>();
        for (Branch b : branches) {
            List<SpecialPoint> own = new ArrayList<>();
            for (SpecialPoint s : b.specials()) {
                if (listed.stream().noneMatch(other -> samePoint(s, other))) {
                    own.add(s);
                    listed.add(s);
                }
            }
            out.add(new Branch(b.id(), b.points(), own));
        }
        return out;
    }

    /**
     * True when two special points are one: the same place, and the same kind (a fold found on a
     * branch emerging from a branch point, at that point, counts as the branch point).
     */
    public static boolean samePoint(SpecialPoint a, SpecialPoint b) {
        boolean compatible = a.type() == b.type() || a.type().isBranchPoint() && b.type().isBranchPoint()
                || a.type() == SpecialPointType.SADDLE_NODE && b.type().isBranchPoint()
                || b.type() == SpecialPointType.SADDLE_NODE && a.type().isBranchPoint();
        return compatible && Math.abs(a.parameter() - b.parameter()) <= 1e-6 * (1 + Math.abs(a.parameter()))
                && maxDifference(a.state(), b.state()) <= 1e-4 * (1 + PseudoArclength.maxAbs(a.state()));
    }

    private Branch joinBothWays(double[] y, double[] tangent, double lambdaMin, double lambdaMax, int id,
            List<Crossing> crossings, List<List<BranchPoint>> known) {
        List<BranchPoint> backward = new ArrayList<>();
        List<SpecialPoint> backwardSpecials = new ArrayList<>();
        List<BranchPoint> forward = new ArrayList<>();
        List<SpecialPoint> forwardSpecials = new ArrayList<>();
        boolean closed = trace(y, tangent, lambdaMin, lambdaMax, forward, forwardSpecials, crossings, known);
        if (!closed) {
            List<List<BranchPoint>> knownAndForward = new ArrayList<>(known);
            knownAndForward.add(forward);
            trace(y, Vectors.negate(tangent), lambdaMin, lambdaMax, backward, backwardSpecials, crossings,
                    knownAndForward);
        }
        List<BranchPoint> points = new ArrayList<>();
        for (int i = backward.size() - 1; i >= 1; i--) {
            points.add(backward.get(i));
        }
        points.addAll(forward);
        List<SpecialPoint> specials = new ArrayList<>();
        for (int i = backwardSpecials.size() - 1; i >= 0; i--) {
            specials.add(backwardSpecials.get(i));
        }
        specials.addAll(forwardSpecials);
        return new Branch(id, points, withoutFoldsAtBranchPoints(specials));
    }

    /**
     * A branch that emerges from a pitchfork turns back in the parameter exactly at the branch
     * point, so its fold test fires there too; that turning point is the branch point, not a
     * separate saddle-node, and is dropped.
     */
    private static List<SpecialPoint> withoutFoldsAtBranchPoints(List<SpecialPoint> specials) {
        List<SpecialPoint> kept = new ArrayList<>();
        for (SpecialPoint s : specials) {
            boolean atBranchPoint = s.type() == SpecialPointType.SADDLE_NODE && specials.stream()
                    .anyMatch(other -> other.type().isBranchPoint() && samePoint(s, other));
            if (!atBranchPoint) {
                kept.add(s);
            }
        }
        return kept;
    }

    private static double maxDifference(double[] a, double[] b) {
        double d = 0;
        for (int i = 0; i < a.length; i++) {
            d = Math.max(d, Math.abs(a[i] - b[i]));
        }
        return d;
    }

    /**
     * Traces one way from {@code start} until the range edge, the point budget, a stall, or a
     * stretch already traced; returns true if it stopped on its own earlier points (a closed curve).
     */
    private boolean trace(double[] start, double[] startTangent, double lambdaMin, double lambdaMax,
            List<BranchPoint> points, List<SpecialPoint> specials, List<Crossing> crossings, List<List<BranchPoint>> known) {
        double[] y = start.clone();
        double[] t = startTangent.clone();
        Complex[] eigen = eigenvalues(y);
        points.add(point(y, eigen));
        double h = settings.initialStep();
        while (points.size() < settings.maxPoints()) {
            double[] predicted = Vectors.add(y, t, h);
            double[] next = arclength.correct(predicted, t);
            double[] nextTangent = next == null ? null : arclength.tangent(next, t);
            // A corrector that lands farther than a step from its prediction has jumped to another branch.
            if (next == null || nextTangent == null || Vectors.dot(t, nextTangent) < 0.9
                    || SpecialPointLocator.distance(next, predicted) > h) {
                h *= 0.5;
                if (h < settings.minStep()) {
                    return false;
                }
                continue;
            }
            int iterations = arclength.lastIterations();
            Complex[] nextEigen = eigenvalues(next);
            detect(y, t, eigen, next, nextTangent, nextEigen, specials, crossings);
            if (next[n] < lambdaMin || next[n] > lambdaMax) {
                addBoundaryPoint(y, next, next[n] < lambdaMin ? lambdaMin : lambdaMax, points);
                return false;
            }
            points.add(point(next, nextEigen));
            if (onParallelStretch(next, nextTangent, points, points.size() - 4)) {
                return true;
            }
            if (known.stream().anyMatch(other -> onParallelStretch(next, nextTangent, other, other.size()))) {
                return false;
            }
            y = next;
            t = nextTangent;
            eigen = nextEigen;
            h = Math.min(settings.maxStep(), iterations <= 3 ? 1.5 * h : iterations >= 6 ? 0.7 * h : h);
        }
        return false;
    }

    /** Ends a branch exactly on the edge of the parameter range, by correcting with the parameter fixed there. */
    private void addBoundaryPoint(double[] inside, double[] outside, double bound, List<BranchPoint> points) {
        double s = (bound - inside[n]) / (outside[n] - inside[n]);
        double[] predicted = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            predicted[i] = inside[i] + s * (outside[i] - inside[i]);
        }
        predicted[n] = bound;
        double[] normal = new double[n + 1];
        normal[n] = 1.0;
        double[] edge = arclength.correct(predicted, normal);
        if (edge != null && SpecialPointLocator.distance(edge, predicted) <= SpecialPointLocator.distance(inside, outside)) {
            edge[n] = bound;
            points.add(point(edge, eigenvalues(edge)));
        }
    }

    /**
     * True when {@code y} lies on the polyline {@code points} (its first {@code upTo} points)
     * running parallel to it: the curve is closed or is being traced a second time, so tracing
     * stops there. Branches that cross are not parallel where they meet.
     */
    private static boolean onParallelStretch(double[] y, double[] tangent, List<BranchPoint> points, int upTo) {
        int m = y.length - 1;
        for (int k = 0; k + 1 < upTo; k++) {
            double[] a = full(points.get(k));
            double[] b = full(points.get(k + 1));
            double length = SpecialPointLocator.distance(a, b);
            if (!(length > 0) || SpecialPointLocator.segmentDistance(y, a, b) > 0.25 * length) {
                continue;
            }
            double along = 0;
            for (int i = 0; i <= m; i++) {
                along += (b[i] - a[i]) * tangent[i];
            }
            if (Math.abs(along) >= 0.95 * length) {
                return true;
            }
        }
        return false;
    }

    private static double[] full(BranchPoint p) {
        double[] state = p.state();
        double[] y = Arrays.copyOf(state, state.length + 1);
        y[state.length] = p.parameter();
        return y;
    }

    private void detect(double[] ya, double[] ta, Complex[] ea, double[] yb, double[] tb, Complex[] eb,
            List<SpecialPoint> specials, List<Crossing> crossings) {
        if (Math.signum(ta[n]) * Math.signum(tb[n]) < 0) {
            ToDoubleFunction<double[]> fold = y -> {
                double[] tangent = arclength.tangent(y, ta);
                return tangent == null ? 0.0 : tangent[n];
            };
            add(locator.locate(SpecialPointType.SADDLE_NODE, ya, ta, yb, fold), specials);
        }
        ToDoubleFunction<double[]> branch = y -> arclength.borderedDeterminant(y, ta);
        if (Math.signum(branch.applyAsDouble(ya)) * Math.signum(branch.applyAsDouble(yb)) < 0) {
            SpecialPointLocator.Located at = locator.locate(SpecialPointType.BRANCH_POINT, ya, ta, yb, branch);
            if (add(at, specials)) {
                crossings.add(new Crossing(at.y(), ta.clone()));
            }
        }
        double ha = Spectra.criticalPairRealPart(ea, SpecialPointLocator.IMAGINARY_TOLERANCE);
        double hb = Spectra.criticalPairRealPart(eb, SpecialPointLocator.IMAGINARY_TOLERANCE);
        if (!Double.isNaN(ha) && !Double.isNaN(hb) && Math.signum(ha) * Math.signum(hb) < 0) {
            ToDoubleFunction<double[]> hopf = y -> {
                double value = Spectra.criticalPairRealPart(eigenvalues(y), SpecialPointLocator.IMAGINARY_TOLERANCE);
                return Double.isNaN(value) ? 0.0 : value;
            };
            add(locator.locate(SpecialPointType.HOPF, ya, ta, yb, hopf), specials);
        }
    }

    private static boolean add(SpecialPointLocator.Located located, List<SpecialPoint> specials) {
        if (located == null) {
            return false;
        }
        specials.add(located.point());
        return true;
    }

    /** Direction of the branch crossing at a branch point, orthogonal to the known tangent. */
    private double[] emergingDirection(double[] y, double[] tangent) {
        double[][] jac = arclength.jacobian(y);
        double[][] square = new double[n + 1][n + 1];
        for (int i = 0; i < n; i++) {
            System.arraycopy(jac[i], 0, square[i], 0, n + 1);
        }
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(square, false));
        RealMatrix v = svd.getV();
        double[] best = null;
        double bestNorm = 0;
        for (int column = n - 1; column <= n; column++) {
            double[] candidate = v.getColumn(column);
            double along = Vectors.dot(candidate, tangent);
            for (int i = 0; i <= n; i++) {
                candidate[i] -= along * tangent[i];
            }
            double norm = PseudoArclength.norm(candidate);
            if (norm > bestNorm) {
                bestNorm = norm;
                best = candidate;
            }
        }
        if (best == null || bestNorm < 1e-6) {
            return null;
        }
        for (int i = 0; i <= n; i++) {
            best[i] /= bestNorm;
        }
        return best;
    }

    private Complex[] eigenvalues(double[] y) {
        double[][] jac = new double[n][n];
        system.jacobian(Arrays.copyOf(y, n), y[n], jac);
        return Spectra.eigenvalues(jac);
    }

    private BranchPoint point(double[] y, Complex[] eigen) {
        return new BranchPoint(y[n], Arrays.copyOf(y, n), eigen, Spectra.stable(eigen));
    }

    private static boolean seen(double[] y, List<double[]> visited) {
        for (double[] other : visited) {
            double d = 0;
            for (int i = 0; i < y.length; i++) {
                d = Math.max(d, Math.abs(y[i] - other[i]));
            }
            if (d < 1e-6) {
                return true;
            }
        }
        return false;
    }
}
