package org.fatefield.engine.field;

import java.util.List;

/**
 * Physics of one morphogen: diffusion, first-order decay and synthesis in source regions, on a
 * square grid with no-flux walls.
 *
 * @param diffusion   diffusion coefficient (µm² / h), at least 0
 * @param decay       first-order decay rate (1 / h), at least 0
 * @param gridSpacing side of a grid square (µm), greater than 0
 * @param initial     uniform initial concentration, at least 0
 * @param sources     synthesis regions
 * @param solver      time stepping: explicit with stable sub-steps, or ADI (unconditionally stable)
 */
public record MorphogenSpec(double diffusion, double decay, double gridSpacing, double initial,
        List<SourceRegion> sources, Solver solver) {

    /** How the field is advanced in time. */
    public enum Solver {
        /** Forward Euler, sub-stepped below the stability limit: the reference. */
        EXPLICIT,
        /** Peaceman-Rachford alternating-direction implicit: one step per tick at any step size. */
        ADI
    }

    /** An explicit-solver spec. */
    public MorphogenSpec(double diffusion, double decay, double gridSpacing, double initial,
            List<SourceRegion> sources) {
        this(diffusion, decay, gridSpacing, initial, sources, Solver.EXPLICIT);
    }

    /** Validates every field. */
    public MorphogenSpec {
        requireNonNegative("diffusion", diffusion);
        requireNonNegative("decay", decay);
        requireNonNegative("initial", initial);
        if (!(gridSpacing > 0.0) || Double.isInfinite(gridSpacing)) {
            throw new IllegalArgumentException("grid spacing must be finite and greater than 0, got " + gridSpacing);
        }
        sources = List.copyOf(sources);
    }

    /** Decay length sqrt(D / k) (µm) of the steady gradient, infinite without decay. */
    public double decayLength() {
        return decay > 0 ? Math.sqrt(diffusion / decay) : Double.POSITIVE_INFINITY;
    }

    private static void requireNonNegative(String name, double value) {
        if (!(value >= 0.0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and at least 0, got " + value);
        }
    }
}
