package org.fatefield.circuits.inference;

/**
 * One model's accepted particles after a generation, with the evidence estimate at that
 * generation's tolerance.
 *
 * @param model       model index
 * @param theta       accepted parameter values, natural scale, one row per particle
 * @param working     the same in working space
 * @param weights     normalised importance weights
 * @param distances   each particle's distance
 * @param proposals   candidates proposed (those outside the prior's support included)
 * @param simulated   candidates simulated
 * @param accepted    candidates within the tolerance (may exceed the particles kept)
 * @param evidence    estimate of P(distance &lt;= tolerance) under the model's prior predictive
 * @param evidenceSe  its Monte Carlo standard error
 */
public record Population(int model, double[][] theta, double[][] working, double[] weights, double[] distances,
        long proposals, long simulated, long accepted, double evidence, double evidenceSe) {

    /** Particles kept. */
    public int size() {
        return weights.length;
    }

    /** Effective sample size of the weights, 1 / sum w^2 (Kong, Liu &amp; Wong 1994). */
    public double effectiveSampleSize() {
        double sum = 0;
        for (double w : weights) {
            sum += w * w;
        }
        return sum > 0 ? 1 / sum : 0;
    }

    /** The particle a uniform draw {@code u} in [0, 1) picks by weight (inverse of the weights' cumulative sum). */
    public int pick(double u) {
        return pick(weights, u);
    }

    /** The index {@code u} in [0, 1) picks from normalised {@code weights} by their cumulative sum. */
    static int pick(double[] weights, double u) {
        double cumulative = 0;
        for (int j = 0; j < weights.length; j++) {
            cumulative += weights[j];
            if (u < cumulative) {
                return j;
            }
        }
        return weights.length - 1;
    }

    /** Weighted mean of parameter {@code a} on the natural scale. */
    public double mean(int a) {
        double m = 0;
        for (int j = 0; j < weights.length; j++) {
            m += weights[j] * theta[j][a];
        }
        return m;
    }

    /** Weighted variance of parameter {@code a} on the natural scale. */
    public double variance(int a) {
        double m = mean(a);
        double v = 0;
        for (int j = 0; j < weights.length; j++) {
            double d = theta[j][a] - m;
            v += weights[j] * d * d;
        }
        return v;
    }

    /** The weighted {@code p}-quantile of parameter {@code a} (natural scale), by the weighted empirical CDF. */
    public double quantile(int a, double p) {
        Integer[] order = new Integer[weights.length];
        for (int j = 0; j < order.length; j++) {
            order[j] = j;
        }
        java.util.Arrays.sort(order, (x, y) -> Double.compare(theta[x][a], theta[y][a]));
        double cumulative = 0;
        for (Integer j : order) {
            cumulative += weights[j];
            if (cumulative >= p) {
                return theta[j][a];
            }
        }
        return theta[order[order.length - 1]][a];
    }
}
