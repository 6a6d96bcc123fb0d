package org.fatefield.engine.mechanics;

/** The shape of the domain cells live in. */
public enum DomainShape {
    /** The width x height rectangle, with walls on all four sides. */
    RECTANGLE,
    /** The disc inscribed in the rectangle, with a circular wall (fields still fill the rectangle). */
    DISC,
    /**
     * A band of the rectangle's size, periodic along y: cells and fields leaving at the top
     * come back at the bottom, so the tissue has no lateral edges; walls at x = 0 and x = width.
     */
    STRIP
}
