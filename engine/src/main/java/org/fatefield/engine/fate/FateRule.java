package org.fatefield.engine.fate;

import java.util.Arrays;

/**
 * A fate and the box of circuit states that defines it: every species with a bound must lie in
 * {@code [min, max)}. NaN means no bound on that side.
 *
 * @param name fate name as written in outputs
 * @param min  lower bound per species (concentration), NaN for none
 * @param max  upper bound per species (concentration), NaN for none
 */
public record FateRule(String name, double[] min, double[] max) {

    /** Validates and copies the bounds. */
    public FateRule {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a fate needs a non-blank name");
        }
        if (min.length != max.length) {
            throw new IllegalArgumentException("fate '" + name + "': bound arrays differ in length");
        }
        min = min.clone();
        max = max.clone();
        for (int i = 0; i < min.length; i++) {
            if (!Double.isNaN(min[i]) && !Double.isNaN(max[i]) && !(max[i] > min[i])) {
                throw new IllegalArgumentException("fate '" + name + "': bounds of species " + i
                        + " leave nothing: min " + min[i] + " is not below max " + max[i]);
            }
        }
    }

    @Override
    public double[] min() {
        return min.clone();
    }

    @Override
    public double[] max() {
        return max.clone();
    }

    /** True if {@code state} satisfies every bound. */
    public boolean matches(double[] state) {
        for (int i = 0; i < min.length; i++) {
            double v = state[i];
            if (v < min[i] || v >= max[i]) {
                return false;
            }
        }
        return true;
    }

    @Override
    public String toString() {
        return name + " min " + Arrays.toString(min) + " max " + Arrays.toString(max);
    }
}
