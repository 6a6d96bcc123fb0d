package org.fatefield.engine.variability;

import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;

/**
 * Extrinsic variability: cell-to-cell differences in a circuit parameter, passed on at division.
 *
 * <p>Each cell carries a standard normal score z; its parameter is multiplied by the lognormal
 * factor {@code exp(sigma z - sigma^2 / 2)} (mean 1, coefficient of variation
 * {@code sqrt(exp(sigma^2) - 1)}). Founders draw z independently; a daughter's score is
 * {@code rho z_mother + sqrt(1 - rho^2) xi}, an autoregressive step that keeps z standard normal in
 * every generation, with mother-daughter correlation rho (so sisters correlate as rho^2).
 *
 * @param label   the parameter as the scenario names it
 * @param indices circuit parameters the factor multiplies
 * @param cv      coefficient of variation of the factor, at least 0
 * @param rho     mother-daughter correlation of the score, in [0, 1]
 */
public record ExtrinsicNoise(String label, int[] indices, double cv, double rho) {

    /** Validates and copies. */
    public ExtrinsicNoise {
        if (indices.length == 0) {
            throw new IllegalArgumentException("extrinsic noise needs at least one parameter");
        }
        if (!(cv >= 0) || Double.isInfinite(cv)) {
            throw new IllegalArgumentException("extrinsic cv must be finite and at least 0, got " + cv);
        }
        if (!(rho >= 0 && rho <= 1)) {
            throw new IllegalArgumentException("inheritance correlation must be in [0, 1], got " + rho);
        }
        indices = indices.clone();
    }

    @Override
    public int[] indices() {
        return indices.clone();
    }

    /** The log-scale standard deviation sigma for the coefficient of variation. */
    public double sigma() {
        return LognormalFactor.sigmaOfLog(cv);
    }

    /** The factor for score {@code z}. */
    public double factor(double z) {
        return LognormalFactor.of(sigma(), z);
    }

    /** A founder's score. */
    public double founderScore(UniformRandomProvider rng) {
        return ZigguratSampler.NormalizedGaussian.of(rng).sample();
    }

    /** A daughter's score from her mother's. */
    public double daughterScore(double mother, UniformRandomProvider rng) {
        return rho * mother + Math.sqrt(1 - rho * rho) * ZigguratSampler.NormalizedGaussian.of(rng).sample();
    }

    /** Scores of a founder, one per noise. */
    public static double[] founderScores(List<ExtrinsicNoise> noises, UniformRandomProvider rng) {
        double[] scores = new double[noises.size()];
        for (int k = 0; k < scores.length; k++) {
            scores[k] = noises.get(k).founderScore(rng);
        }
        return scores;
    }

    /** Scores of a daughter from her mother's, one per noise. */
    public static double[] daughterScores(List<ExtrinsicNoise> noises, double[] mother,
            UniformRandomProvider rng) {
        double[] scores = new double[noises.size()];
        for (int k = 0; k < scores.length; k++) {
            scores[k] = noises.get(k).daughterScore(mother[k], rng);
        }
        return scores;
    }

    /** Multiplies this noise's parameters in {@code params} (already set to their base values) by the factor. */
    public void apply(double z, double[] params) {
        double f = factor(z);
        for (int i : indices) {
            params[i] *= f;
        }
    }
}
