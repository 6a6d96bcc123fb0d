package org.fatefield.circuits.analysis.continuation;

/** Bifurcations detected along a branch of steady states, with their trade names. */
public enum SpecialPointType {
    /** A fold: two steady states meet and vanish; the edge of a bistable range. */
    SADDLE_NODE("saddle-node (fold)"),
    /** A simple branch point, where another branch crosses: a pitchfork in symmetric circuits. */
    BRANCH_POINT("branch point (pitchfork)"),
    /** A complex pair of eigenvalues crosses the imaginary axis: oscillations are born. */
    HOPF("Hopf"),
    /** A fold of the fold curve in a two-parameter plane, where two folds meet. */
    CUSP("cusp");

    private final String label;

    SpecialPointType(String label) {
        this.label = label;
    }

    /** The name written in tables and figures. */
    public String label() {
        return label;
    }
}
