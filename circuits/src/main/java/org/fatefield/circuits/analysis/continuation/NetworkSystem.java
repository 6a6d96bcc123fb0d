package org.fatefield.circuits.analysis.continuation;

import org.fatefield.circuits.model.ReactionNetwork;

/** The steady-state equations of a circuit, with one of its parameters as the continuation parameter. */
public final class NetworkSystem implements ParametrisedSystem {

    private final ReactionNetwork network;
    private final double[] params;
    private final int parameter;
    private final double[] work;

    /**
     * @param network   the circuit
     * @param params    values of the other parameters (copied)
     * @param parameter index of the continuation parameter
     */
    public NetworkSystem(ReactionNetwork network, double[] params, int parameter) {
        if (parameter < 0 || parameter >= params.length) {
            throw new IllegalArgumentException("parameter index " + parameter + " is outside 0.." + (params.length - 1));
        }
        this.network = network;
        this.params = params.clone();
        this.parameter = parameter;
        this.work = new double[network.reactionCount()];
    }

    /** The circuit. */
    public ReactionNetwork network() {
        return network;
    }

    /** A copy of the parameter vector with the continuation parameter set to {@code lambda}. */
    public double[] parametersAt(double lambda) {
        double[] p = params.clone();
        p[parameter] = lambda;
        return p;
    }

    @Override
    public int dimension() {
        return network.speciesCount();
    }

    @Override
    public void value(double[] x, double lambda, double[] out) {
        double saved = params[parameter];
        params[parameter] = lambda;
        network.drift(x, params, out, work);
        params[parameter] = saved;
    }

    @Override
    public void jacobian(double[] x, double lambda, double[][] out) {
        double saved = params[parameter];
        params[parameter] = lambda;
        network.jacobian(x, params, out);
        params[parameter] = saved;
    }
}
