package org.fatefield.circuits.analysis;

/** Linear-stability type of a steady state, from the eigenvalues of the Jacobian there. */
public enum SteadyStateType {
    /** All eigenvalues real and negative. */
    STABLE_NODE("stable node"),
    /** All real parts negative, at least one complex pair: damped oscillations. */
    STABLE_FOCUS("stable focus"),
    /** Real parts of both signs: unstable, with a stable manifold (a threshold between basins). */
    SADDLE("saddle"),
    /** All eigenvalues real and positive. */
    UNSTABLE_NODE("unstable node"),
    /** All real parts positive, at least one complex pair. */
    UNSTABLE_FOCUS("unstable focus"),
    /** An eigenvalue with zero real part (within tolerance): at a bifurcation. */
    NON_HYPERBOLIC("non-hyperbolic");

    private final String label;

    SteadyStateType(String label) {
        this.label = label;
    }

    /** The trade name, as written in tables and figures. */
    public String label() {
        return label;
    }

    /** True for the two attracting types. */
    public boolean isStable() {
        return this == STABLE_NODE || this == STABLE_FOCUS;
    }
}
