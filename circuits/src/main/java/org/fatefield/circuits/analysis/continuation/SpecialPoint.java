package org.fatefield.circuits.analysis.continuation;

import org.hipparchus.complex.Complex;

/**
 * A located and verified bifurcation.
 *
 * @param type        what it is
 * @param parameter   value of the continuation parameter there
 * @param state       steady state there
 * @param eigenvalues eigenvalues of the Jacobian there
 * @param frequency   angular frequency of the critical pair at a Hopf point (rad per time unit), else NaN
 * @param criticality super- or subcritical for pitchforks and Hopf points
 * @param coefficient the normal-form coefficient whose sign gives the criticality: the first
 *                    Lyapunov coefficient at a Hopf point, the centre-manifold cubic coefficient
 *                    at a pitchfork ({@link NormalFormCoefficients}); NaN where it does not apply
 */
public record SpecialPoint(SpecialPointType type, double parameter, double[] state, Complex[] eigenvalues,
        double frequency, Criticality criticality, double coefficient) {

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

    /** The type's name with the criticality in front where it applies, e.g. "supercritical Hopf". */
    public String description() {
        return criticality == Criticality.NOT_APPLICABLE ? type.label() : criticality.label() + " " + type.label();
    }
}
