package org.fatefield.circuits.inference;

import java.util.List;

/**
 * One candidate model: its name, and the names and priors of its free parameters.
 *
 * @param name       a label for tables and figures
 * @param parameters parameter names, in order
 * @param priors     one prior per parameter
 */
public record AbcModel(String name, List<String> parameters, List<Prior> priors) {

    /** Validates and copies. */
    public AbcModel {
        parameters = List.copyOf(parameters);
        priors = List.copyOf(priors);
        if (parameters.isEmpty() || parameters.size() != priors.size()) {
            throw new IllegalArgumentException("model " + name + ": needs at least one parameter and one prior for each,"
                    + " got " + parameters.size() + " parameters and " + priors.size() + " priors");
        }
    }

    /** Number of parameters. */
    public int dimension() {
        return parameters.size();
    }

    /** Log prior density in working space. */
    double logPrior(double[] u) {
        double sum = 0;
        for (int a = 0; a < u.length; a++) {
            sum += priors.get(a).logDensity(u[a]);
        }
        return sum;
    }

    /** Natural-scale values of working-space coordinates. */
    double[] natural(double[] u) {
        double[] theta = new double[u.length];
        for (int a = 0; a < u.length; a++) {
            theta[a] = priors.get(a).fromWorking(u[a]);
        }
        return theta;
    }
}
