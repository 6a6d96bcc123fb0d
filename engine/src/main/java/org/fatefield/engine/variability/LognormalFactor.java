package org.fatefield.engine.variability;

/**
 * A lognormal factor of mean 1 and coefficient of variation cv, from a standard normal score z:
 * {@code exp(sigma z - sigma^2 / 2)} with {@code sigma^2 = ln(1 + cv^2)}. The one form of
 * multiplicative variability in the tissue: cell to cell ({@link ExtrinsicNoise}) and tissue to
 * tissue (a morphogen's amplitude).
 */
public final class LognormalFactor {

    private LognormalFactor() {
    }

    /** The log-scale standard deviation sigma for coefficient of variation {@code cv}. */
    public static double sigmaOfLog(double cv) {
        return Math.sqrt(Math.log1p(cv * cv));
    }

    /** The factor for score {@code z} at log-scale standard deviation {@code sigma}. */
    public static double of(double sigma, double z) {
        return Math.exp(sigma * z - 0.5 * sigma * sigma);
    }
}
