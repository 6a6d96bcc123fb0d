package org.fatefield.circuits.sim;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.fatefield.circuits.random.SwitchableSource;

/**
 * Chemical Langevin equation integrated by the Euler–Maruyama scheme.
 *
 * <p>For concentrations {@code x} and system size {@code Omega},
 * {@code x(t+dt) = x + sum_j nu_j (a_j dt + sqrt(a_j dt / Omega) xi_j)} with one independent
 * standard normal {@code xi_j} per reaction. Gillespie, D. T. (2000). The chemical Langevin
 * equation. J. Chem. Phys. 113(1):297-306, doi:10.1063/1.481811. Euler–Maruyama: Kloeden &amp;
 * Platen (1992), Numerical Solution of Stochastic Differential Equations, Springer, ch. 9.
 *
 * <p>Treatment at zero: propensities are evaluated on the state clipped at zero (so noise never
 * takes the square root of a negative number) and a concentration that a step takes below zero
 * is set to zero. This truncation biases the mean upward by an amount of the order of the
 * probability of reaching zero, negligible when the molecule count {@code x Omega} is well above
 * a few; for low counts use an exact method.
 */
public final class LangevinStepper implements CircuitStepper {

    private final ReactionNetwork network;
    private final double systemSize;
    private final ReactionTable table;
    private final double[] propensity;
    private final double[] normals;
    private final int reactions;
    /** The built-in switch, stepped by {@link #advanceSwitch}; null for any other network. */
    private final SelfActivatingSwitch builtInSwitch;
    private final SwitchableSource source = new SwitchableSource();
    private final ZigguratSampler.NormalizedGaussian gaussian = ZigguratSampler.NormalizedGaussian.of(source);

    private LangevinStepper(ReactionNetwork network, double systemSize) {
        this.network = network;
        this.systemSize = systemSize;
        this.table = new ReactionTable(network);
        // Padded: see SCRATCH_PADDING.
        this.reactions = network.reactionCount();
        this.propensity = new double[reactions + SCRATCH_PADDING];
        this.normals = new double[reactions + SCRATCH_PADDING];
        this.builtInSwitch = network instanceof SelfActivatingSwitch s ? s : null;
    }

    /**
     * A Langevin stepper for {@code network} at system size {@code systemSize} (molecules per
     * unit concentration).
     *
     * @throws IllegalArgumentException if the system size is not finite and positive
     */
    public static LangevinStepper of(ReactionNetwork network, double systemSize) {
        if (!(systemSize > 0.0) || Double.isInfinite(systemSize)) {
            throw new IllegalArgumentException("system size must be finite and greater than 0, got " + systemSize);
        }
        return new LangevinStepper(network, systemSize);
    }

    /** The system size (molecules per unit concentration). */
    public double systemSize() {
        return systemSize;
    }

    @Override
    public void advance(double[] state, double[] params, double dt, UniformRandomProvider rng) {
        source.use(rng);
        if (builtInSwitch != null) {
            advanceSwitch(state, params, dt);
            return;
        }
        for (int j = 0; j < reactions; j++) {
            normals[j] = gaussian.sample();
        }
        advance(state, params, dt, normals);
    }

    /**
     * The step of {@link #advance(double[], double[], double, double[])} for the built-in switch,
     * written out: the same four normals in the same order, the same propensities and the same
     * operations in the same order, so the result is identical to the last bit, without the
     * propensity and normal arrays and the reaction table (SwitchKernelTest compares the two).
     */
    private void advanceSwitch(double[] state, double[] p, double dt) {
        double n0 = gaussian.sample();
        double n1 = gaussian.sample();
        double n2 = gaussian.sample();
        double n3 = gaussian.sample();
        int second = SelfActivatingSwitch.geneOffset(1);
        double a = state[0];
        double b = state[1];
        double prodA = Math.max(SelfActivatingSwitch.production(p, 0, a, b), 0.0);
        double lossA = Math.max(SelfActivatingSwitch.loss(p, 0, a), 0.0);
        double prodB = Math.max(SelfActivatingSwitch.production(p, second, b, a), 0.0);
        double lossB = Math.max(SelfActivatingSwitch.loss(p, second, b), 0.0);
        double noiseScale = dt / systemSize;
        double x = a + (prodA * dt + Math.sqrt(prodA * noiseScale) * n0);
        x = x - (lossA * dt + Math.sqrt(lossA * noiseScale) * n1);
        double y = b + (prodB * dt + Math.sqrt(prodB * noiseScale) * n2);
        y = y - (lossB * dt + Math.sqrt(lossB * noiseScale) * n3);
        state[0] = x < 0.0 ? 0.0 : x;
        state[1] = y < 0.0 ? 0.0 : y;
    }

    /**
     * One step driven by given standard normal increments, one per reaction (the Wiener increment
     * of reaction j over the step is {@code sqrt(dt) xi_j}): lets callers reuse one Brownian path
     * at several step sizes, as convergence studies need.
     *
     * @param xi standard normals, one per reaction, not modified
     */
    public void advance(double[] state, double[] params, double dt, double[] xi) {
        network.propensities(state, params, propensity);
        double noiseScale = dt / systemSize;
        for (int j = 0; j < reactions; j++) {
            double a = Math.max(propensity[j], 0.0);
            double increment = a * dt + Math.sqrt(a * noiseScale) * xi[j];
            table.fire(j, increment, 1.0, state);
        }
        for (int i = 0; i < state.length; i++) {
            if (state[i] < 0.0) {
                state[i] = 0.0;
            }
        }
    }

    @Override
    public CircuitStepper copy() {
        return new LangevinStepper(network, systemSize);
    }
}
