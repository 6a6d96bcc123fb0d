package org.fatefield.circuits.sim;

import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.model.ReactionNetwork;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/**
 * Deterministic rate equations integrated over each step by Hipparchus' adaptive Dormand-Prince
 * 8(5,3) method (Hairer, Norsett &amp; Wanner 1993, Solving Ordinary Differential Equations I,
 * section II.10) to a stated tolerance: the accurate noise-free view for single-cell work, where
 * the cost per step does not matter as it does in a tissue (use {@link RungeKutta4Stepper} there).
 */
public final class DormandPrinceStepper implements CircuitStepper {

    private final ReactionNetwork network;
    private final double tolerance;

    private DormandPrinceStepper(ReactionNetwork network, double tolerance) {
        this.network = network;
        this.tolerance = tolerance;
    }

    /** A stepper with relative and absolute tolerance {@code tolerance}. */
    public static DormandPrinceStepper of(ReactionNetwork network, double tolerance) {
        if (!(tolerance > 0) || !(tolerance < 1)) {
            throw new IllegalArgumentException("tolerance must be in (0, 1), got " + tolerance);
        }
        return new DormandPrinceStepper(network, tolerance);
    }

    @Override
    public void advance(double[] state, double[] params, double dt, UniformRandomProvider rng) {
        int n = state.length;
        OrdinaryDifferentialEquation ode = new DriftEquation(network, params);
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12 * dt, dt, tolerance, tolerance);
        double[] end = integrator.integrate(ode, new ODEState(0.0, state.clone()), dt).getPrimaryState();
        System.arraycopy(end, 0, state, 0, n);
    }

    @Override
    public CircuitStepper copy() {
        return new DormandPrinceStepper(network, tolerance);
    }
}
