package org.fatefield.circuits.sim;

import java.util.List;
import org.fatefield.circuits.model.ReactionNetwork;

/** Test network: production at constant rate k, first-order loss at rate gamma x. */
final class BirthDeath implements ReactionNetwork {

    @Override
    public List<String> speciesNames() {
        return List.of("X");
    }

    @Override
    public List<String> parameterNames() {
        return List.of("k", "gamma");
    }

    @Override
    public double[] defaultParameters() {
        return new double[] {1.0, 1.0};
    }

    @Override
    public int reactionCount() {
        return 2;
    }

    @Override
    public int stoichiometry(int reaction, int species) {
        return reaction == 0 ? 1 : -1;
    }

    @Override
    public void propensities(double[] x, double[] p, double[] out) {
        out[0] = p[0];
        out[1] = p[1] * Math.max(x[0], 0.0);
    }

    @Override
    public void jacobian(double[] x, double[] p, double[][] out) {
        out[0][0] = -p[1];
    }
}
