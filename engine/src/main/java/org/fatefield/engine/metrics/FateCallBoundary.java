package org.fatefield.engine.metrics;

import java.util.ArrayList;
import java.util.List;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.BranchPoint;
import org.fatefield.engine.fate.FateClassifier;

/**
 * Where along the control parameter a stable steady state first satisfies a fate rule: the
 * boundary of the fate as the fate calls see it, which can lie well inside the bistable range
 * when a rule asks for more than "on the high branch".
 *
 * <p>Each traced branch is walked point by point; between two consecutive stable points whose
 * fates differ, the change is located by bisection along the chord between them (the steady
 * states are smooth there, so the error is of the order of the chord's deviation, below 1e-4
 * of the range with the fine continuation step used). A stretch of stable states that begins
 * (at a fold or branch point) already inside a fate enters it there.
 *
 * @param fate         index of the fate entered
 * @param controlValue control-parameter value where a stable steady state enters it
 */
public record FateCallBoundary(int fate, double controlValue) {

    /** Every entry of a stable steady state into a fate other than the default, by control value. */
    public static List<FateCallBoundary> of(List<Branch> branches, FateClassifier fates) {
        int defaultFate = fates.fateCount() - 1;
        List<FateCallBoundary> out = new ArrayList<>();
        for (Branch branch : branches) {
            List<BranchPoint> points = branch.points();
            for (int k = 0; k < points.size(); k++) {
                BranchPoint b = points.get(k);
                if (!b.stable()) {
                    continue;
                }
                int fb = fates.classify(b.state());
                BranchPoint a = k > 0 ? points.get(k - 1) : null;
                if (a == null || !a.stable()) {
                    if (fb != defaultFate && a != null) {
                        add(out, new FateCallBoundary(fb, b.parameter()));
                    }
                    continue;
                }
                int fa = fates.classify(a.state());
                if (fa != fb) {
                    double value = crossing(a, b, fates);
                    if (fb != defaultFate) {
                        add(out, new FateCallBoundary(fb, value));
                    }
                    if (fa != defaultFate) {
                        add(out, new FateCallBoundary(fa, value));
                    }
                }
            }
        }
        out.sort((x, y) -> x.fate != y.fate ? Integer.compare(x.fate, y.fate)
                : Double.compare(x.controlValue, y.controlValue));
        return out;
    }

    /** The parameter where the fate changes along the chord from {@code a} to {@code b}. */
    private static double crossing(BranchPoint a, BranchPoint b, FateClassifier fates) {
        double[] sa = a.state();
        double[] sb = b.state();
        int fa = fates.classify(sa);
        double lo = 0;
        double hi = 1;
        double[] s = new double[sa.length];
        for (int it = 0; it < 60; it++) {
            double mid = 0.5 * (lo + hi);
            for (int i = 0; i < s.length; i++) {
                s[i] = sa[i] + mid * (sb[i] - sa[i]);
            }
            if (fates.classify(s) == fa) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double t = 0.5 * (lo + hi);
        return a.parameter() + t * (b.parameter() - a.parameter());
    }

    /** Adds {@code entry} unless the same fate's entry at that value is already listed (branches share points). */
    private static void add(List<FateCallBoundary> out, FateCallBoundary entry) {
        for (FateCallBoundary e : out) {
            if (e.fate == entry.fate && Math.abs(e.controlValue - entry.controlValue) <= 1e-6 * (1
                    + Math.abs(entry.controlValue))) {
                return;
            }
        }
        out.add(entry);
    }
}
