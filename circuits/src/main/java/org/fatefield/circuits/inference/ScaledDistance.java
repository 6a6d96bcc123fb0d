package org.fatefield.circuits.inference;

import java.util.Arrays;

/**
 * The distance between simulated and observed summary statistics: the Euclidean norm of the
 * differences, each divided by the observation's uncertainty, d = sqrt(sum_i ((s_i - o_i) /
 * sigma_i)^2). A statistic the simulation leaves undefined (NaN) makes the distance infinite, so
 * the particle is never accepted.
 */
public final class ScaledDistance {

    private final double[] observed;
    private final double[] scale;

    /** Validates: as many scales as observations, every one finite and positive. */
    public ScaledDistance(double[] observed, double[] scale) {
        if (observed.length == 0 || observed.length != scale.length) {
            throw new IllegalArgumentException("need one uncertainty per observed statistic and at least one statistic,"
                    + " got " + observed.length + " values and " + scale.length + " uncertainties");
        }
        for (int i = 0; i < observed.length; i++) {
            if (!Double.isFinite(observed[i]) || !(scale[i] > 0) || !Double.isFinite(scale[i])) {
                throw new IllegalArgumentException("statistic " + (i + 1) + ": the value must be finite and its"
                        + " uncertainty finite and positive, got " + observed[i] + " +- " + scale[i]);
            }
        }
        this.observed = observed.clone();
        this.scale = scale.clone();
    }

    /** Number of statistics. */
    public int size() {
        return observed.length;
    }

    /** The observed values. */
    public double[] observed() {
        return observed.clone();
    }

    /** The distance of {@code simulated} from the observations; infinite for a null or undefined row. */
    public double of(double[] simulated) {
        if (simulated == null || simulated.length != observed.length) {
            return Double.POSITIVE_INFINITY;
        }
        double sum = 0;
        for (int i = 0; i < observed.length; i++) {
            double z = (simulated[i] - observed[i]) / scale[i];
            if (!Double.isFinite(z)) {
                return Double.POSITIVE_INFINITY;
            }
            sum += z * z;
        }
        return Math.sqrt(sum);
    }

    @Override
    public String toString() {
        return "ScaledDistance" + Arrays.toString(observed);
    }
}
