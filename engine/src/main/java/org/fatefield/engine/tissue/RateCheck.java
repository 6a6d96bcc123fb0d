package org.fatefield.engine.tissue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.fatefield.circuits.analysis.Spectra;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.sim.CircuitStepper;
import org.fatefield.circuits.sim.RungeKutta4Stepper;
import org.fatefield.engine.coupling.SignalCoupling;
import org.hipparchus.complex.Complex;

/**
 * Checks before a run that every reaction rate is a finite number of at least 0 where the run
 * will certainly evaluate it: at the initial state and at zero concentrations, with the
 * coupled parameters at each end of their coupling's range (all combinations, for up to four
 * couplings). A negative rate would otherwise be clamped to zero by the exact methods and
 * followed backwards by the others, silently; a non-finite one would stop the run only after
 * it had started. For the fixed-step methods it also checks the step against the circuit's
 * fastest rate there (the largest eigenvalue modulus of its Jacobian): Euler-Maruyama
 * (Langevin) is unstable on a linear decay when rate x step exceeds 2 and already wrong by
 * a factor of two at 1, so 1 is the limit; the deterministic RK4 steps are refused above 2
 * (their stability limit on real decays is 2.79; Hairer, Norsett &amp; Wanner 1993, Solving
 * Ordinary Differential Equations I, §IV.2). Last, every rate is evaluated over the box of
 * states the circuit can reach (see boxProblem).
 */
public final class RateCheck {

    private static final int MAX_CORNER_COUPLINGS = 4;

    private RateCheck() {
    }

    /** What is wrong with the rates of {@code spec}'s circuit, one message per problem (empty if nothing). */
    public static List<String> problems(TissueSpec spec) {
        ReactionNetwork network = spec.circuit().network();
        List<SignalCoupling> couplings = spec.mapping().couplings();
        int k = Math.min(couplings.size(), MAX_CORNER_COUPLINGS);
        double[] initial = spec.circuit().initialState();
        double[][] states = {initial, new double[initial.length]};
        String[] stateNames = {"the initial state", "zero concentrations"};
        double[] propensity = new double[network.reactionCount()];
        List<String> problems = new ArrayList<>();
        for (int corner = 0; corner < (1 << k); corner++) {
            double[] p = spec.mapping().base().clone();
            StringBuilder where = new StringBuilder();
            for (int c = 0; c < k; c++) {
                SignalCoupling coupling = couplings.get(c);
                double value = coupling.law().range()[(corner >> c) & 1];
                for (int index : coupling.parameterIndices()) {
                    p[index] = value;
                }
                where.append(String.format(Locale.ROOT, "%s%s = %.6g", where.length() == 0 ? "" : ", ",
                        coupling.label(), value));
            }
            for (int s = 0; s < states.length; s++) {
                network.propensities(states[s], p, propensity);
                for (int r = 0; r < propensity.length; r++) {
                    String problem = !Double.isFinite(propensity[r]) ? "is not a finite number (" + propensity[r] + ")"
                            : propensity[r] < 0 ? String.format(Locale.ROOT, "is negative (%.6g); a rate must be at"
                                    + " least 0", propensity[r]) : null;
                    if (problem != null) {
                        problems.add(String.format(Locale.ROOT, "the rate of %s %s at %s %s%s", network.reactionName(r),
                                problem, stateNames[s], Arrays.toString(states[s]),
                                where.length() == 0 ? "" : " with " + where + " (an end of the coupling's range)")
                                + "; fix the rate law, the parameter values or the coupling's range");
                    }
                }
            }
            if (problems.isEmpty()) {
                String step = stepProblem(spec, initial, p, where.toString());
                if (step != null) {
                    problems.add(step);
                }
            }
            if (problems.isEmpty()) {
                String box = boxProblem(spec, p, where.toString());
                if (box != null) {
                    problems.add(box);
                }
            }
            if (!problems.isEmpty()) {
                return problems;
            }
        }
        return problems;
    }

    /**
     * Evaluates every rate over the box of states the circuit can reach: each species from 0 to
     * 1.5 times its largest value on the deterministic path from the initial state (RK4 at the
     * run's step, over the run or 200 h, whichever is longer, at most 1e5 steps: long enough to
     * settle, and a divided cell restarts from its mother's state; the margin allows for noise), on a
     * grid of 0, half and all of each range (every combination up to six species, else the
     * corners of one species at a time). Returns the first problem, or null.
     */
    private static String boxProblem(TissueSpec spec, double[] p, String where) {
        ReactionNetwork network = spec.circuit().network();
        int n = network.speciesCount();
        double[] x = spec.circuit().initialState();
        double[] top = x.clone();
        double dt = spec.timing().step();
        long steps = (long) Math.min(Math.ceil(Math.max(spec.timing().duration(), 200.0) / dt), 100_000);
        CircuitStepper path = RungeKutta4Stepper.of(network);
        for (long k = 0; k < steps; k++) {
            path.advance(x, p, dt, null);
            for (int i = 0; i < n; i++) {
                if (!Double.isFinite(x[i])) {
                    return String.format(Locale.ROOT, "the circuit's deterministic path from the initial state%s"
                            + " runs away: %s is %s at t = %.4g h; fix the rate laws or the parameter values",
                            where.isEmpty() ? "" : " with " + where, network.speciesNames().get(i), x[i], (k + 1) * dt);
                }
                top[i] = Math.max(top[i], x[i]);
            }
        }
        double[] propensity = new double[network.reactionCount()];
        double[] state = new double[n];
        int points = n <= 6 ? (int) Math.pow(3, n) : 2 * n + 1;
        for (int point = 0; point < points; point++) {
            for (int i = 0; i < n; i++) {
                int level = n <= 6 ? (point / (int) Math.pow(3, i)) % 3 : point == 2 * n ? 2
                        : point / 2 == i ? 1 + point % 2 : 0;
                state[i] = 1.5 * top[i] * level / 2.0;
            }
            network.propensities(state, p, propensity);
            for (int r = 0; r < propensity.length; r++) {
                if (!Double.isFinite(propensity[r]) || propensity[r] < 0) {
                    return String.format(Locale.ROOT, "the rate of %s is %s at %s, inside the states the circuit can"
                            + " reach%s (each species from 0 to 1.5 times its largest value on the deterministic path"
                            + " from the initial state: %s); fix the rate law, the parameter values or the coupling's"
                            + " range", network.reactionName(r), Double.isFinite(propensity[r])
                            ? String.format(Locale.ROOT, "negative (%.6g)", propensity[r]) : "not a finite number ("
                            + propensity[r] + ")", Arrays.toString(state), where.isEmpty() ? "" : " with " + where,
                            Arrays.toString(top));
                }
            }
        }
        return null;
    }

    private static String stepProblem(TissueSpec spec, double[] x, double[] p, String where) {
        NoiseMode mode = spec.circuit().noise();
        double limit = mode == NoiseMode.LANGEVIN ? 1.0 : mode == NoiseMode.NONE ? 2.0 : Double.NaN;
        if (Double.isNaN(limit)) {
            return null;
        }
        ReactionNetwork network = spec.circuit().network();
        int n = network.speciesCount();
        double[][] jac = new double[n][n];
        network.jacobian(x, p, jac);
        double fastest = 0;
        for (Complex lambda : Spectra.eigenvalues(jac)) {
            fastest = Math.max(fastest, lambda.norm());
        }
        double dt = spec.timing().step();
        if (!(fastest * dt <= limit)) {
            return String.format(Locale.ROOT, "run.step = %.6g h is too long for the circuit: its fastest rate at the"
                    + " initial state%s is %.6g per hour, so rate x step = %.3g, above the %s method's limit of %.0f"
                    + " (the cells' molecule numbers would be wrong, not just noisy); set run.step to at most %.3g h",
                    dt, where.isEmpty() ? "" : " with " + where, fastest, fastest * dt, mode.word(), limit,
                    limit / fastest);
        }
        return null;
    }
}
