package org.fatefield.circuits.sim;

import java.util.List;
import org.fatefield.circuits.model.ReactionNetwork;

/**
 * Test network: mRNA made at rate km and lost at gm m; protein made at kp m and lost at gp p.
 * Parameters in order km, gm, kp, gp.
 */
final class TwoStageExpression implements ReactionNetwork {

    @Override
    public List<String> speciesNames() {
        return List.of("mRNA", "protein");
    }

    @Override
    public List<String> parameterNames() {
        return List.of("km", "gm", "kp", "gp");
    }

    @Override
    public double[] defaultParameters() {
        return new double[] {2.0, 1.0, 5.0, 0.1};
    }

    @Override
    public int reactionCount() {
        return 4;
    }

    @Override
    public int stoichiometry(int reaction, int species) {
        return switch (reaction) {
            case 0 -> species == 0 ? 1 : 0;
            case 1 -> species == 0 ? -1 : 0;
            case 2 -> species == 1 ? 1 : 0;
            default -> species == 1 ? -1 : 0;
        };
    }

    @Override
    public void propensities(double[] x, double[] p, double[] out) {
        out[0] = p[0];
        out[1] = p[1] * Math.max(x[0], 0);
        out[2] = p[2] * Math.max(x[0], 0);
        out[3] = p[3] * Math.max(x[1], 0);
    }

    @Override
    public void jacobian(double[] x, double[] p, double[][] out) {
        out[0][0] = -p[1];
        out[0][1] = 0;
        out[1][0] = p[2];
        out[1][1] = -p[3];
    }
}
