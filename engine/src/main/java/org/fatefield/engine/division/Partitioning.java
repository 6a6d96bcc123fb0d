package org.fatefield.engine.division;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.AhrensDieterMarsagliaTsangGammaSampler;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;

/**
 * How molecules are shared at division, with the parameters of asymmetric division.
 *
 * <p>For {@link PartitionMode#ASYMMETRIC} the first daughter's share p follows a Beta law with
 * mean {@code mean} and concentration {@code alpha + beta = concentration} (drawn as a ratio of two
 * gamma variates), and its molecule count is Binomial(N, p): overall beta-binomial, with variance
 * {@code N m (1 - m) (1 + (N - 1) / (concentration + 1))} (Huh &amp; Paulsson 2011, Nat. Genet.
 * 43:95, for partitioning noise).
 *
 * <p>For {@link PartitionMode#VOLUME} each molecule goes to the first daughter with probability
 * equal to her share of the mother's volume (see {@link CellSize}).
 *
 * @param mode          binomial, equal, asymmetric or volume
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
     * Shares the molecules of a mother at the end of a fixed-size cycle (volume 2, equal halves);
     * see {@link #split(double[], double, double, double, UniformRandomProvider, double[], double[])}.
     */
    public void split(double[] mother, double systemSize, UniformRandomProvider rng, double[] first, double[] second) {
        split(mother, 2.0, 0.5, systemSize, rng, first, second);
    }

    /**
     * Shares a mother's molecules between daughters of unequal volume.
     *
     * <p>A mother of volume {@code V} (in newborn volumes) at concentration {@code x} holds
     * {@code N = round(Omega V x)} molecules; the first daughter gets {@code n} of them, and its
     * concentration is {@code n / (Omega f V)}, the second's {@code (N - n) / (Omega (1 - f) V)}.
     * {@code n} is Binomial(N, 1/2) for binomial, Binomial(N, f) for volume (each molecule in the
     * daughter whose space it happens to occupy), beta-binomial for asymmetric (one share p per
     * division, used for every species); equal gives both daughters the mother's concentrations
     * exactly.
     *
     * @param mother     mother's concentrations, not modified
     * @param volume     mother's volume at division, in newborn volumes
     * @param fraction   first daughter's share of that volume, in (0, 1)
     * @param systemSize molecules per unit concentration in a volume of 1
     * @param rng        the mother's random stream
     * @param first      receives the first daughter's concentrations
     * @param second     receives the second daughter's concentrations
     */
    public void split(double[] mother, double volume, double fraction, double systemSize, UniformRandomProvider rng,
            double[] first, double[] second) {
        if (mode == PartitionMode.EQUAL) {
            System.arraycopy(mother, 0, first, 0, mother.length);
            System.arraycopy(mother, 0, second, 0, mother.length);
            return;
        }
        double p = switch (mode) {
            case ASYMMETRIC -> beta(rng);
            case VOLUME -> fraction;
            default -> 0.5;
        };
        double firstMolecules = systemSize * volume * fraction;
        double secondMolecules = systemSize * volume * (1.0 - fraction);
        for (int i = 0; i < mother.length; i++) {
            long total = Math.round(systemSize * volume * Math.max(mother[i], 0.0));
            long share = p == 0.5 ? PartitionMode.fairBinomial(total, rng) : binomial(total, p, rng);
            first[i] = share / firstMolecules;
            second[i] = (total - share) / secondMolecules;
        }
    }

    /** One draw of the Beta(mean * c, (1 - mean) * c) share. */
    double beta(UniformRandomProvider rng) {
        return betaShare(rng, mean, concentration);
    }

    /** One draw from the Beta law of mean {@code mean} and concentration {@code alpha + beta = concentration}. */
    static double betaShare(UniformRandomProvider rng, double mean, double concentration) {
        double x = AhrensDieterMarsagliaTsangGammaSampler.of(rng, mean * concentration, 1.0).sample();
        double y = AhrensDieterMarsagliaTsangGammaSampler.of(rng, (1 - mean) * concentration, 1.0).sample();
        return x / (x + y);
    }

    /**
     * Molecule counts above which a binomial share is drawn from its normal approximation with
     * continuity correction, {@code round(np + sqrt(np(1-p)) z)} clamped to [0, n]: exact
     * counting would take n random numbers (a cell holding 1e18 molecules never divides), and at
     * 2^20 molecules the approximation's error in the distribution function is below 1e-3
     * (Berry-Esseen bound, 0.4748 (p^2 + q^2) / sqrt(npq); Shevtsova 2011) while the share's
     * relative spread is already below 0.1%.
     */
    static final long EXACT_BINOMIAL_LIMIT = 1L << 20;

    /** Binomial(n, p) by counting successes: exact, and cheap at division's rate; normal above {@link #EXACT_BINOMIAL_LIMIT}. */
    static long binomial(long n, double p, UniformRandomProvider rng) {
        if (n > EXACT_BINOMIAL_LIMIT) {
            return normalBinomial(n, p, rng);
        }
        long k = 0;
        for (long i = 0; i < n; i++) {
            if (rng.nextDouble() < p) {
                k++;
            }
        }
        return k;
    }

    /** The normal approximation of Binomial(n, p), rounded and clamped to [0, n]. */
    static long normalBinomial(long n, double p, UniformRandomProvider rng) {
        double mean = n * p;
        double sd = Math.sqrt(n * p * (1 - p));
        double k = Math.rint(mean + sd * ZigguratSampler.NormalizedGaussian.of(rng).sample());
        return (long) Math.max(0, Math.min(n, k));
    }
}
