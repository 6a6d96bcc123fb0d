package org.fatefield.circuits.analysis;

import java.util.List;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.sim.DriftEquation;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/**
 * Basins of attraction on a grid of initial states in the plane of two species: each start is
 * integrated deterministically (Hipparchus' adaptive Dormand-Prince 8(5,3)) until the drift is
 * negligible, then matched to the nearest stable steady state.
 *
 * @param xSpecies  index of the species on the horizontal axis
 * @param ySpecies  index of the species on the vertical axis
 * @param xs        grid values along x
 * @param ys        grid values along y
 * @param attractor {@code attractor[j][i]}: index into {@code attractors} reached from (xs[i], ys[j]), -1 if none
 * @param attractors the stable steady states
 */
public record BasinMap(int xSpecies, int ySpecies, double[] xs, double[] ys, int[][] attractor,
        List<SteadyState> attractors) {

    private static final double CHUNK = 5.0;
    private static final double HORIZON = 500.0;

    /**
     * Computes the basin map.
     *
     * @param network    the circuit
     * @param params     its parameters
     * @param base       values of the species not on the axes (copied), one per species
     * @param attractors stable steady states to match (from {@link SteadyStateFinder})
     * @param xSpecies   species on the horizontal axis
     * @param ySpecies   species on the vertical axis
     * @param lower      lower corner (x, y)
     * @param upper      upper corner (x, y)
     * @param points     grid points per axis, at least 2
     */
    public static BasinMap compute(ReactionNetwork network, double[] params, double[] base,
            List<SteadyState> attractors, int xSpecies, int ySpecies, double[] lower, double[] upper, int points) {
        if (points < 2) {
            throw new IllegalArgumentException("a basin map needs at least 2 points per axis, got " + points);
        }
        int n = network.speciesCount();
        double[] work = new double[network.reactionCount()];
        OrdinaryDifferentialEquation ode = new DriftEquation(network, params);
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-8, 10.0, 1e-10, 1e-9);
        double[] xs = new double[points];
        double[] ys = new double[points];
        for (int i = 0; i < points; i++) {
            xs[i] = lower[0] + (upper[0] - lower[0]) * i / (points - 1);
            ys[i] = lower[1] + (upper[1] - lower[1]) * i / (points - 1);
        }
        int[][] label = new int[points][points];
        double[] drift = new double[n];
        for (int j = 0; j < points; j++) {
            for (int i = 0; i < points; i++) {
                double[] y = base.clone();
                y[xSpecies] = xs[i];
                y[ySpecies] = ys[j];
                double t = 0;
                while (t < HORIZON) {
                    ODEStateAndDerivative end = integrator.integrate(ode, new ODEState(t, y), t + CHUNK);
                    y = end.getPrimaryState();
                    t = end.getTime();
                    network.drift(y, params, drift, work);
                    if (norm(drift) < 1e-7) {
                        break;
                    }
                }
                label[j][i] = nearest(y, attractors);
            }
        }
        return new BasinMap(xSpecies, ySpecies, xs, ys, label, List.copyOf(attractors));
    }

    private static int nearest(double[] y, List<SteadyState> attractors) {
        int best = -1;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (int k = 0; k < attractors.size(); k++) {
            double[] s = attractors.get(k).state();
            double d = 0;
            for (int i = 0; i < s.length; i++) {
                d += (y[i] - s[i]) * (y[i] - s[i]);
            }
            if (d < bestDistance) {
                bestDistance = d;
                best = k;
            }
        }
        return bestDistance < 1e-6 ? best : -1;
    }

    private static double norm(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x * x;
        }
        return Math.sqrt(s);
    }
}
