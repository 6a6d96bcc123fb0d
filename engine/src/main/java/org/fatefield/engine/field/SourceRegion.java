package org.fatefield.engine.field;

/**
 * A rectangle of the domain where morphogen is synthesised at a constant rate.
 *
 * @param x0   left edge (µm)
 * @param y0   bottom edge (µm)
 * @param x1   right edge (µm), greater than x0
 * @param y1   top edge (µm), greater than y0
 * @param rate      synthesis rate (concentration / h), at least 0
 * @param amplitude factor on the rate over time
 */
public record SourceRegion(double x0, double y0, double x1, double y1, double rate, PiecewiseLinear amplitude) {

    /** A source with a constant rate. */
    public SourceRegion(double x0, double y0, double x1, double y1, double rate) {
        this(x0, y0, x1, y1, rate, PiecewiseLinear.CONSTANT);
    }

    /** Validates the rectangle and the rate. */
    public SourceRegion {
        if (!(x1 > x0) || !(y1 > y0)) {
            throw new IllegalArgumentException("source region must have x1 > x0 and y1 > y0, got ["
                    + x0 + ", " + y0 + ", " + x1 + ", " + y1 + "]");
        }
        if (!(rate >= 0.0) || Double.isInfinite(rate)) {
            throw new IllegalArgumentException("source rate must be finite and at least 0, got " + rate);
        }
    }

    /** Fraction of the grid square [gx0, gx0 + h] x [gy0, gy0 + h] that this region covers. */
    double coverage(double gx0, double gy0, double h) {
        double wx = Math.max(0.0, Math.min(x1, gx0 + h) - Math.max(x0, gx0));
        double wy = Math.max(0.0, Math.min(y1, gy0 + h) - Math.max(y0, gy0));
        return wx * wy / (h * h);
    }
}
