package org.fatefield.circuits.sim;

import org.apache.commons.rng.UniformRandomProvider;

/**
 * Advances one cell's circuit state in place by one time step.
 *
 * <p>A stepper keeps no per-cell state, so one instance serves every cell; it may keep scratch
 * buffers, so one instance serves one thread at a time ({@link #copy()} gives another). Any
 * randomness comes from the provider passed in, which makes a run reproducible from its seeds.
 */
public interface CircuitStepper {

    /**
     * Unused doubles to put after a scratch array written on every step (more than a cache
     * line), so that the buffers of steppers working side by side on different threads never
     * share a cache line: false sharing made two threads slower than one.
     */
    int SCRATCH_PADDING = 16;

    /**
     * Advances {@code state} by {@code dt}.
     *
     * @param state  concentrations, modified in place
     * @param params parameters, not modified
     * @param dt     time step (h), greater than 0
     * @param rng    the cell's random stream; deterministic steppers ignore it
     */
    void advance(double[] state, double[] params, double dt, UniformRandomProvider rng);

    /** An independent stepper for another thread, with the same settings. */
    CircuitStepper copy();
}
