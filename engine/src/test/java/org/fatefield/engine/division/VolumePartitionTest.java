package org.fatefield.engine.division;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.random.RandomStreams;
import org.junit.jupiter.api.Test;

/**
 * Sharing molecules between daughters of unequal volume, against the binomial law: with a
 * volume share f, each of N molecules lands in the first daughter with probability f, so her
 * count has mean N f and variance N f (1 - f), and her concentration is on average the mother's;
 * sharing with probability 1/2 instead leaves the small daughter richer by a factor 1 / (2 f)
 * (Huh &amp; Paulsson 2011, Nat. Genet. 43:95, for partitioning by volume). Every check uses
 * 20 000 divisions and four standard errors (two-sided p below 1e-4) on a fixed seed.
 */
class VolumePartitionTest {

    private static final int SAMPLES = 20_000;
    private static final double OMEGA = 100;
    private static final double VOLUME = 2.0;
    private static final double FRACTION = 0.3;
    private static final double CONCENTRATION = 1.5;

    /** Mean and variance of the first daughter's molecule count, and her mean concentration. */
    private static double[] moments(PartitionMode mode) {
        Partitioning partitioning = new Partitioning(mode, 0.5, 1);
        UniformRandomProvider rng = RandomStreams.of(7).stream(3);
        double[] first = new double[1];
        double[] second = new double[1];
        double sum = 0;
        double sumSq = 0;
        double concentrationSum = 0;
        for (int i = 0; i < SAMPLES; i++) {
            partitioning.split(new double[] {CONCENTRATION}, VOLUME, FRACTION, OMEGA, rng, first, second);
            double count = first[0] * OMEGA * VOLUME * FRACTION;
            double total = count + second[0] * OMEGA * VOLUME * (1 - FRACTION);
            assertEquals(OMEGA * VOLUME * CONCENTRATION, total, 1e-9, "molecules are conserved");
            sum += count;
            sumSq += count * count;
            concentrationSum += first[0];
        }
        double mean = sum / SAMPLES;
        return new double[] {mean, (sumSq - SAMPLES * mean * mean) / (SAMPLES - 1), concentrationSum / SAMPLES};
    }

    @Test
    void volumeSharingGivesBinomialCountsWithTheVolumeShare() {
        double n = OMEGA * VOLUME * CONCENTRATION;
        double[] m = moments(PartitionMode.VOLUME);
        double variance = n * FRACTION * (1 - FRACTION);
        assertEquals(n * FRACTION, m[0], 4 * Math.sqrt(variance / SAMPLES));
        assertEquals(variance, m[1], 4 * variance * Math.sqrt(2.0 / (SAMPLES - 1)));
        double concentrationSe = Math.sqrt(variance / SAMPLES) / (OMEGA * VOLUME * FRACTION);
        assertEquals(CONCENTRATION, m[2], 4 * concentrationSe, "the small daughter keeps the mother's concentration");
    }

    @Test
    void fairCoinSharingEnrichesTheSmallerDaughter() {
        double n = OMEGA * VOLUME * CONCENTRATION;
        double[] m = moments(PartitionMode.BINOMIAL);
        assertEquals(n / 2, m[0], 4 * Math.sqrt(n / 4 / SAMPLES));
        assertEquals(n / 4, m[1], 4 * n / 4 * Math.sqrt(2.0 / (SAMPLES - 1)));
        double concentrationSe = Math.sqrt(n / 4 / SAMPLES) / (OMEGA * VOLUME * FRACTION);
        assertEquals(CONCENTRATION * 0.5 / FRACTION, m[2], 4 * concentrationSe);
    }

    @Test
    void equalSharingKeepsBothConcentrationsExactly() {
        double[] first = new double[2];
        double[] second = new double[2];
        Partitioning.equal().split(new double[] {1.25, 0.4}, VOLUME, FRACTION, OMEGA, RandomStreams.of(1).stream(1),
                first, second);
        assertEquals(1.25, first[0], 0.0);
        assertEquals(0.4, second[1], 0.0);
    }

    /** A symmetric Beta share with standard deviation cv / 2: mean 1/2, variance cv^2 / 4. */
    @Test
    void volumeShareHasTheRequestedSpread() {
        CellSize size = new CellSize(SizeControl.ADDER, 0.2);
        UniformRandomProvider rng = RandomStreams.of(11).stream(5);
        double sum = 0;
        double sumSq = 0;
        for (int i = 0; i < SAMPLES; i++) {
            double f = size.firstFraction(rng);
            sum += f;
            sumSq += f * f;
        }
        double mean = sum / SAMPLES;
        double variance = (sumSq - SAMPLES * mean * mean) / (SAMPLES - 1);
        double expected = 0.01;
        assertEquals(0.5, mean, 4 * Math.sqrt(expected / SAMPLES));
        // A Beta law is lighter-tailed than normal, so the normal-theory standard error of the variance is an upper bound.
        assertEquals(expected, variance, 4 * expected * Math.sqrt(2.0 / (SAMPLES - 1)));
        assertEquals(0.5, new CellSize(SizeControl.TIMER, 0).firstFraction(rng), 0.0);
    }
}
