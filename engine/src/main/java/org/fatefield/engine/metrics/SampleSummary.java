package org.fatefield.engine.metrics;

import java.util.Collection;
import org.hipparchus.distribution.continuous.TDistribution;
import org.hipparchus.stat.descriptive.DescriptiveStatistics;

/**
 * Count, mean, sample standard deviation and the Student-t 95% confidence interval of the
 * mean of a set of measurements (replicate tissues, sweep replicates, paired differences),
 * computed by Hipparchus. Values that are not finite (a boundary a tissue did not have) are
 * left out and not counted. With one value the spread and interval are NaN; with none, the
 * mean is too.
 *
 * @param count values used
 * @param mean  their mean
 * @param sd    sample standard deviation (n - 1 in the denominator)
 * @param low   lower end of the 95% interval of the mean
 * @param high  upper end of the 95% interval of the mean
 */
public record SampleSummary(int count, double mean, double sd, double low, double high) {

    /** The summary of the finite entries of {@code values}. */
    public static SampleSummary of(double[] values) {
        DescriptiveStatistics statistics = new DescriptiveStatistics();
        for (double v : values) {
            if (Double.isFinite(v)) {
                statistics.addValue(v);
            }
        }
        int n = (int) statistics.getN();
        if (n == 0) {
            return new SampleSummary(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        double mean = statistics.getMean();
        if (n == 1) {
            return new SampleSummary(1, mean, Double.NaN, Double.NaN, Double.NaN);
        }
        double sd = statistics.getStandardDeviation();
        double half = new TDistribution(n - 1).inverseCumulativeProbability(0.975) * sd / Math.sqrt(n);
        return new SampleSummary(n, mean, sd, mean - half, mean + half);
    }

    /** The summary of {@code values}, as {@link #of(double[])}. */
    public static SampleSummary of(Collection<Double> values) {
        return of(values.stream().mapToDouble(Double::doubleValue).toArray());
    }
}
