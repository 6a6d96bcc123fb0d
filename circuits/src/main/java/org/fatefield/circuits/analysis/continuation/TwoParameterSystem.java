package org.fatefield.circuits.analysis.continuation;

import org.fatefield.circuits.model.ReactionNetwork;

/** Steady-state equations {@code F(x; mu, nu) = 0} of a circuit with two free parameters. */
public final class TwoParameterSystem {

    private final ReactionNetwork network;
    private final double[] params;
    private final int[] first;
    private final int[] second;
    private final double[] work;

    /**
     * @param network the circuit
     * @param params  values of the other parameters (copied)
     * @param first   indices set to the first free parameter
     * @param second  indices set to the second free parameter
     */
    public TwoParameterSystem(ReactionNetwork network, double[] params, int[] first, int[] second) {
        for (int a : first) {
            for (int b : second) {
                if (a == b) {
                    throw new IllegalArgumentException("the two parameters must differ, both set index " + a);
                }
            }
        }
        this.network = network;
        this.params = params.clone();
        this.first = first.clone();
        this.second = second.clone();
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
        for (int index : second) {
            p[index] = nu;
        }
        return new NetworkSystem(network, p, first);
    }

    private double[] with(double mu, double nu) {
        double[] p = params.clone();
        for (int index : first) {
            p[index] = mu;
        }
        for (int index : second) {
            p[index] = nu;
        }
        return p;
    }
}
