package org.fatefield.engine.bench;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.ContinuationSettings;
import org.fatefield.circuits.analysis.continuation.EquilibriumContinuation;
import org.fatefield.circuits.analysis.continuation.NetworkSystem;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.circuits.sim.CircuitStepper;
import org.fatefield.circuits.sim.GillespieDirectStepper;
import org.fatefield.circuits.sim.LangevinStepper;

/**
 * Single-cell speed: a custom circuit against the built-in switch it is equivalent to (same
 * Langevin step, same cells, same streams), exact stochastic simulation in events per second, and
 * the time to continue the switch over a parameter range with all its special points.
 */
public final class CircuitBenchmark {

    /**
     * Results.
     *
     * @param builtInRate        Langevin cell-steps per second of the built-in switch
     * @param customRate         the same for the equivalent custom circuit
     * @param ssaEventsPerSecond reactions fired per second by the direct method on one core
     * @param continuationMillis time of one full bifurcation diagram with branch switching
     * @param specialPoints      special points it found
     */
    public record Result(double builtInRate, double customRate, double ssaEventsPerSecond, double continuationMillis,
            int specialPoints) {

        /** Custom over built-in: 1 means the compiled rate laws cost nothing extra. */
        public double customRatio() {
            return customRate / builtInRate;
        }
    }

    private CircuitBenchmark() {
    }

    /** The built-in switch rewritten as a custom circuit with the same parameter values. */
    public static CustomNetwork customEquivalent(SelfActivatingSwitch sw) {
        List<String> genes = sw.speciesNames();
        List<String> names = new ArrayList<>();
        for (String g : genes) {
            for (String k : GeneKinetics.NAMES) {
                names.add(g + "_" + k);
            }
        }
        List<CustomNetwork.ReactionDefinition> reactions = new ArrayList<>();
        for (int g = 0; g < 2; g++) {
            String own = genes.get(g);
            String other = genes.get(1 - g);
            String p = own + "_";
            int[] make = new int[2];
            make[g] = 1;
            int[] lose = new int[2];
            lose[g] = -1;
            reactions.add(new CustomNetwork.ReactionDefinition("make " + own, make,
                    p + "basal + " + p + "self_activation * hill_act(" + own + ", " + p + "self_threshold, " + p
                            + "self_hill) + " + p + "repression * hill_rep(" + other + ", " + p
                            + "repression_threshold, " + p + "repression_hill)"));
            reactions.add(new CustomNetwork.ReactionDefinition("lose " + own, lose, p + "degradation * " + own));
        }
        return CustomNetwork.of(genes, names, sw.defaultParameters(), reactions);
    }

    /**
     * Runs the three measurements on {@code sw} at system size {@code omega}, continuing
     * parameter group {@code parameter} over {@code [min, max]}.
     */
    public static Result measure(SelfActivatingSwitch sw, double omega, int[] parameter, double min, double max,
            int cells, int steps) {
        CustomNetwork custom = customEquivalent(sw);
        double[] p = sw.defaultParameters();
        double builtIn = 0;
        double customRate = 0;
        for (int round = 0; round < 3; round++) {
            builtIn = langevinRate(sw, p, omega, cells, steps);
            customRate = langevinRate(custom, p, omega, cells, steps);
        }
        GillespieDirectStepper ssa = GillespieDirectStepper.of(sw, omega);
        UniformRandomProvider rng = RandomStreams.of(3).stream(0);
        double[] x = {0.3, 0.3};
        ssa.advance(x, p, 50, rng);
        long before = ssa.events();
        long t0 = System.nanoTime();
        ssa.advance(x, p, 2000, rng);
        double ssaRate = (ssa.events() - before) / ((System.nanoTime() - t0) / 1e9);
        NetworkSystem system = new NetworkSystem(sw, p, parameter);
        List<Branch> branches = List.of();
        double millis = Double.NaN;
        for (int round = 0; round < 3; round++) {
            long c0 = System.nanoTime();
            branches = EquilibriumContinuation.of(system, ContinuationSettings.defaults().withMaxStep((max - min) / 40))
                    .diagram(new double[] {0.3, 0.3}, min, min, max, true, 2);
            millis = (System.nanoTime() - c0) / 1e6;
        }
        int specials = branches.stream().mapToInt(b -> b.specials().size()).sum();
        return new Result(builtIn, customRate, ssaRate, millis, specials);
    }

    private static double langevinRate(ReactionNetwork network, double[] p, double omega, int cells, int steps) {
        CircuitStepper stepper = LangevinStepper.of(network, omega);
        RandomStreams streams = RandomStreams.of(1);
        UniformRandomProvider[] rng = new UniformRandomProvider[cells];
        double[][] state = new double[cells][];
        for (int i = 0; i < cells; i++) {
            rng[i] = streams.stream(i);
            state[i] = new double[] {0.3, 0.3};
        }
        long t0 = System.nanoTime();
        for (int s = 0; s < steps; s++) {
            for (int i = 0; i < cells; i++) {
                stepper.advance(state[i], p, 0.01, rng[i]);
            }
        }
        double seconds = (System.nanoTime() - t0) / 1e9;
        double sink = 0;
        for (double[] st : state) {
            sink += st[0];
        }
        if (Double.isNaN(sink)) {
            throw new IllegalStateException("benchmark state became NaN");
        }
        return (double) cells * steps / seconds;
    }
}
