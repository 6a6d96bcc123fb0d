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
 * @param kind fixed, gamma, lognormal, or none (cells never divide)
 * @param mean mean cycle time (h), greater than 0; ignored when none
 * @param cv   coefficient of variation (standard deviation / mean), at least 0; ignored when fixed
 */
public record CycleTimeDistribution(Kind kind, double mean, double cv) {

    /**
     * Largest coefficient of variation accepted: at 2 (gamma shape 1/4) one cycle in six is
     * already shorter than a hundredth of the mean; measured cycle-time CVs are well below 1.
     */
    public static final double MAX_CV = 2.0;

    /** The family of the distribution. */
    public enum Kind {
        /** Every cycle lasts exactly the mean. */
        FIXED,
        /** Gamma with shape 1 / cv^2 and scale mean cv^2. */
        GAMMA,
        /** Lognormal with sigma^2 = ln(1 + cv^2) and mu = ln(mean) - sigma^2 / 2. */
        LOGNORMAL,
        /** No division: every cycle is infinitely long, a tissue of fixed cells. */
        NONE
    }

    /** Cells that never divide. */
    public static CycleTimeDistribution none() {
        return new CycleTimeDistribution(Kind.NONE, Double.POSITIVE_INFINITY, 0);
    }

    /** True when cells divide at all. */
    public boolean divides() {
        return kind != Kind.NONE;
    }

    /** Validates mean and CV. */
    public CycleTimeDistribution {
        if (kind == Kind.NONE) {
            mean = Double.POSITIVE_INFINITY;
            cv = 0;
        } else if (!(mean > 0) || Double.isInfinite(mean)) {
            throw new IllegalArgumentException("mean cycle time must be finite and greater than 0, got " + mean);
        }
        if (kind != Kind.FIXED && kind != Kind.NONE && (!(cv > 0) || cv > MAX_CV)) {
            throw new IllegalArgumentException("cycle time cv must be greater than 0 and at most " + MAX_CV + " for "
                    + kind.name().toLowerCase(Locale.ROOT) + ", got " + cv);
        }
    }

    /** Draws one cycle time (h) from {@code rng}; infinite, drawing nothing, when cells never divide. */
    public double sample(UniformRandomProvider rng) {
        switch (kind) {
            case NONE:
                return Double.POSITIVE_INFINITY;
            case GAMMA: {
                if (cv < 1e-4) {
                    // The gamma law's normal limit (its shape 1/cv^2 overflows as cv goes to 0).
                    return Math.max(0.0, mean * (1 + cv * ZigguratSampler.NormalizedGaussian.of(rng).sample()));
                }
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
