package org.fatefield.engine.metrics;

import java.util.Arrays;
import java.util.List;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.tissue.Tissue;

/**
 * Fractions of each fate in bins along the gradient axis (x): the pattern a modeler reads off a
 * tissue, and the input of boundary estimates.
 *
 * @param centres   bin centres along x (µm)
 * @param counts    cells per bin
 * @param fractions {@code fractions[f][b]}: fraction of bin b's cells in fate f (NaN for empty bins)
 */
public record FateProfile(double[] centres, int[] counts, double[][] fractions) {

    /**
     * The profile of {@code tissue}'s live cells in bins about two cell diameters wide: the
     * tissue width over {@code round(width / (4 r))} bins, at least 10 and at most 60, so a bin
     * holds enough cells for a fraction and the boundary is still resolved.
     */
    public static FateProfile of(Tissue tissue) {
        double width = tissue.spec().width();
        int bins = (int) Math.max(10, Math.min(60, Math.round(width / (4 * tissue.spec().growth().cellRadius()))));
        return of(tissue.cells(), tissue.spec().fates().fateCount(), width, bins);
    }

    /**
     * Bins {@code [0, width)} into {@code bins} equal bins and counts each fate.
     *
     * @param fateCount number of fates (cells' fate indices run below it)
     */
    public static FateProfile of(List<Cell> cells, int fateCount, double width, int bins) {
        if (bins < 2) {
            throw new IllegalArgumentException("a profile needs at least 2 bins, got " + bins);
        }
        double w = width / bins;
        int[] counts = new int[bins];
        int[][] byFate = new int[fateCount][bins];
        for (Cell cell : cells) {
            int b = Math.min(bins - 1, Math.max(0, (int) (cell.x() / w)));
            counts[b]++;
            if (cell.fate() >= 0) {
                byFate[cell.fate()][b]++;
            }
        }
        return fromCounts(width, counts, byFate);
    }

    /** Builds a profile from counts per bin ({@code byFate[f][b]}) over {@code [0, width)}. */
    public static FateProfile fromCounts(double width, int[] counts, int[][] byFate) {
        int bins = counts.length;
        double w = width / bins;
        double[] centres = new double[bins];
        double[][] fractions = new double[byFate.length][bins];
        for (int b = 0; b < bins; b++) {
            centres[b] = (b + 0.5) * w;
            for (int f = 0; f < byFate.length; f++) {
                fractions[f][b] = counts[b] == 0 ? Double.NaN : (double) byFate[f][b] / counts[b];
            }
        }
        return new FateProfile(centres, counts.clone(), fractions);
    }

    /**
     * Every position where fate {@code f}'s fraction crosses {@code level}, by linear
     * interpolation between the centres of consecutive non-empty bins, in order along x.
     */
    public double[] crossings(int f, double level) {
        double[] found = new double[centres.length];
        int n = 0;
        int previous = -1;
        for (int b = 0; b < centres.length; b++) {
            double v = fractions[f][b];
            if (Double.isNaN(v)) {
                continue;
            }
            if (previous >= 0) {
                double u = fractions[f][previous];
                if ((u - level) * (v - level) < 0 || (v == level && u != level)) {
                    double t = (level - u) / (v - u);
                    found[n++] = centres[previous] + t * (centres[b] - centres[previous]);
                }
            }
            previous = b;
        }
        return Arrays.copyOf(found, n);
    }

    /**
     * Where fate {@code f}'s fraction crosses {@code level} if it does so exactly once, else NaN:
     * a fraction that crosses several times (a fate mixed with others, salt and pepper) has no
     * single crossing to report ({@link MixedZone} describes such fates).
     */
    public double crossing(int f, double level) {
        double[] all = crossings(f, level);
        return all.length == 1 ? all[0] : Double.NaN;
    }

    /** Boundary of fate {@code f}: where its fraction crosses 1/2, if it crosses once. */
    public double boundary(int f) {
        return crossing(f, 0.5);
    }

    /** Width of fate {@code f}'s boundary: distance between its single 10% and 90% crossings, else NaN. */
    public double width(int f) {
        return Math.abs(crossing(f, 0.9) - crossing(f, 0.1));
    }
}
