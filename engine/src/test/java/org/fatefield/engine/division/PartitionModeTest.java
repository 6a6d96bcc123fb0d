package org.fatefield.engine.division;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.random.RandomStreams;
import org.hipparchus.distribution.discrete.BinomialDistribution;
import org.hipparchus.stat.inference.ChiSquareTest;
import org.junit.jupiter.api.Test;

/**
 * Partitioning at division against the binomial law: a daughter's share of N molecules has
 * mean N/2 and variance N/4 (Huh &amp; Paulsson 2011, Nat. Genet. 43:95).
 */
class PartitionModeTest {

    private static final int SAMPLES = 20_000;

    @Test
    void binomialSharesHaveVarianceNOverFour() {
        long total = 1001;
        UniformRandomProvider rng = RandomStreams.of(42).stream(0);
        double sum = 0;
        double sumSq = 0;
        for (int i = 0; i < SAMPLES; i++) {
            long share = PartitionMode.BINOMIAL.firstShare(total, rng);
            sum += share;
            sumSq += (double) share * share;
        }
        double mean = sum / SAMPLES;
        double variance = (sumSq - SAMPLES * mean * mean) / (SAMPLES - 1);
        double expectedVariance = total / 4.0;
        // Four standard errors: sqrt(V/n) for the mean, V sqrt(2/(n-1)) for the variance.
        assertEquals(total / 2.0, mean, 4 * Math.sqrt(expectedVariance / SAMPLES));
        assertEquals(expectedVariance, variance, 4 * expectedVariance * Math.sqrt(2.0 / (SAMPLES - 1)));
    }

    /**
     * Past 2^20 molecules the share comes from the normal approximation: same mean N/2 and
     * variance N/4 (four standard errors, 20,000 draws), and it takes no time at N = 1e18
     * (exact counting would need 1.6e16 random words).
     */
    @Test
    void hugeCountsKeepTheBinomialMomentsWithoutCountingEachMolecule() {
        for (long total : new long[] {(1L << 20) + 1, 1_000_000_000_000_000_000L}) {
            UniformRandomProvider rng = RandomStreams.of(9).stream(0);
            double sum = 0;
            double sumSq = 0;
            for (int i = 0; i < SAMPLES; i++) {
                double share = PartitionMode.BINOMIAL.firstShare(total, rng) - total / 2.0;
                sum += share;
                sumSq += share * share;
            }
            double mean = sum / SAMPLES;
            double variance = (sumSq - SAMPLES * mean * mean) / (SAMPLES - 1);
            double expectedVariance = total / 4.0;
            assertEquals(0.0, mean, 4 * Math.sqrt(expectedVariance / SAMPLES), "N = " + total);
            assertEquals(expectedVariance, variance, 4 * expectedVariance * Math.sqrt(2.0 / (SAMPLES - 1)),
                    "N = " + total);
            double p = 0.3;
            double volumeShare = Partitioning.binomial(total, p, rng);
            assertEquals(total * p, volumeShare, 6 * Math.sqrt(total * p * (1 - p)), "volume share, N = " + total);
        }
    }

    @Test
    void binomialSharesFollowTheBinomialLawByChiSquare() {
        // Goodness of fit at the 1% level against Hipparchus' binomial distribution; bins
        // pooled in the tails so that every expected count is at least 5 (common practice).
        int total = 130;
        BinomialDistribution law = new BinomialDistribution(total, 0.5);
        UniformRandomProvider rng = RandomStreams.of(7).stream(1);
        int lo = 45;
        int hi = 85;
        long[] observed = new long[hi - lo + 1];
        for (int i = 0; i < SAMPLES; i++) {
            long k = PartitionMode.BINOMIAL.firstShare(total, rng);
            observed[(int) Math.min(Math.max(k, lo), hi) - lo]++;
        }
        double[] expected = new double[observed.length];
        for (int k = lo; k <= hi; k++) {
            double p = k == lo ? law.cumulativeProbability(lo)
                    : k == hi ? 1 - law.cumulativeProbability(hi - 1) : law.probability(k);
            expected[k - lo] = p * SAMPLES;
        }
        assertFalse(new ChiSquareTest().chiSquareTest(expected, observed, 0.01));
    }

    @Test
    void daughtersTogetherHoldExactlyTheMothersMolecules() {
        UniformRandomProvider rng = RandomStreams.of(3).stream(2);
        double omega = 37.0;
        double[] mother = {1.2345, 0.0, 17.5};
        double[] first = new double[3];
        double[] second = new double[3];
        for (int i = 0; i < 1000; i++) {
            PartitionMode.BINOMIAL.split(mother, omega, rng, first, second);
            for (int s = 0; s < 3; s++) {
                long total = Math.round(2 * omega * mother[s]);
                assertEquals(total, Math.round(first[s] * omega) + Math.round(second[s] * omega));
            }
        }
    }

    /**
     * Asymmetric division: share p ~ Beta(m c, (1 - m) c), count ~ Binomial(N, p), so the count is
     * beta-binomial with mean N m and variance N m (1 - m) (1 + (N - 1) / (c + 1)) (the standard
     * beta-binomial moments; Huh &amp; Paulsson 2011 for the partitioning context). Four standard
     * errors, the variance's taken as V sqrt(2.5 / n) to allow for the law's shape (common practice).
     */
    @Test
    void asymmetricSharesAreBetaBinomial() {
        Partitioning partitioning = new Partitioning(PartitionMode.ASYMMETRIC, 0.4, 20);
        UniformRandomProvider rng = RandomStreams.of(5).stream(9);
        double omega = 100;
        double[] mother = {2.0};
        long total = 400;
        double[] first = new double[1];
        double[] second = new double[1];
        double sum = 0;
        double sumSq = 0;
        for (int i = 0; i < SAMPLES; i++) {
            partitioning.split(mother, omega, rng, first, second);
            double n = Math.round(first[0] * omega);
            assertEquals(total, n + Math.round(second[0] * omega), 1e-9);
            sum += n;
            sumSq += n * n;
        }
        double mean = sum / SAMPLES;
        double variance = (sumSq - SAMPLES * mean * mean) / (SAMPLES - 1);
        double expectedMean = total * 0.4;
        double expectedVariance = total * 0.4 * 0.6 * (1 + (total - 1) / 21.0);
        assertEquals(expectedMean, mean, 4 * Math.sqrt(expectedVariance / SAMPLES));
        assertEquals(expectedVariance, variance, 4 * expectedVariance * Math.sqrt(2.5 / SAMPLES));
    }

    @Test
    void equalPartitionHasNoNoise() {
        double[] mother = {0.7, 2.5};
        double[] first = new double[2];
        double[] second = new double[2];
        PartitionMode.EQUAL.split(mother, 100, RandomStreams.of(1).stream(1), first, second);
        assertEquals(0.7, first[0], 0.0);
        assertEquals(2.5, second[1], 0.0);
    }
}
