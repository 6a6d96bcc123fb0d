package org.fatefield.engine.division;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;

/**
 * Cell-size rules: when cells divide ({@link SizeControl}) and how unequally a mother's volume
 * is shared between her daughters.
 *
 * <p>The first daughter's volume fraction f follows a symmetric Beta law with standard deviation
 * {@code splitCv / 2} (so {@code splitCv} is the coefficient of variation of a daughter's
 * volume); a Beta law with mean 1/2 and concentration c has variance {@code 1 / (4 (c + 1))}, so
 * {@code c = 1 / splitCv^2 - 1}.
 *
 * @param control  the division rule
 * @param splitCv  coefficient of variation of a daughter's share of the mother's volume, in
 *                 [0, 1); 0 means equal halves
 */
public record CellSize(SizeControl control, double splitCv) {

    /** Timer and equal halves: every newborn has volume 1. */
    public static final CellSize FIXED = new CellSize(SizeControl.TIMER, 0.0);

    /** Validates. */
    public CellSize {
        if (control == null) {
            throw new IllegalArgumentException("size control must be given (timer, adder or sizer)");
        }
        if (!(splitCv >= 0 && splitCv < 1)) {
            throw new IllegalArgumentException("volume split cv must be at least 0 and below 1, got " + splitCv);
        }
    }

    /** True when newborns can differ in volume (so molecule counts are not a fixed multiple of concentration). */
    public boolean variable() {
        return control != SizeControl.TIMER || splitCv > 0;
    }

    /** Draws the first daughter's share of the mother's volume (1/2 exactly when {@code splitCv} is 0). */
    public double firstFraction(UniformRandomProvider rng) {
        if (splitCv == 0) {
            return 0.5;
        }
        double concentration = 1.0 / (splitCv * splitCv) - 1.0;
        if (concentration > 1e8) {
            // A split this even (cv below 1e-4) is its normal limit, sd cv / 2; the gamma draws of
            // the Beta law overflow as cv goes to 0.
            double share = 0.5 + 0.5 * splitCv * ZigguratSampler.NormalizedGaussian.of(rng).sample();
            return Math.max(0.25, Math.min(0.75, share));
        }
        return Partitioning.betaShare(rng, 0.5, concentration);
    }
}
