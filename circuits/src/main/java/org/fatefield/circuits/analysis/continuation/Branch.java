package org.fatefield.circuits.analysis.continuation;

import java.util.List;

/**
 * A branch of steady states traced by continuation, in arclength order, with the special points
 * found on it.
 *
 * @param id       branch number within its diagram (0 for the first)
 * @param points   computed points in order
 * @param specials special points in order of occurrence
 */
public record Branch(int id, List<BranchPoint> points, List<SpecialPoint> specials) {

    /** Copies the lists. */
    public Branch {
        points = List.copyOf(points);
        specials = List.copyOf(specials);
    }

    /**
     * Distance (Euclidean in parameter and state together) from the point ({@code parameter},
     * {@code state}) to this branch's polyline: small when the point lies on the branch.
     */
    public double distanceTo(double parameter, double[] state) {
        double best = Double.POSITIVE_INFINITY;
        for (int k = 0; k + 1 < points.size(); k++) {
            BranchPoint a = points.get(k);
            BranchPoint b = points.get(k + 1);
            double[] pa = a.state();
            double[] pb = b.state();
            double dot = (parameter - a.parameter()) * (b.parameter() - a.parameter());
            double length = (b.parameter() - a.parameter()) * (b.parameter() - a.parameter());
            for (int i = 0; i < pa.length; i++) {
                dot += (state[i] - pa[i]) * (pb[i] - pa[i]);
                length += (pb[i] - pa[i]) * (pb[i] - pa[i]);
            }
            double t = length > 0 ? Math.max(0, Math.min(1, dot / length)) : 0;
            double d = Math.pow(parameter - (a.parameter() + t * (b.parameter() - a.parameter())), 2);
            for (int i = 0; i < pa.length; i++) {
                d += Math.pow(state[i] - (pa[i] + t * (pb[i] - pa[i])), 2);
            }
            best = Math.min(best, Math.sqrt(d));
        }
        if (points.size() == 1) {
            double d = Math.pow(parameter - points.get(0).parameter(), 2);
            double[] s = points.get(0).state();
            for (int i = 0; i < s.length; i++) {
                d += Math.pow(state[i] - s[i], 2);
            }
            best = Math.sqrt(d);
        }
        return best;
    }
}
