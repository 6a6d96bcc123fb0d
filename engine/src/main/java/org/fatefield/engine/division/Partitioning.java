package org.fatefield.engine.division;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.AhrensDieterMarsagliaTsangGammaSampler;

/**
 * How molecules are shared at division, with the parameters of asymmetric division.
 *
 * <p>For {@link PartitionMode#ASYMMETRIC} the first daughter's share p follows a Beta law with
 * mean {@code mean} and concentration {@code alpha + beta = concentration} (drawn as a ratio of two
 * gamma variates), and its molecule count is Binomial(N, p): overall beta-binomial, with variance
 * {@code N m (1 - m) (1 + (N - 1) / (concentration + 1))} (Huh &amp; Paulsson 2011, Nat. Genet.
 * 43:95, for partitioning noise).
 *
 * @param mode          binomial, equal or asymmetric
 * @param mean          mean share of the first daughter (asymmetric only), in (0, 1)
 * @param concentration Beta concentration alpha + beta (asymmetric only), greater than 0
 */
public record Partitioning(PartitionMode mode, double mean, double concentration) {

    /** Validates the asymmetric parameters. */
    public Partitioning {
        if (mode == PartitionMode.ASYMMETRIC && (!(mean > 0 && mean < 1) || !(concentration > 0)
                || Double.isInfinite(concentration))) {
            throw new IllegalArgumentException("asymmetric partitioning needs 0 < mean < 1 and a finite concentration"
                    + " > 0, got mean " + mean + ", concentration " + concentration);
        }
    }

    /** Binomial partitioning with probability 1/2. */
    public static Partitioning binomial() {
        return new Partitioning(PartitionMode.BINOMIAL, 0.5, 1);
    }

    /** Exact halving. */
    public static Partitioning equal() {
        return new Partitioning(PartitionMode.EQUAL, 0.5, 1);
    }

    /**
     * Shares a mother's molecules (see {@link PartitionMode#split}); for asymmetric division one
     * share p is drawn per division and used for every species.
     */
    public void split(double[] mother, double systemSize, UniformRandomProvider rng, double[] first, double[] second) {
        if (mode != PartitionMode.ASYMMETRIC) {
            mode.split(mother, systemSize, rng, first, second);
            return;
        }
        double p = beta(rng);
        for (int i = 0; i < mother.length; i++) {
            long total = Math.round(2.0 * systemSize * Math.max(mother[i], 0.0));
            long share = binomial(total, p, rng);
            first[i] = share / systemSize;
            second[i] = (total - share) / systemSize;
        }
    }

    /** One draw of the Beta(mean * c, (1 - mean) * c) share. */
    double beta(UniformRandomProvider rng) {
        double x = AhrensDieterMarsagliaTsangGammaSampler.of(rng, mean * concentration, 1.0).sample();
        double y = AhrensDieterMarsagliaTsangGammaSampler.of(rng, (1 - mean) * concentration, 1.0).sample();
        return x / (x + y);
    }

    /** Binomial(n, p) by counting successes: exact, and cheap at division's rate. */
    static long binomial(long n, double p, UniformRandomProvider rng) {
        long k = 0;
        for (long i = 0; i < n; i++) {
            if (rng.nextDouble() < p) {
                k++;
            }
        }
        return k;
    }
}
