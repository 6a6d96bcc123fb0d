package org.fatefield.engine.division;

import java.util.Locale;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.AhrensDieterMarsagliaTsangGammaSampler;
import org.apache.commons.rng.sampling.distribution.LogNormalSampler;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;

/**
 * Distribution of the time from a cell's birth to its division, given by mean and coefficient
 * of variation.
 *
 * @param kind fixed, gamma or lognormal
 * @param mean mean cycle time (h), greater than 0
 * @param cv   coefficient of variation (standard deviation / mean), at least 0; ignored when fixed
 */
public record CycleTimeDistribution(Kind kind, double mean, double cv) {

    /** The family of the distribution. */
    public enum Kind {
        /** Every cycle lasts exactly the mean. */
        FIXED,
        /** Gamma with shape 1 / cv^2 and scale mean cv^2. */
        GAMMA,
        /** Lognormal with sigma^2 = ln(1 + cv^2) and mu = ln(mean) - sigma^2 / 2. */
        LOGNORMAL
    }

    /** Validates mean and CV. */
    public CycleTimeDistribution {
        if (!(mean > 0) || Double.isInfinite(mean)) {
            throw new IllegalArgumentException("mean cycle time must be finite and greater than 0, got " + mean);
        }
        if (kind != Kind.FIXED && (!(cv > 0) || Double.isInfinite(cv))) {
            throw new IllegalArgumentException("cycle time cv must be finite and greater than 0 for "
                    + kind.name().toLowerCase(Locale.ROOT) + ", got " + cv);
        }
    }

    /** Draws one cycle time (h) from {@code rng}. */
    public double sample(UniformRandomProvider rng) {
        switch (kind) {
            case GAMMA: {
                double shape = 1.0 / (cv * cv);
                return AhrensDieterMarsagliaTsangGammaSampler.of(rng, shape, mean / shape).sample();
            }
            case LOGNORMAL: {
                double sigma2 = Math.log1p(cv * cv);
                double mu = Math.log(mean) - 0.5 * sigma2;
                return LogNormalSampler.of(ZigguratSampler.NormalizedGaussian.of(rng), mu, Math.sqrt(sigma2)).sample();
            }
            default:
                return mean;
        }
    }
}
