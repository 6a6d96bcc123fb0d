package org.fatefield.circuits.analysis.continuation;

import org.hipparchus.complex.Complex;

/**
 * A located bifurcation.
 *
 * @param type        what it is
 * @param parameter   value of the continuation parameter there
 * @param state       steady state there
 * @param eigenvalues eigenvalues of the Jacobian there
 * @param frequency   angular frequency of the critical pair at a Hopf point, else NaN
 */
public record SpecialPoint(SpecialPointType type, double parameter, double[] state, Complex[] eigenvalues,
        double frequency) {

    /** Copies the arrays. */
    public SpecialPoint {
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
