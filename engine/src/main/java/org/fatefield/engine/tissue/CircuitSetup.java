package org.fatefield.engine.tissue;

import org.fatefield.circuits.model.ReactionNetwork;

/**
 * The circuit every cell carries and how it is simulated.
 *
 * @param network      the reaction network
 * @param noise        simulation method
 * @param systemSize   molecules per unit concentration in a newborn cell, greater than 0
 * @param initialState concentrations of founder cells, one per species, each at least 0
 */
public record CircuitSetup(ReactionNetwork network, NoiseMode noise, double systemSize, double[] initialState) {

    /** Validates and copies. */
    public CircuitSetup {
        if (!(systemSize > 0) || Double.isInfinite(systemSize)) {
            throw new IllegalArgumentException("system size must be finite and greater than 0, got " + systemSize);
        }
        if (initialState.length != network.speciesCount()) {
            throw new IllegalArgumentException("initial state needs " + network.speciesCount()
                    + " values (one per species), got " + initialState.length);
        }
        for (double v : initialState) {
            if (!(v >= 0) || Double.isInfinite(v)) {
                throw new IllegalArgumentException("initial concentrations must be finite and at least 0, got " + v);
            }
        }
        initialState = initialState.clone();
    }

    @Override
    public double[] initialState() {
        return initialState.clone();
    }
}
