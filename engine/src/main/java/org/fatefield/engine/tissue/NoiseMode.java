package org.fatefield.engine.tissue;

import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.sim.CircuitStepper;
import org.fatefield.circuits.sim.LangevinStepper;
import org.fatefield.circuits.sim.RungeKutta4Stepper;

/** How each cell's circuit is simulated in the tissue. */
public enum NoiseMode {
    /** Chemical Langevin equation (intrinsic expression noise set by the system size). */
    LANGEVIN,
    /** Deterministic rate equations (fixed-step RK4): noise only from partitioning. */
    NONE;

    /** A stepper for {@code network} in this mode. */
    public CircuitStepper stepper(ReactionNetwork network, double systemSize) {
        return this == LANGEVIN ? LangevinStepper.of(network, systemSize) : RungeKutta4Stepper.of(network);
    }
}
