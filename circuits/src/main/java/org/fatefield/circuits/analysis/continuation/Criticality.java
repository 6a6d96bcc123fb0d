package org.fatefield.circuits.analysis.continuation;

/**
 * Whether a pitchfork or Hopf bifurcation is soft or hard, from the sign of its normal-form
 * coefficient (Kuznetsov, Y. A. 2004, Elements of Applied Bifurcation Theory, 3rd ed., §3.4-3.5).
 */
public enum Criticality {
    /** Negative coefficient: the new states or the cycle are born stable, with amplitude growing as a square root. */
    SUPERCRITICAL("supercritical"),
    /** Positive coefficient: the new states or the cycle are born unstable; the system jumps away. */
    SUBCRITICAL("subcritical"),
    /** The coefficient is zero to working accuracy: a higher-order (degenerate) point. */
    DEGENERATE("degenerate"),
    /** Criticality does not apply (folds, transcritical branch points, cusps). */
    NOT_APPLICABLE("");

    private final String label;

    Criticality(String label) {
        this.label = label;
    }

    /** The word written in tables and figures (empty where it does not apply). */
    public String label() {
        return label;
    }

    /** The criticality that a coefficient's sign gives, degenerate within {@code tolerance} of zero. */
    public static Criticality ofCoefficient(double coefficient, double tolerance) {
        if (!(Math.abs(coefficient) > tolerance)) {
            return DEGENERATE;
        }
        return coefficient < 0 ? SUPERCRITICAL : SUBCRITICAL;
    }
}
