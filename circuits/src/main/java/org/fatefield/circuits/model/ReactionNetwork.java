package org.fatefield.circuits.model;

import java.util.List;
import java.util.stream.IntStream;

/**
 * An intracellular circuit written as species, parameters and reactions.
 *
 * <p>Every simulation method and every analysis derives from the same reactions: the
 * deterministic drift is {@code dx_i/dt = sum_j nu_ij a_j(x, p)}, the chemical Langevin noise
 * has variance {@code sum_j nu_ij^2 a_j / Omega} per unit time, and the exact stochastic process
 * fires reaction {@code j} at rate {@code Omega a_j}. Concentrations are dimensionless; the
 * system size {@code Omega} (molecules per unit concentration) belongs to the simulation method,
 * not to the network.
 *
 * <p>Implementations are immutable and thread-safe: all mutable data lives in the arrays the
 * caller passes in.
 */
public interface ReactionNetwork {

    /** Names of the species, in state-vector order. */
    List<String> speciesNames();

    /** Names of the parameters, in parameter-vector order. */
    List<String> parameterNames();

    /** A copy of the default parameter vector. */
    double[] defaultParameters();

    /** Number of reactions. */
    int reactionCount();

    /** Net change of {@code species} when {@code reaction} fires once. */
    int stoichiometry(int reaction, int species);

    /**
     * Writes the propensity of every reaction, in concentration per unit time, into {@code out}.
     *
     * @param x   state (concentrations), not modified
     * @param p   parameters, not modified
     * @param out receives {@link #reactionCount()} values
     */
    void propensities(double[] x, double[] p, double[] out);

    /**
     * Writes the Jacobian of the drift, {@code out[i][k] = d(dx_i/dt)/dx_k}, into {@code out}.
     *
     * @param x   state, not modified
     * @param p   parameters, not modified
     * @param out square matrix of side {@link #speciesCount()}, overwritten
     */
    void jacobian(double[] x, double[] p, double[][] out);

    /** Number of species. */
    default int speciesCount() {
        return speciesNames().size();
    }

    /** Index of the named parameter; throws with the list of known names if there is none. */
    default int parameterIndex(String name) {
        int index = parameterNames().indexOf(name);
        if (index < 0) {
            throw new IllegalArgumentException("unknown parameter '" + name + "'; this circuit has "
                    + parameterNames());
        }
        return index;
    }

    /**
     * The parameters a name stands for: the parameter of that exact name, or else every
     * parameter whose name ends in {@code .<name>}, moved together: {@code degradation} is every
     * {@code <gene>.degradation}, and in a Hill network {@code hill} is every
     * {@code <target>.<source>.hill}. Empty if none.
     */
    default int[] parameterGroup(String name) {
        List<String> names = parameterNames();
        if (names.contains(name)) {
            return new int[] {names.indexOf(name)};
        }
        String suffix = "." + name;
        return IntStream.range(0, names.size()).filter(i -> names.get(i).endsWith(suffix)).toArray();
    }

    /**
     * Sum of the reaction rates at {@code x} (negative rates counted as 0, as the exact methods
     * clamp them): the event rate of Gillespie's method per unit system size.
     */
    default double totalRate(double[] x, double[] p) {
        double[] propensity = new double[reactionCount()];
        propensities(x, p, propensity);
        double total = 0;
        for (double a : propensity) {
            total += Math.max(0, a);
        }
        return total;
    }

    /** A name for reaction {@code r} that a modeler recognises, for messages ("reaction 3" unless a circuit knows better). */
    default String reactionName(int r) {
        return "reaction " + (r + 1);
    }

    /** Index of the named species; throws with the list of known names if there is none. */
    default int speciesIndex(String name) {
        int index = speciesNames().indexOf(name);
        if (index < 0) {
            throw new IllegalArgumentException("unknown species '" + name + "'; this circuit has "
                    + speciesNames());
        }
        return index;
    }

    /**
     * Writes the deterministic drift {@code dx/dt = N a(x, p)} into {@code out}, using
     * {@code work} (length at least {@link #reactionCount()}) for the propensities.
     */
    default void drift(double[] x, double[] p, double[] out, double[] work) {
        propensities(x, p, work);
        int n = speciesCount();
        for (int i = 0; i < n; i++) {
            out[i] = 0.0;
        }
        int m = reactionCount();
        for (int j = 0; j < m; j++) {
            for (int i = 0; i < n; i++) {
                int nu = stoichiometry(j, i);
                if (nu != 0) {
                    out[i] += nu * work[j];
                }
            }
        }
    }

    /** Allocating convenience form of {@link #drift(double[], double[], double[], double[])}. */
    default double[] drift(double[] x, double[] p) {
        double[] out = new double[speciesCount()];
        drift(x, p, out, new double[reactionCount()]);
        return out;
    }
}
