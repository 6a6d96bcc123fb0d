package org.fatefield.engine.field;

import java.util.Arrays;

/**
 * A function piecewise linear through given points and constant before the first and after the
 * last: a source's amplitude over time (switched on, ramped, pulsed), or a lookup table from
 * morphogen level to a parameter.
 */
public final class PiecewiseLinear {

    /** Always 1. */
    public static final PiecewiseLinear CONSTANT = new PiecewiseLinear(new double[] {0}, new double[] {1});

    private final double[] times;
    private final double[] factors;

    private PiecewiseLinear(double[] times, double[] factors) {
        this.times = times;
        this.factors = factors;
    }

    /**
     * Through the points {@code (xs[i], ys[i])}.
     *
     * @throws IllegalArgumentException unless xs increase strictly and every value is finite
     */
    public static PiecewiseLinear of(double[] xs, double[] ys) {
        if (xs.length == 0 || xs.length != ys.length) {
            throw new IllegalArgumentException("a table needs matching, non-empty lists of points");
        }
        for (int i = 0; i < xs.length; i++) {
            if (i > 0 && !(xs[i] > xs[i - 1])) {
                throw new IllegalArgumentException("table points must be in increasing order, got " + Arrays.toString(xs));
            }
            if (!Double.isFinite(xs[i]) || !Double.isFinite(ys[i])) {
                throw new IllegalArgumentException("table values must be finite, got " + xs[i] + ", " + ys[i]);
            }
        }
        return new PiecewiseLinear(xs.clone(), ys.clone());
    }

    /** The largest value of the function. */
    public double maximum() {
        return Arrays.stream(factors).max().orElseThrow();
    }

    /** The smallest value of the function. */
    public double minimum() {
        return Arrays.stream(factors).min().orElseThrow();
    }

    /** The value at {@code t}. */
    public double at(double t) {
        if (t <= times[0]) {
            return factors[0];
        }
        for (int i = 1; i < times.length; i++) {
            if (t <= times[i]) {
                double w = (t - times[i - 1]) / (times[i] - times[i - 1]);
                return factors[i - 1] + w * (factors[i] - factors[i - 1]);
            }
        }
        return factors[factors.length - 1];
    }

    /** True if the factor never changes. */
    public boolean isConstant() {
        for (double f : factors) {
            if (f != factors[0]) {
                return false;
            }
        }
        return true;
    }
}
