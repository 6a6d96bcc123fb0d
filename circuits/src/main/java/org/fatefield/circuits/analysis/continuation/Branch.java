package org.fatefield.circuits.analysis.continuation;

import java.util.List;

/**
 * A branch of steady states traced by continuation, in arclength order, with the special points
 * found on it.
 *
 * @param id       branch number within its diagram (0 for the first)
 * @param points   computed points in order
 * @param specials special points in order of occurrence
 */
public record Branch(int id, List<BranchPoint> points, List<SpecialPoint> specials) {

    /** Copies the lists. */
    public Branch {
        points = List.copyOf(points);
        specials = List.copyOf(specials);
    }
}
