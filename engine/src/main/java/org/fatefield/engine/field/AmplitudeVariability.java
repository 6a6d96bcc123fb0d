package org.fatefield.engine.field;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.fatefield.engine.variability.LognormalFactor;

/**
 * Tissue-to-tissue variability of a morphogen's production, the embryo-to-embryo spread that
 * sets the positional error of a boundary read from the gradient (Gregor et al. 2007, Cell
 * 130:153). Each tissue draws one factor per field, lognormal with mean 1 and coefficient of
 * variation cv ({@link LognormalFactor}), its score z a standard normal draw from the tissue's
 * own stream, so replicate seeds give independent factors and one seed always gives the same one.
 */
public final class AmplitudeVariability {

    /** Largest coefficient of variation accepted (the factor's median is then 0.2 of its mean). */
    public static final double MAX_CV = 5.0;

    private AmplitudeVariability() {
    }

    /** Standard deviation of the log of the factor, {@code sqrt(ln(1 + cv^2))}. */
    public static double sigmaOfLog(double cv) {
        return LognormalFactor.sigmaOfLog(cv);
    }

    /** One factor of coefficient of variation {@code cv} drawn from {@code rng}; exactly 1 when cv is 0. */
    public static double factor(double cv, UniformRandomProvider rng) {
        if (cv == 0) {
            return 1.0;
        }
        return LognormalFactor.of(sigmaOfLog(cv), ZigguratSampler.NormalizedGaussian.of(rng).sample());
    }
}
