package org.fatefield.circuits.sim;

import org.fatefield.circuits.model.ReactionNetwork;

/**
 * The sparse stoichiometry of a network, precomputed once: for each reaction the species it
 * changes and by how much. Shared by the stochastic steppers' inner loops.
 */
final class ReactionTable {

    final int[][] species;
    final int[][] change;

    ReactionTable(ReactionNetwork network) {
        int m = network.reactionCount();
        int n = network.speciesCount();
        species = new int[m][];
        change = new int[m][];
        for (int j = 0; j < m; j++) {
            int count = 0;
            for (int i = 0; i < n; i++) {
                if (network.stoichiometry(j, i) != 0) {
                    count++;
                }
            }
            species[j] = new int[count];
            change[j] = new int[count];
            int k = 0;
            for (int i = 0; i < n; i++) {
                int nu = network.stoichiometry(j, i);
                if (nu != 0) {
                    species[j][k] = i;
                    change[j][k++] = nu;
                }
            }
        }
    }

    /** Adds {@code times} firings of reaction {@code j} to {@code state}, scaled by {@code unit}. */
    void fire(int j, double times, double unit, double[] state) {
        int[] s = species[j];
        int[] c = change[j];
        for (int k = 0; k < s.length; k++) {
            state[s[k]] += c[k] * times * unit;
        }
    }
}
