package org.fatefield.circuits.sim;

import org.fatefield.circuits.model.ReactionNetwork;

/**
 * The sparse stoichiometry of a network, precomputed once: for each reaction the species it
 * changes and by how much. Shared by the stochastic steppers' inner loops.
 */
final class ReactionTable {

    final int[][] species;
    final int[][] change;
    /** The one species reaction j changes by +-1, or -1 if it changes several or by more. */
    final int[] unitSpecies;
    /** +1 or -1 where {@link #unitSpecies} applies. */
    final int[] unitChange;

    ReactionTable(ReactionNetwork network) {
        int m = network.reactionCount();
        int n = network.speciesCount();
        species = new int[m][];
        change = new int[m][];
        unitSpecies = new int[m];
        unitChange = new int[m];
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
            boolean unit = count == 1 && Math.abs(change[j][0]) == 1;
            unitSpecies[j] = unit ? species[j][0] : -1;
            unitChange[j] = unit ? change[j][0] : 0;
        }
    }

    /** Adds {@code times} firings of reaction {@code j} to {@code state}, scaled by {@code unit}. */
    void fire(int j, double times, double unit, double[] state) {
        int only = unitSpecies[j];
        if (only >= 0) {
            state[only] += unitChange[j] * times * unit;
            return;
        }
        int[] s = species[j];
        int[] c = change[j];
        for (int k = 0; k < s.length; k++) {
            state[s[k]] += c[k] * times * unit;
        }
    }
}
