package org.fatefield.engine.field;

import java.util.ArrayList;
import java.util.List;

/**
 * Physics of one morphogen: diffusion, first-order decay, synthesis in source regions, an
 * optional condition at the left wall (x = 0), and exchange with cells (secretion by cells of a
 * given fate, first-order uptake), on a square grid whose other walls are no-flux. Or, instead, a
 * fixed measured profile along x.
 *
 * @param name        field name used by couplings
 * @param diffusion   diffusion coefficient (µm² / h), at least 0
 * @param decay       first-order decay rate (1 / h), at least 0
 * @param gridSpacing side of a grid square (µm), greater than 0
 * @param initial     uniform initial concentration, at least 0
 * @param sources     synthesis regions
 * @param solver      time stepping: explicit with stable sub-steps, or ADI (unconditionally stable)
 * @param leftWall    condition at x = 0
 * @param exchange    secretion and uptake by cells
 * @param profile     a fixed profile along x that replaces the dynamics, or null
 * @param amplitudeCv tissue-to-tissue variability of production: each tissue multiplies its
 *                    sources and left-wall value by one lognormal factor of mean 1 and this
 *                    coefficient of variation ({@link AmplitudeVariability}); 0 for none
 */
public record MorphogenSpec(String name, double diffusion, double decay, double gridSpacing, double initial,
        List<SourceRegion> sources, Solver solver, WallCondition leftWall, CellExchange exchange,
        PiecewiseLinear profile, double amplitudeCv) {

    /**
     * The left wall: no flux, a fixed concentration (a source held at a value), or an inflow.
     *
     * @param kind  which condition
     * @param value the fixed concentration, or the inflow (concentration µm / h)
     */
    public record WallCondition(WallKind kind, double value) {

        /** The default no-flux wall. */
        public static final WallCondition NO_FLUX = new WallCondition(WallKind.NO_FLUX, 0);

        /** Validates. */
        public WallCondition {
            if (!(value >= 0) || Double.isInfinite(value)) {
                throw new IllegalArgumentException("wall value must be finite and at least 0, got " + value);
            }
        }
    }

    /** Kinds of wall condition. */
    public enum WallKind {
        /** Nothing crosses. */
        NO_FLUX,
        /** The concentration at the wall is held fixed. */
        FIXED_VALUE,
        /** A constant inflow. */
        FLUX
    }

    /**
     * Exchange between the field and the cells on it.
     *
     * @param secretingFate  fate index of cells that secrete, {@link #ALL} for every cell, {@link #NONE} for none
     * @param secretionRate  amount each secreting cell adds per hour (concentration µm² / h), at least 0
     * @param uptake         first-order uptake by cells (1 / h over the area a cell covers), at least 0
     */
    public record CellExchange(int secretingFate, double secretionRate, double uptake) {

        /** Every cell secretes. */
        public static final int ALL = -2;
        /** No cell secretes. */
        public static final int NONE = -1;
        /** No exchange. */
        public static final CellExchange OFF = new CellExchange(NONE, 0, 0);

        /** Validates. */
        public CellExchange {
            if (!(secretionRate >= 0) || !(uptake >= 0) || Double.isInfinite(secretionRate) || Double.isInfinite(uptake)) {
                throw new IllegalArgumentException("secretion and uptake must be finite and at least 0, got "
                        + secretionRate + ", " + uptake);
            }
        }

        /** True if cells change the field. */
        public boolean active() {
            return (secretingFate != NONE && secretionRate > 0) || uptake > 0;
        }
    }

    /**
     * A field named "morphogen", advanced by the explicit solver, with no-flux walls, no cell
     * exchange and no fixed profile; the {@code with} copies change any of these.
     */
    public static MorphogenSpec of(double diffusion, double decay, double gridSpacing, double initial,
            List<SourceRegion> sources) {
        return new MorphogenSpec("morphogen", diffusion, decay, gridSpacing, initial, sources, Solver.EXPLICIT,
                WallCondition.NO_FLUX, CellExchange.OFF, null, 0.0);
    }

    /** With time stepping by {@code value}. */
    public MorphogenSpec withSolver(Solver value) {
        return new MorphogenSpec(name, diffusion, decay, gridSpacing, initial, sources, value, leftWall, exchange,
                profile, amplitudeCv);
    }

    /** With the name {@code value}. */
    public MorphogenSpec withName(String value) {
        return new MorphogenSpec(value, diffusion, decay, gridSpacing, initial, sources, solver, leftWall, exchange,
                profile, amplitudeCv);
    }

    /** With the condition {@code value} at x = 0. */
    public MorphogenSpec withLeftWall(WallCondition value) {
        return new MorphogenSpec(name, diffusion, decay, gridSpacing, initial, sources, solver, value, exchange,
                profile, amplitudeCv);
    }

    /** With cells exchanging the field by {@code value}. */
    public MorphogenSpec withExchange(CellExchange value) {
        return new MorphogenSpec(name, diffusion, decay, gridSpacing, initial, sources, solver, leftWall, value,
                profile, amplitudeCv);
    }

    /** With the grid spacing {@code value} (µm). */
    public MorphogenSpec withGridSpacing(double value) {
        return new MorphogenSpec(name, diffusion, decay, value, initial, sources, solver, leftWall, exchange,
                profile, amplitudeCv);
    }

    /** With tissue-to-tissue production variability of coefficient of variation {@code value}. */
    public MorphogenSpec withAmplitudeCv(double value) {
        return new MorphogenSpec(name, diffusion, decay, gridSpacing, initial, sources, solver, leftWall, exchange,
                profile, value);
    }

    /**
     * With every source rate and the left-wall value (held concentration or inflow) multiplied
     * by {@code factor}: the same field made {@code factor} times stronger. Secretion by cells and
     * a fixed profile are left as they are.
     */
    public MorphogenSpec withProductionScaled(double factor) {
        List<SourceRegion> scaled = new ArrayList<>();
        for (SourceRegion s : sources) {
            scaled.add(new SourceRegion(s.x0(), s.y0(), s.x1(), s.y1(), s.rate() * factor, s.amplitude()));
        }
        return new MorphogenSpec(name, diffusion, decay, gridSpacing, initial, scaled, solver,
                new WallCondition(leftWall.kind(), leftWall.value() * factor), exchange, profile, amplitudeCv);
    }

    /** How the field is advanced in time. */
    public enum Solver {
        /** Forward Euler, sub-stepped below the stability limit: the reference. */
        EXPLICIT,
        /** Peaceman-Rachford alternating-direction implicit: one step per tick at any step size. */
        ADI
    }

    /** Validates every field. */
    public MorphogenSpec {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a field needs a name");
        }
        requireNonNegative("diffusion", diffusion);
        requireNonNegative("decay", decay);
        requireNonNegative("initial", initial);
        if (!(gridSpacing > 0.0) || Double.isInfinite(gridSpacing)) {
            throw new IllegalArgumentException("grid spacing must be finite and greater than 0, got " + gridSpacing);
        }
        sources = List.copyOf(sources);
        if (!(amplitudeCv >= 0) || amplitudeCv > AmplitudeVariability.MAX_CV) {
            throw new IllegalArgumentException("amplitude cv must be from 0 to " + AmplitudeVariability.MAX_CV
                    + ", got " + amplitudeCv);
        }
        if (amplitudeCv > 0 && profile != null) {
            throw new IllegalArgumentException("field '" + name + "' has a fixed profile, which amplitude"
                    + " variability does not change; remove amplitude_cv or the profile");
        }
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
