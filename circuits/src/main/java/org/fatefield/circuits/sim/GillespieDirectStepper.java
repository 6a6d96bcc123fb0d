package org.fatefield.circuits.sim;

import java.util.Arrays;
import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.model.ReactionNetwork;

/**
 * Gillespie's direct method: exact stochastic simulation in molecule counts.
 *
 * <p>Gillespie, D. T. (1977). Exact stochastic simulation of coupled chemical reactions.
 * J. Phys. Chem. 81(25):2340-2361, doi:10.1021/j100540a008. Reaction {@code j} fires at rate
 * {@code Omega a_j(n / Omega)} (the network's concentration propensity scaled to counts; for
 * Hill kinetics this is the usual phenomenological choice). The state handed in and out is in
 * concentrations, always a whole number of molecules divided by {@code Omega}.
 */
public final class GillespieDirectStepper implements CircuitStepper {

    private final ReactionNetwork network;
    private final double systemSize;
    private final ReactionTable table;
    private final double[] propensity;
    private final double[] concentration;
    private final double[] counts;
    private final int reactions;
    private long events;

    private GillespieDirectStepper(ReactionNetwork network, double systemSize) {
        this.network = network;
        this.systemSize = systemSize;
        this.table = new ReactionTable(network);
        // Padded: see SCRATCH_PADDING.
        this.reactions = network.reactionCount();
        this.propensity = new double[reactions + SCRATCH_PADDING];
        this.concentration = new double[network.speciesCount() + SCRATCH_PADDING];
        this.counts = new double[network.speciesCount() + SCRATCH_PADDING];
    }

    /** A direct-method stepper at system size {@code systemSize} (molecules per unit concentration). */
    public static GillespieDirectStepper of(ReactionNetwork network, double systemSize) {
        if (!(systemSize > 0) || Double.isInfinite(systemSize)) {
            throw new IllegalArgumentException("system size must be finite and greater than 0, got " + systemSize);
        }
        return new GillespieDirectStepper(network, systemSize);
    }

    /** Reactions fired since this stepper was made. */
    public long events() {
        return events;
    }

    @Override
    public void advance(double[] state, double[] params, double dt, UniformRandomProvider rng) {
        int n = state.length;
        for (int i = 0; i < n; i++) {
            counts[i] = Math.rint(state[i] * systemSize);
        }
        double t = 0;
        while (true) {
            // Step 1: propensities in events per unit time.
            for (int i = 0; i < n; i++) {
                concentration[i] = counts[i] / systemSize;
            }
            network.propensities(concentration, params, propensity);
            double total = 0;
            for (int j = 0; j < reactions; j++) {
                propensity[j] = Math.max(propensity[j], 0.0) * systemSize;
                total += propensity[j];
            }
            if (!Double.isFinite(total)) {
                // A rate law gave no finite number: no event time exists. The state becomes NaN,
                // which the caller (the tissue's finiteness check) reports with the cell.
                Arrays.fill(state, Double.NaN);
                return;
            }
            if (!(total > 0)) {
                break;
            }
            // Step 2: waiting time to the next reaction, exponential with rate a0.
            t += -Math.log(1.0 - rng.nextDouble()) / total;
            if (t > dt) {
                break;
            }
            // Step 3: which reaction, with probability a_j / a0.
            double target = rng.nextDouble() * total;
            int j = 0;
            double cumulative = propensity[0];
            while (cumulative <= target && j < reactions - 1) {
                cumulative += propensity[++j];
            }
            // Step 4: fire it.
            table.fire(j, 1.0, 1.0, counts);
            events++;
        }
        for (int i = 0; i < n; i++) {
            state[i] = counts[i] / systemSize;
        }
    }

    @Override
    public CircuitStepper copy() {
        return new GillespieDirectStepper(network, systemSize);
    }
}
