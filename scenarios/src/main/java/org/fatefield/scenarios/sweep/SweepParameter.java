package org.fatefield.scenarios.sweep;

import java.util.Arrays;

/**
 * One varied scenario value: explicit values, or a range sampled on a linear or logarithmic scale.
 *
 * @param key    scenario key path (as in validation messages), e.g. {@code morphogen.source[1].rate}
 * @param values explicit values (empty when a range is given)
 * @param low    lower end of the range
 * @param high   upper end of the range
 * @param steps  grid points over the range (grid design)
 * @param log    true for a logarithmic scale
 */
public record SweepParameter(String key, double[] values, double low, double high, int steps, boolean log) {

    /** Validates. */
    public SweepParameter {
        values = values.clone();
        if (values.length == 0) {
            if (!(high > low) || (log && !(low > 0))) {
                throw new IllegalArgumentException("parameter " + key + ": range needs high > low"
                        + (log ? " and low > 0 for a log scale" : "") + ", got " + low + " .. " + high);
            }
            if (steps < 2) {
                throw new IllegalArgumentException("parameter " + key + ": steps must be at least 2, got " + steps);
            }
        }
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    /** True when the parameter lists its values. */
    public boolean listed() {
        return values.length > 0;
    }

    /** Grid values: the list, or {@code steps} evenly spaced points (on the chosen scale). */
    public double[] gridValues() {
        if (listed()) {
            return values.clone();
        }
        double[] out = new double[steps];
        for (int i = 0; i < steps; i++) {
            out[i] = at((double) i / (steps - 1));
        }
        return out;
    }

    /** The value at fraction {@code u} of the range (0 to 1); for listed values, the nearest-rank value. */
    public double at(double u) {
        if (listed()) {
            int index = Math.min(values.length - 1, (int) Math.floor(u * values.length));
            return values[index];
        }
        return log ? Math.exp(Math.log(low) + u * (Math.log(high) - Math.log(low))) : low + u * (high - low);
    }

    @Override
    public String toString() {
        return key + (listed() ? Arrays.toString(values) : " in [" + low + ", " + high + "]");
    }
}
