package org.fatefield.circuits.analysis.continuation;

import java.util.ArrayList;
import java.util.List;

/**
 * The ranges of the continuation parameter over which at least two stable steady states
 * coexist, read off a bifurcation diagram: each stable piece of a branch covers the parameter
 * values between its points, and the number of pieces covering a value is the number of stable
 * states there. A piece's ends are taken at the special point (fold or branch point) where its
 * stability changes when one lies there, otherwise halfway to the neighbouring unstable point; a
 * branch that begins (or ends) a small step from a special point, as one traced from a branch
 * point does, is taken to reach it.
 */
public final class MultistableRanges {

    /** A closed parameter interval. */
    public record Range(double from, double to) {
    }

    private MultistableRanges() {
    }

    /** Ranges where two or more stable steady states coexist, in increasing order, merged when they touch. */
    public static List<Range> of(List<Branch> branches) {
        List<double[]> events = new ArrayList<>();
        List<SpecialPoint> specials = branches.stream().flatMap(b -> b.specials().stream()).toList();
        for (Branch branch : branches) {
            List<BranchPoint> points = branch.points();
            if (points.size() >= 2) {
                // A branch traced from a branch point starts a small step off it: cover that step.
                extendToSpecial(events, points.get(0), points.get(1), specials);
                extendToSpecial(events, points.get(points.size() - 1), points.get(points.size() - 2), specials);
            }
            for (int k = 0; k + 1 < points.size(); k++) {
                BranchPoint a = points.get(k);
                BranchPoint b = points.get(k + 1);
                double pa = a.parameter();
                double pb = b.parameter();
                if (a.stable() && b.stable()) {
                    // A segment across a branch point (where a branch turns back in the parameter,
                    // as a pitchfork's emerging branch does) covers the values up to the point.
                    double inside = specialBetween(specials, a, b);
                    if (Double.isNaN(inside)) {
                        addSegment(events, pa, pb);
                    } else {
                        addSegment(events, pa, inside);
                        addSegment(events, inside, pb);
                    }
                } else if (a.stable() != b.stable()) {
                    // The stability change lies between a and b: cover the stable side up to it.
                    double change = changeBetween(specials, a, b);
                    addSegment(events, a.stable() ? pa : pb, change);
                }
            }
        }
        events.sort((x, y) -> x[0] != y[0] ? Double.compare(x[0], y[0]) : Double.compare(y[1], x[1]));
        List<Range> ranges = new ArrayList<>();
        int count = 0;
        double start = Double.NaN;
        int k = 0;
        while (k < events.size()) {
            double at = events.get(k)[0];
            int before = count;
            while (k < events.size() && events.get(k)[0] == at) {
                count += (int) events.get(k)[1];
                k++;
            }
            if (before < 2 && count >= 2) {
                start = at;
            } else if (before >= 2 && count < 2) {
                add(ranges, start, at);
            }
        }
        return List.copyOf(ranges);
    }

    private static void extendToSpecial(List<double[]> events, BranchPoint end, BranchPoint next,
            List<SpecialPoint> specials) {
        if (!end.stable()) {
            return;
        }
        double step = distance(end.parameter(), end.state(), next.parameter(), next.state());
        for (SpecialPoint s : specials) {
            if (distance(s.parameter(), s.state(), end.parameter(), end.state()) <= 2 * step) {
                addSegment(events, s.parameter(), end.parameter());
                return;
            }
        }
    }

    private static void addSegment(List<double[]> events, double p, double q) {
        double lo = Math.min(p, q);
        double hi = Math.max(p, q);
        if (hi > lo) {
            events.add(new double[] {lo, +1});
            events.add(new double[] {hi, -1});
        }
    }

    /**
     * Parameter of the special point between {@code a} and {@code b} (no farther from either than
     * they are from each other: at a fold both lie on one side of it in the parameter), else the
     * midpoint.
     */
    private static double changeBetween(List<SpecialPoint> specials, BranchPoint a, BranchPoint b) {
        double best = specialBetween(specials, a, b);
        return Double.isNaN(best) ? 0.5 * (a.parameter() + b.parameter()) : best;
    }

    /** Parameter of a special point (of any branch) between a and b, NaN if none. */
    private static double specialBetween(List<SpecialPoint> specials, BranchPoint a, BranchPoint b) {
        double gap = distance(a.parameter(), a.state(), b.parameter(), b.state());
        double best = Double.NaN;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (SpecialPoint s : specials) {
            double da = distance(s.parameter(), s.state(), a.parameter(), a.state());
            double db = distance(s.parameter(), s.state(), b.parameter(), b.state());
            if (da <= gap && db <= gap && da + db < bestDistance) {
                bestDistance = da + db;
                best = s.parameter();
            }
        }
        return best;
    }

    private static double distance(double p, double[] x, double q, double[] y) {
        double sum = (p - q) * (p - q);
        for (int i = 0; i < x.length; i++) {
            sum += (x[i] - y[i]) * (x[i] - y[i]);
        }
        return Math.sqrt(sum);
    }

    private static void add(List<Range> ranges, double from, double to) {
        if (!ranges.isEmpty() && ranges.get(ranges.size() - 1).to() >= from) {
            Range last = ranges.remove(ranges.size() - 1);
            ranges.add(new Range(last.from(), Math.max(last.to(), to)));
        } else if (to > from) {
            ranges.add(new Range(from, to));
        }
    }
}
