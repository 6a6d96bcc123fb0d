package org.fatefield.circuits.sim;

import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.model.ReactionNetwork;

/**
 * The classical fixed-step fourth-order Runge–Kutta method on the deterministic drift: the
 * noise-free view of a circuit, for tissues where every cell takes the same step.
 * Reference: Hairer, Nørsett &amp; Wanner (1993), Solving Ordinary Differential Equations I,
 * Springer, section II.1.
 */
public final class RungeKutta4Stepper implements CircuitStepper {

    private final ReactionNetwork network;
    private final double[] k1;
    private final double[] k2;
    private final double[] k3;
    private final double[] k4;
    private final double[] stage;
    private final double[] work;

    private RungeKutta4Stepper(ReactionNetwork network) {
        this.network = network;
        // Padded: see SCRATCH_PADDING.
        int n = network.speciesCount() + SCRATCH_PADDING;
        this.k1 = new double[n];
        this.k2 = new double[n];
        this.k3 = new double[n];
        this.k4 = new double[n];
        this.stage = new double[n];
        this.work = new double[network.reactionCount() + SCRATCH_PADDING];
    }

    /** An RK4 stepper for {@code network}. */
    public static RungeKutta4Stepper of(ReactionNetwork network) {
        return new RungeKutta4Stepper(network);
    }

    @Override
    public void advance(double[] state, double[] params, double dt, UniformRandomProvider rng) {
        int n = state.length;
        network.drift(state, params, k1, work);
        for (int i = 0; i < n; i++) {
            stage[i] = state[i] + 0.5 * dt * k1[i];
        }
        network.drift(stage, params, k2, work);
        for (int i = 0; i < n; i++) {
            stage[i] = state[i] + 0.5 * dt * k2[i];
        }
        network.drift(stage, params, k3, work);
        for (int i = 0; i < n; i++) {
            stage[i] = state[i] + dt * k3[i];
        }
        network.drift(stage, params, k4, work);
        for (int i = 0; i < n; i++) {
            state[i] += dt / 6.0 * (k1[i] + 2.0 * k2[i] + 2.0 * k3[i] + k4[i]);
        }
    }

    @Override
    public CircuitStepper copy() {
        return new RungeKutta4Stepper(network);
    }
}
