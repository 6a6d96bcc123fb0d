package org.fatefield.engine.tissue;

/**
 * The tissue cannot go on: a cell's circuit state stopped being a finite number (a rate law
 * that divides by zero or overflows, or a step too large for the circuit's fastest rate). The
 * run stops at the first step where it happens, naming the cell of lowest id, the time and the
 * species, so that no output is ever computed from a state that is not a number.
 */
public final class SimulationFailure extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final long cellId;
    private final double time;
    private final String species;

    SimulationFailure(long cellId, double time, String species, double value) {
        super("cell " + cellId + " at t = " + time + " h: " + species + " became " + value + "; check the circuit's"
                + " rate laws (a division by zero or an overflow), or make run.step smaller than the circuit's"
                + " fastest time scale");
        this.cellId = cellId;
        this.time = time;
        this.species = species;
    }

    /** The cell of lowest id whose state failed. */
    public long cellId() {
        return cellId;
    }

    /** When (h). */
    public double time() {
        return time;
    }

    /** Which species. */
    public String species() {
        return species;
    }
}
