package org.fatefield.engine.division;

/**
 * When a cell divides and how its volume grows meanwhile. Volumes are in units of a mean
 * newborn cell; {@code T} is the cell's drawn cycle time (see {@link CycleTimeDistribution}).
 *
 * <p>The three classic rules of cell-size homeostasis (Amir 2014, Cell size regulation in
 * bacteria, Phys. Rev. Lett. 112:208102; Taheri-Araghi et al. 2015, Cell-size control and
 * homeostasis in bacteria, Curr. Biol. 25:385): a timer divides after a set time and corrects
 * no size error; an adder adds a set volume, so a birth-size error halves each generation (the
 * daughter's birth volume regresses on the mother's with slope 1/2); a sizer divides at a set
 * volume, forgetting the birth volume entirely (slope 0).
 */
public enum SizeControl {
    /**
     * Divides at age {@code T}; the volume grows linearly from the birth volume {@code Vb} to
     * {@code 2 Vb} over the cycle.
     */
    TIMER,
    /**
     * Grows exponentially at rate {@code ln 2 / T} and divides once it has added one newborn
     * volume since birth.
     */
    ADDER,
    /** Grows exponentially at rate {@code ln 2 / T} and divides on reaching twice the newborn volume. */
    SIZER;

    private static final double LN2 = Math.log(2.0);

    /**
     * Volume at {@code age} of a cell born with volume {@code birthVolume} and cycle time
     * {@code cycleTime}.
     */
    public double volume(double birthVolume, double age, double cycleTime) {
        if (this == TIMER) {
            return birthVolume * (1.0 + Math.min(age, cycleTime) / cycleTime);
        }
        return birthVolume * Math.exp(LN2 * age / cycleTime);
    }

    /** True once a cell of these volumes and age should divide. */
    public boolean ready(double birthVolume, double volume, double age, double cycleTime) {
        return switch (this) {
            case TIMER -> age >= cycleTime;
            case ADDER -> volume - birthVolume >= 1.0;
            case SIZER -> volume >= 2.0;
        };
    }
}
