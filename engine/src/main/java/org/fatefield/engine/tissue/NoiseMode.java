package org.fatefield.engine.tissue;

import java.util.Locale;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.sim.CircuitStepper;
import org.fatefield.circuits.sim.GillespieDirectStepper;
import org.fatefield.circuits.sim.LangevinStepper;
import org.fatefield.circuits.sim.RungeKutta4Stepper;
import org.fatefield.circuits.sim.TauLeapingStepper;

/** How each cell's circuit is simulated in the tissue. */
public enum NoiseMode {
    /** Chemical Langevin equation (intrinsic expression noise set by the system size). */
    LANGEVIN,
    /** Deterministic rate equations (fixed-step RK4): noise only from partitioning. */
    NONE,
    /** Gillespie's direct method: exact, in molecule counts (slow for many molecules). */
    EXACT,
    /** Tau-leaping with Cao-Gillespie-Petzold step selection: approximate, in molecule counts. */
    TAU_LEAP;

    /** A stepper for {@code network} in this mode. */
    public CircuitStepper stepper(ReactionNetwork network, double systemSize) {
        return switch (this) {
            case LANGEVIN -> LangevinStepper.of(network, systemSize);
            case NONE -> RungeKutta4Stepper.of(network);
            case EXACT -> GillespieDirectStepper.of(network, systemSize);
            case TAU_LEAP -> TauLeapingStepper.of(network, systemSize);
        };
    }

    /** The word a scenario uses for this mode. */
    public String word() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** The mode a scenario word names. */
    public static NoiseMode fromWord(String word) {
        return valueOf(word.toUpperCase(Locale.ROOT).replace('-', '_'));
    }
}
