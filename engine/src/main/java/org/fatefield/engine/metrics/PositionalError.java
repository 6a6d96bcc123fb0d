package org.fatefield.engine.metrics;

import org.fatefield.engine.field.AmplitudeVariability;

/**
 * The positional error a gradient imposes on a boundary read from it when its amplitude varies
 * from tissue to tissue: {@code sigma_x = sigma_c / |dc/dx|} at the boundary (Gregor, Tank,
 * Wieschaus and Bialek 2007, Cell 130:153). A lognormal amplitude factor shifts {@code ln c} by
 * the same amount everywhere, so {@code sigma_c / c = sd(ln factor)} and
 * {@code sigma_x = sd(ln factor) / |d ln c / dx|}; for an exponential gradient
 * {@code c0 exp(-x / lambda)} this is exactly {@code lambda sd(ln c0)}, with no linearisation.
 *
 * <p>The slope of {@code ln c} is taken from the row-averaged field between the two grid columns
 * around the boundary. This is the part of the error the gradient alone predicts: expression
 * noise and the fate rules add their own spread, which the replicate SD includes.
 */
public final class PositionalError {

    private PositionalError() {
    }

    /**
     * The predicted positional error (µm) at {@code x} for row-averaged field values
     * {@code columns} on a grid of {@code spacing}, for amplitude variability of coefficient of
     * variation {@code cv}; NaN where it is not defined (no variability, x off the grid or
     * outside two column centres, a non-positive field, or a flat field).
     */
    public static double predicted(double[] columns, double spacing, double x, double cv) {
        if (!(cv > 0) || !Double.isFinite(x)) {
            return Double.NaN;
        }
        double u = x / spacing - 0.5;
        int i = (int) Math.floor(u);
        if (i < 0 || i + 1 >= columns.length || !(columns[i] > 0) || !(columns[i + 1] > 0)) {
            return Double.NaN;
        }
        double slope = (Math.log(columns[i + 1]) - Math.log(columns[i])) / spacing;
        if (slope == 0) {
            return Double.NaN;
        }
        return AmplitudeVariability.sigmaOfLog(cv) / Math.abs(slope);
    }
}
