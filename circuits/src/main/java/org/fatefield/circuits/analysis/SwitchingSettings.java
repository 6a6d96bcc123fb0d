package org.fatefield.circuits.analysis;

import java.util.Locale;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.sim.CircuitStepper;
import org.fatefield.circuits.sim.GillespieDirectStepper;
import org.fatefield.circuits.sim.LangevinStepper;

/**
 * How switching times and commitment probabilities are simulated.
 *
 * @param method          the stochastic simulation
 * @param step            time step of the Langevin method, and for both methods the interval at
 *                        which a trajectory is checked for arrival (h), greater than 0
 * @param arrivalFraction a trajectory has arrived at an attractor when it is within this fraction
 *                        of the distance between the two attractors (Euclidean, in
 *                        concentrations), in (0, 0.5)
 * @param passageLimit    time limit of a first-passage trajectory (h); later arrivals are censored
 * @param commitmentLimit time limit of a commitment trajectory (h); undecided ones count as half
 * @param from            number of the stable state switched from (0 = first stable state, in the
 *                        order of {@code steady-states.csv}); -1 for the first
 * @param to              number of the stable state switched to; -1 for the last
 */
public record SwitchingSettings(Method method, double step, double arrivalFraction, double passageLimit,
        double commitmentLimit, int from, int to) {

    /** The stochastic simulation of switching. */
    public enum Method {
        /** Chemical Langevin equation by Euler-Maruyama with the settings' step. */
        LANGEVIN,
        /** Gillespie's direct method, exact in molecule counts; observed every step. */
        EXACT;

        /** The stepper of this method at system size {@code omega}. */
        public CircuitStepper stepper(ReactionNetwork network, double omega) {
            return this == EXACT ? GillespieDirectStepper.of(network, omega) : LangevinStepper.of(network, omega);
        }

        /** The word used on the command line and in output. */
        public String word() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** Validates; each message names the command-line option. */
    public SwitchingSettings {
        if (method == null) {
            throw new IllegalArgumentException("--switching-method must be langevin or exact");
        }
        if (!(step > 0) || !Double.isFinite(step)) {
            throw new IllegalArgumentException("--switching-step must be a finite number of hours greater than 0, got "
                    + step);
        }
        if (!(arrivalFraction > 0 && arrivalFraction < 0.5)) {
            throw new IllegalArgumentException("--arrival must be a fraction greater than 0 and less than 0.5 of the"
                    + " distance between the two attractors, got " + arrivalFraction);
        }
        if (!(passageLimit >= step) || !Double.isFinite(passageLimit)) {
            throw new IllegalArgumentException("--switching-limit must be a finite number of hours of at least one"
                    + " step (" + step + "), got " + passageLimit);
        }
        if (!(commitmentLimit >= step) || !Double.isFinite(commitmentLimit)) {
            throw new IllegalArgumentException("the commitment time limit must be at least one step, got "
                    + commitmentLimit);
        }
        if (passageLimit / step > 1e9) {
            throw new IllegalArgumentException("--switching-limit / --switching-step is " + passageLimit / step
                    + " steps per trajectory; keep it under 1e9 (raise the step or lower the limit)");
        }
        if (from < -1 || to < -1) {
            throw new IllegalArgumentException("--switch-from and --switch-to number stable states from 0, got "
                    + from + " and " + to);
        }
    }

    /** Langevin, step 0.01 h, arrival within a quarter of the distance, 2000 h and 500 h limits, first to last. */
    public static SwitchingSettings defaults() {
        return new SwitchingSettings(Method.LANGEVIN, 0.01, 0.25, 2000, 500, -1, -1);
    }

    /** Index into a list of {@code stableCount} stable states of the state switched from. */
    public int fromIndex(int stableCount) {
        return resolve(from, 0, stableCount, "--switch-from");
    }

    /** Index into a list of {@code stableCount} stable states of the state switched to. */
    public int toIndex(int stableCount) {
        return resolve(to, stableCount - 1, stableCount, "--switch-to");
    }

    private static int resolve(int chosen, int fallback, int count, String option) {
        int index = chosen < 0 ? fallback : chosen;
        if (index >= count) {
            throw new IllegalArgumentException(option + " " + chosen + " names no stable state: there are " + count
                    + " at this parameter value, numbered from 0 in steady-states.csv");
        }
        return index;
    }
}
