package org.fatefield.circuits.study;

import org.fatefield.circuits.analysis.SwitchingSettings;

/**
 * What {@code fatefield analyze} computes for one circuit.
 *
 * @param parameter      name of the continuation parameter (as the scenario writes it)
 * @param indices        the circuit parameters it sets
 * @param min            lower end of its range
 * @param max            upper end of its range
 * @param at             value used for steady states, phase portrait, basins, landscape and switching
 * @param second         name of the second parameter for the bistable region, or null
 * @param secondIndices  the circuit parameters the second one sets (empty if none)
 * @param secondMin      lower end of the second range
 * @param secondMax      upper end of the second range
 * @param xSpecies       species on the horizontal axis of state-plane figures
 * @param ySpecies       species on the vertical axis, or -1 for a one-species circuit (no state plane:
 *                       steady states, continuation and switching only)
 * @param systemSize     molecules per unit concentration for the stochastic analyses
 * @param trajectories   trajectories per landscape, per first-passage estimate and per commitment start
 * @param grid           cells per axis of the landscape grid
 * @param seed           seed of every stochastic analysis
 * @param switching      how switching times and commitment are simulated
 */
public record AnalysisPlan(String parameter, int[] indices, double min, double max, double at, String second,
        int[] secondIndices, double secondMin, double secondMax, int xSpecies, int ySpecies, double systemSize,
        int trajectories, int grid, long seed, SwitchingSettings switching) {

    /** A plan with the default switching settings. */
    public AnalysisPlan(String parameter, int[] indices, double min, double max, double at, String second,
            int[] secondIndices, double secondMin, double secondMax, int xSpecies, int ySpecies, double systemSize,
            int trajectories, int grid, long seed) {
        this(parameter, indices, min, max, at, second, secondIndices, secondMin, secondMax, xSpecies, ySpecies,
                systemSize, trajectories, grid, seed, SwitchingSettings.defaults());
    }

    /** Validates ranges and effort. */
    public AnalysisPlan {
        if (switching == null) {
            throw new IllegalArgumentException("switching settings are required; use SwitchingSettings.defaults()");
        }
        if (!(max > min)) {
            throw new IllegalArgumentException("--range must have MAX > MIN, got " + min + ":" + max);
        }
        if (second != null && !(secondMax > secondMin)) {
            throw new IllegalArgumentException("--second-range must have MAX > MIN, got " + secondMin + ":" + secondMax);
        }
        if (trajectories < 2) {
            throw new IllegalArgumentException("--trajectories must be at least 2, got " + trajectories);
        }
        if (grid < 10 || grid > 400) {
            throw new IllegalArgumentException("--grid must be from 10 to 400, got " + grid);
        }
        if (xSpecies == ySpecies && ySpecies >= 0) {
            throw new IllegalArgumentException("--x and --y must name different species");
        }
        indices = indices.clone();
        secondIndices = secondIndices.clone();
    }

    /** True when there is a state plane (two species to plot) for basins, landscapes and commitment. */
    public boolean hasPlane() {
        return ySpecies >= 0;
    }

    /** True when a second parameter was given. */
    public boolean hasSecond() {
        return second != null;
    }
}
