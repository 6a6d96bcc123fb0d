package org.fatefield.circuits.inference;

import java.util.List;

/**
 * One finished SMC generation.
 *
 * @param index       generation number (0 samples the prior)
 * @param tolerance   the tolerance its particles met (infinite for generation 0)
 * @param populations one population per model
 * @param models      posterior model probabilities at this tolerance
 */
public record Generation(int index, double tolerance, List<Population> populations, ModelProbabilities models) {

    /** Copies. */
    public Generation {
        populations = List.copyOf(populations);
    }

    /** Accepted over proposed candidates, pooled over the models. */
    public double acceptanceRate() {
        long proposed = 0;
        long accepted = 0;
        for (Population p : populations) {
            proposed += p.proposals();
            accepted += p.accepted();
        }
        return proposed > 0 ? (double) accepted / proposed : 0;
    }

    /** Candidates simulated, over the models. */
    public long simulated() {
        long sum = 0;
        for (Population p : populations) {
            sum += p.simulated();
        }
        return sum;
    }
}
