package org.fatefield.circuits.analysis.continuation;

import org.hipparchus.complex.Complex;

/**
 * One computed point of a branch of steady states.
 *
 * @param parameter   value of the continuation parameter
 * @param state       the steady state
 * @param eigenvalues eigenvalues of the Jacobian, by decreasing real part
 * @param stable      true if every eigenvalue has a negative real part
 */
public record BranchPoint(double parameter, double[] state, Complex[] eigenvalues, boolean stable) {

    /** Copies the arrays. */
    public BranchPoint {
        state = state.clone();
        eigenvalues = eigenvalues.clone();
    }

    @Override
    public double[] state() {
        return state.clone();
    }

    @Override
    public Complex[] eigenvalues() {
        return eigenvalues.clone();
    }
}
