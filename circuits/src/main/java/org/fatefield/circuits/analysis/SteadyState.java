package org.fatefield.circuits.analysis;

import java.util.Arrays;
import org.hipparchus.complex.Complex;

/**
 * A steady state of a circuit with its linear stability.
 *
 * @param state       concentrations at the steady state
 * @param eigenvalues eigenvalues of the Jacobian there, sorted by decreasing real part
 * @param type        stability type derived from the eigenvalues
 */
public record SteadyState(double[] state, Complex[] eigenvalues, SteadyStateType type) {

    /** Copies the arrays so the record stays immutable. */
    public SteadyState {
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

    /** True when every eigenvalue has a negative real part. */
    public boolean isStable() {
        return type.isStable();
    }

    /** The largest real part of any eigenvalue (the growth rate of the least stable mode). */
    public double leadingRealPart() {
        return eigenvalues[0].getReal();
    }

    @Override
    public String toString() {
        return type.label() + " at " + Arrays.toString(state) + ", eigenvalues " + Arrays.toString(eigenvalues);
    }
}
