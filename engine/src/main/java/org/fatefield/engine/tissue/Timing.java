package org.fatefield.engine.tissue;

/**
 * How long a run lasts and how finely it is stepped and recorded.
 *
 * @param duration       simulated time (h), greater than 0
 * @param step           time step of cells (h), greater than 0 and at most the duration
 * @param recordInterval time between recorded rows (h), at least one step
 * @param mechanicsStep  time step of the mechanics (h): a whole number of steps, at most the
 *                       record interval; or 0 for {@link #mechanicsEvery automatic}
 */
public record Timing(double duration, double step, double recordInterval, double mechanicsStep) {

    /**
     * Accuracy target of the automatic mechanics step: the fastest mechanical rate times the
     * mechanics step. At 0.1 explicit Euler relaxes an overlap by (1 - 0.1) per step against
     * e^(-0.1) exactly, a 5% error in the relaxation rate, well inside stability (common practice).
     */
    public static final double MECHANICS_ACCURACY = 0.1;

    /** Validates. */
    public Timing {
        if (!(duration > 0) || Double.isInfinite(duration)) {
            throw new IllegalArgumentException("duration must be finite and greater than 0, got " + duration);
        }
        if (!(step > 0) || step > duration) {
            throw new IllegalArgumentException("time step must be greater than 0 and at most the duration "
                    + duration + ", got " + step);
        }
        if (!(recordInterval >= step) || Double.isInfinite(recordInterval)) {
            throw new IllegalArgumentException("record interval must be at least one time step (" + step
                    + "), got " + recordInterval);
        }
        if (!(mechanicsStep >= 0) || mechanicsStep > 0 && (mechanicsStep < step * (1 - 1e-9)
                || Math.abs(mechanicsStep / step - Math.round(mechanicsStep / step)) > 1e-6
                || mechanicsStep > recordInterval * (1 + 1e-9))) {
            throw new IllegalArgumentException("mechanics step must be 0 (automatic) or a whole number of time steps ("
                    + step + " h) up to the record interval (" + recordInterval + " h), got " + mechanicsStep);
        }
    }

    /** With the mechanics step set automatically. */
    public Timing(double duration, double step, double recordInterval) {
        this(duration, step, recordInterval, 0);
    }

    /** Number of steps in the run. */
    public long totalSteps() {
        return Math.round(duration / step);
    }

    /** Steps between recorded rows. */
    public long stepsPerRecord() {
        return Math.max(1, Math.round(recordInterval / step));
    }

    /**
     * Steps between mechanics relaxations: the set mechanics step, or automatically the most
     * steps k with {@code fastestRate * k * step <= MECHANICS_ACCURACY} (1/h: the repulsion or
     * adhesion rate, whichever is faster), at least 1 and at most the steps of a record interval.
     */
    public int mechanicsEvery(double fastestRate) {
        if (mechanicsStep > 0) {
            return (int) Math.round(mechanicsStep / step);
        }
        long most = stepsPerRecord();
        if (!(fastestRate > 0)) {
            return (int) Math.min(most, Integer.MAX_VALUE);
        }
        long k = (long) Math.floor(MECHANICS_ACCURACY / (fastestRate * step) + 1e-9);
        return (int) Math.max(1, Math.min(most, Math.min(k, Integer.MAX_VALUE)));
    }
}
