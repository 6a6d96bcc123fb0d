package org.fatefield.engine.division;

import org.apache.commons.rng.UniformRandomProvider;

/**
 * How a dividing cell shares its molecules between its two daughters.
 *
 * <p>The partitioning noise of {@link #BINOMIAL} is the variance {@code N/4} of a daughter's
 * count, which adds to expression noise at every division (Huh &amp; Paulsson 2011, Non-genetic
 * heterogeneity from stochastic partitioning at cell division, Nat. Genet. 43:95-100).
 */
public enum PartitionMode {
    /** Each molecule goes to either daughter independently with probability 1/2. */
    BINOMIAL,
    /** Exact halving: the control with no partitioning noise. */
    EQUAL,
    /**
     * Each division draws a share p from a Beta law around a mean, then each molecule goes to the
     * first daughter with probability p: the daughter's count is beta-binomial.
     */
    ASYMMETRIC,
    /**
     * Each molecule goes to the first daughter with probability equal to her share of the
     * mother's volume; with equal volumes this is {@link #BINOMIAL}.
     */
    VOLUME;

    /**
     * Shares a mother's molecules between two daughters.
     *
     * <p>The mother, at division, has twice a newborn's volume and so holds
     * {@code round(2 Omega x)} molecules of a species at concentration {@code x}; a daughter
     * with {@code n} of them has concentration {@code n / Omega}. {@link #EQUAL} gives both
     * daughters exactly the mother's concentrations. Daughters here have equal volumes, so
     * {@link #VOLUME} shares like {@link #BINOMIAL}; {@link Partitioning} handles unequal ones.
     *
     * @param mother     mother's concentrations, not modified
     * @param systemSize molecules per unit concentration in a newborn cell
     * @param rng        the mother's random stream
     * @param first      receives the first daughter's concentrations
     * @param second     receives the second daughter's concentrations
     */
    public void split(double[] mother, double systemSize, UniformRandomProvider rng, double[] first,
            double[] second) {
        for (int i = 0; i < mother.length; i++) {
            if (this == EQUAL) {
                first[i] = mother[i];
                second[i] = mother[i];
            } else {
                long total = Math.round(2.0 * systemSize * Math.max(mother[i], 0.0));
                long share = firstShare(total, rng);
                first[i] = share / systemSize;
                second[i] = (total - share) / systemSize;
            }
        }
    }

    /**
     * Splits {@code total} molecules: returns the first daughter's share (the second gets the rest).
     *
     * @param total molecules in the mother, at least 0
     * @param rng   the mother's random stream
     */
    public long firstShare(long total, UniformRandomProvider rng) {
        if (total < 0) {
            throw new IllegalArgumentException("molecule count must be at least 0, got " + total);
        }
        if (this == EQUAL) {
            return total / 2 + ((total & 1L) == 1L && rng.nextBoolean() ? 1 : 0);
        }
        return fairBinomial(total, rng);
    }

    /**
     * Binomial(n, 1/2) exactly: each uniformly random bit is one fair coin, so the count of set
     * bits in n random bits has exactly this law. Costs n / 64 random words; above
     * {@link Partitioning#EXACT_BINOMIAL_LIMIT} molecules the normal approximation is drawn instead.
     */
    static long fairBinomial(long n, UniformRandomProvider rng) {
        if (n > Partitioning.EXACT_BINOMIAL_LIMIT) {
            return Partitioning.normalBinomial(n, 0.5, rng);
        }
        long count = 0;
        long remaining = n;
        while (remaining >= 64) {
            count += Long.bitCount(rng.nextLong());
            remaining -= 64;
        }
        if (remaining > 0) {
            count += Long.bitCount(rng.nextLong() & ((1L << remaining) - 1));
        }
        return count;
    }
}
