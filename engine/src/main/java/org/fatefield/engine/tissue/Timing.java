package org.fatefield.engine.tissue;

/**
 * How long a run lasts and how finely it is stepped and recorded.
 *
 * @param duration       simulated time (h), greater than 0
 * @param step           time step of cells and mechanics (h), greater than 0 and at most the duration
 * @param recordInterval time between recorded rows (h), at least one step
 */
public record Timing(double duration, double step, double recordInterval) {

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
    }

    /** Number of steps in the run. */
    public long totalSteps() {
        return Math.round(duration / step);
    }

    /** Steps between recorded rows. */
    public long stepsPerRecord() {
        return Math.max(1, Math.round(recordInterval / step));
    }
}
