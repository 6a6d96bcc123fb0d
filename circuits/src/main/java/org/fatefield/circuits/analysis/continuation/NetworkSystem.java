package org.fatefield.circuits.analysis.continuation;

import org.fatefield.circuits.model.ReactionNetwork;

/**
 * The steady-state equations of a circuit, with one of its parameters (or a group of parameters
 * that move together, such as the same rate in both genes) as the continuation parameter.
 */
public final class NetworkSystem implements ParametrisedSystem {

    private final ReactionNetwork network;
    private final double[] params;
    private final int[] parameter;
    private final double[] work;

    /**
     * @param network   the circuit
     * @param params    values of the other parameters (copied)
     * @param parameter indices of the parameters set to the continuation parameter's value
     */
    public NetworkSystem(ReactionNetwork network, double[] params, int... parameter) {
        if (parameter.length == 0) {
            throw new IllegalArgumentException("name at least one parameter to continue in");
        }
        for (int index : parameter) {
            if (index < 0 || index >= params.length) {
                throw new IllegalArgumentException("parameter index " + index + " is outside 0.." + (params.length - 1));
            }
        }
        this.network = network;
        this.params = params.clone();
        this.parameter = parameter.clone();
        this.work = new double[network.reactionCount()];
    }

    /** The circuit. */
    public ReactionNetwork network() {
        return network;
    }

    /** A copy of the parameter vector with the continuation parameter set to {@code lambda}. */
    public double[] parametersAt(double lambda) {
        double[] p = params.clone();
        for (int index : parameter) {
            p[index] = lambda;
        }
        return p;
    }

    @Override
    public int dimension() {
        return network.speciesCount();
    }

    @Override
    public void value(double[] x, double lambda, double[] out) {
        network.drift(x, parametersAt(lambda), out, work);
    }

    @Override
    public void jacobian(double[] x, double lambda, double[][] out) {
        network.jacobian(x, parametersAt(lambda), out);
    }
}
