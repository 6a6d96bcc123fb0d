package org.fatefield.circuits.analysis.continuation;

/** Bifurcations detected along a branch of steady states, with their trade names. */
public enum SpecialPointType {
    /** A fold: two steady states meet and vanish; the edge of a bistable range. */
    SADDLE_NODE("saddle-node (fold)"),
    /**
     * A simple branch point whose branching equation has no quadratic term: a pitchfork, as where
     * a symmetric circuit's symmetric branch meets the asymmetric ones.
     */
    PITCHFORK("pitchfork (branch point)"),
    /** A simple branch point where two branches cross transversally (a transcritical crossing). */
    BRANCH_POINT("branch point (transcritical)"),
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

    /** True for the two kinds of branch point, where another branch of steady states crosses. */
    public boolean isBranchPoint() {
        return this == PITCHFORK || this == BRANCH_POINT;
    }
}
