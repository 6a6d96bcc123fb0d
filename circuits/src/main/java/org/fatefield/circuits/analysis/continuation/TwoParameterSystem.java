package org.fatefield.circuits.analysis.continuation;

import org.fatefield.circuits.model.ReactionNetwork;

/** Steady-state equations {@code F(x; mu, nu) = 0} of a circuit with two free parameters. */
public final class TwoParameterSystem {

    private final ReactionNetwork network;
    private final double[] params;
    private final int first;
    private final int second;
    private final double[] work;

    /**
     * @param network the circuit
     * @param params  values of the other parameters (copied)
     * @param first   index of the first free parameter
     * @param second  index of the second free parameter
     */
    public TwoParameterSystem(ReactionNetwork network, double[] params, int first, int second) {
        if (first == second) {
            throw new IllegalArgumentException("the two parameters must differ, both are index " + first);
        }
        this.network = network;
        this.params = params.clone();
        this.first = first;
        this.second = second;
        this.work = new double[network.reactionCount()];
    }

    /** Number of species. */
    public int dimension() {
        return network.speciesCount();
    }

    /** Writes {@code F(x; mu, nu)}. */
    public void value(double[] x, double mu, double nu, double[] out) {
        network.drift(x, with(mu, nu), out, work);
    }

    /** Writes {@code dF/dx} at (x; mu, nu). */
    public void jacobian(double[] x, double mu, double nu, double[][] out) {
        network.jacobian(x, with(mu, nu), out);
    }

    /** The one-parameter system along the first parameter with the second fixed at {@code nu}. */
    public NetworkSystem alongFirst(double nu) {
        double[] p = params.clone();
        p[second] = nu;
        return new NetworkSystem(network, p, first);
    }

    private double[] with(double mu, double nu) {
        double[] p = params.clone();
        p[first] = mu;
        p[second] = nu;
        return p;
    }
}
