package org.fatefield.engine.metrics;

import java.util.Arrays;
import java.util.List;
import org.fatefield.engine.cell.Cell;

/**
 * The pattern of fates that mix (salt and pepper) rather than forming bands: the boundary of
 * "any committed fate" against the default fate, the zone along x where committed fates mix,
 * and the share of each committed fate inside it.
 *
 * <p>The committed boundary is the best step fit: the split along x that puts the most cells on
 * their side (committed on one side, default on the other, whichever orientation fits better;
 * the middle of the best splits if several tie). It is defined for any profile and needs no
 * crossing. A bin of the profile is mixed when it holds at least {@value #MIN_COMMITTED}
 * committed cells and at least two committed fates each make up {@value #MIN_SHARE} or more
 * of them; the zone runs from the first mixed bin's left edge to the last one's right edge. The
 * shares inside it carry Wilson score 95% intervals (Wilson, E. B. 1927, J. Am. Stat. Assoc.
 * 22:209).
 *
 * @param committedBoundary step-fit boundary of the committed fates against the default (µm), NaN without both
 * @param start             left edge of the mixed zone (µm), NaN if no bin is mixed
 * @param end               right edge of the mixed zone (µm), NaN if no bin is mixed
 * @param committedInZone   committed cells inside the zone
 * @param counts            committed cells of each fate inside the zone (the default fate's entry is 0)
 */
public record MixedZone(double committedBoundary, double start, double end, long committedInZone, long[] counts) {

    /** Fewest committed cells in a bin for it to count as mixed. */
    public static final int MIN_COMMITTED = 5;
    /** Smallest share of the committed cells two fates must each have in a mixed bin. */
    public static final double MIN_SHARE = 0.1;

    /** Copies the counts. */
    public MixedZone {
        counts = counts.clone();
    }

    @Override
    public long[] counts() {
        return counts.clone();
    }

    /** Share of fate {@code f} among the committed cells in the zone, NaN if the zone is empty. */
    public double share(int f) {
        return committedInZone == 0 ? Double.NaN : (double) counts[f] / committedInZone;
    }

    /** Wilson score 95% interval {low, high} of fate {@code f}'s share. */
    public double[] shareInterval(int f) {
        return wilson(counts[f], committedInZone, 1.959963984540054);
    }

    /** Wilson score interval of {@code k} successes in {@code n} trials at normal quantile {@code z}. */
    public static double[] wilson(long k, long n, double z) {
        if (n == 0) {
            return new double[] {Double.NaN, Double.NaN};
        }
        double p = (double) k / n;
        double z2 = z * z;
        double centre = (p + z2 / (2 * n)) / (1 + z2 / n);
        double half = z / (1 + z2 / n) * Math.sqrt(p * (1 - p) / n + z2 / (4.0 * n * n));
        return new double[] {centre - half, centre + half};
    }

    /** The mixed zone of {@code cells} (fate indices below {@code fateCount}, the last the default) in {@code profile}'s bins. */
    public static MixedZone of(List<Cell> cells, int fateCount, FateProfile profile, double width) {
        int defaultFate = fateCount - 1;
        double boundary = stepFit(cells, defaultFate);
        int bins = profile.centres().length;
        double w = width / bins;
        long[][] byBin = new long[bins][fateCount];
        for (Cell c : cells) {
            if (c.fate() >= 0) {
                byBin[Math.min(bins - 1, Math.max(0, (int) (c.x() / w)))][c.fate()]++;
            }
        }
        int first = -1;
        int last = -1;
        for (int b = 0; b < bins; b++) {
            long committed = 0;
            for (int f = 0; f < defaultFate; f++) {
                committed += byBin[b][f];
            }
            int sharing = 0;
            for (int f = 0; f < defaultFate; f++) {
                if (committed > 0 && byBin[b][f] >= MIN_SHARE * committed) {
                    sharing++;
                }
            }
            if (committed >= MIN_COMMITTED && sharing >= 2) {
                first = first < 0 ? b : first;
                last = b;
            }
        }
        long[] counts = new long[fateCount];
        long inZone = 0;
        if (first < 0) {
            return new MixedZone(boundary, Double.NaN, Double.NaN, 0, counts);
        }
        for (int b = first; b <= last; b++) {
            for (int f = 0; f < defaultFate; f++) {
                counts[f] += byBin[b][f];
                inZone += byBin[b][f];
            }
        }
        return new MixedZone(boundary, first * w, (last + 1) * w, inZone, counts);
    }

    /** The best step fit of committed (fate other than the default) against default cells along x. */
    static double stepFit(List<Cell> cells, int defaultFate) {
        double[][] points = new double[cells.size()][];
        int k = 0;
        for (Cell c : cells) {
            if (c.fate() >= 0) {
                points[k++] = new double[] {c.x(), c.fate() == defaultFate ? 0 : 1};
            }
        }
        return stepFit(Arrays.copyOf(points, k));
    }

    /** The step fit of (x, 1 = committed / 0 = default) points; NaN unless both kinds are present. */
    static double stepFit(double[][] points) {
        Arrays.sort(points, (a, b) -> Double.compare(a[0], b[0]));
        int n = points.length;
        long committed = Arrays.stream(points).filter(p -> p[1] == 1).count();
        if (committed == 0 || committed == n) {
            return Double.NaN;
        }
        // Split s puts points[0..s) on the left. Committed-left score: committed left + default right.
        long left = 0;
        long bestScore = -1;
        int bestFirst = 0;
        int bestLast = 0;
        for (int s = 0; s <= n; s++) {
            if (s > 0 && s < n && points[s][0] == points[s - 1][0]) {
                left += (long) points[s - 1][1];
                continue;
            }
            if (s > 0) {
                left += (long) points[s - 1][1];
            }
            long defaultRight = (n - s) - (committed - left);
            long leftScore = left + defaultRight;
            long rightScore = n - leftScore;
            long score = Math.max(leftScore, rightScore);
            if (score > bestScore) {
                bestScore = score;
                bestFirst = s;
                bestLast = s;
            } else if (score == bestScore) {
                bestLast = s;
            }
        }
        return 0.5 * (position(points, bestFirst) + position(points, bestLast));
    }

    /** x of the split before point {@code s}: midway between its neighbours (the outermost point at the ends). */
    private static double position(double[][] points, int s) {
        if (s == 0) {
            return points[0][0];
        }
        if (s == points.length) {
            return points[points.length - 1][0];
        }
        return 0.5 * (points[s - 1][0] + points[s][0]);
    }
}
