package org.fatefield.circuits.sim;

import org.fatefield.circuits.model.ReactionNetwork;
import org.hipparchus.ode.OrdinaryDifferentialEquation;

/** A circuit's deterministic drift at fixed parameters, as an equation for Hipparchus' integrators. */
public final class DriftEquation implements OrdinaryDifferentialEquation {

    private final ReactionNetwork network;
    private final double[] params;
    private final double[] work;

    /** The drift of {@code network} at {@code params} (not copied: the caller keeps them fixed). */
    public DriftEquation(ReactionNetwork network, double[] params) {
        this.network = network;
        this.params = params;
        this.work = new double[network.reactionCount()];
    }

    @Override
    public int getDimension() {
        return network.speciesCount();
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        double[] out = new double[y.length];
        network.drift(y, params, out, work);
        return out;
    }
}
