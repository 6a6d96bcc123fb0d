package org.fatefield.engine.coupling;

/** How a local morphogen level {@code c} sets a circuit parameter. */
public enum CouplingForm {
    /** {@code base + gain * c}. */
    LINEAR,
    /** {@code base + gain * c^n / (K^n + c^n)}: saturating, the usual receptor-occupancy form. */
    HILL,
    /** A lookup table of (c, value) points, linear between them and constant beyond. */
    TABLE
}
