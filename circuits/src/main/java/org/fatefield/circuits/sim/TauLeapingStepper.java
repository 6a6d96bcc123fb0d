package org.fatefield.circuits.sim;

import java.util.Arrays;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.PoissonSampler;
import org.fatefield.circuits.model.ReactionNetwork;

/**
 * Explicit tau-leaping with the step selection of Cao, Gillespie &amp; Petzold.
 *
 * <p>Cao, Y., Gillespie, D. T. &amp; Petzold, L. R. (2006). Efficient step size selection for
 * the tau-leaping simulation method. J. Chem. Phys. 124:044109, doi:10.1063/1.2159468; critical
 * reactions as in Cao, Gillespie &amp; Petzold (2005), J. Chem. Phys. 123:054104. A reaction is
 * critical when it could exhaust a reactant within {@code nc = 10} firings; the leap
 * {@code tau'} bounds the expected relative change of every reactant by {@code epsilon = 0.03}
 * (with {@code g_i} from the reactant's stoichiometric order, 1 to 3); at most one critical
 * reaction fires per leap; when {@code tau'} is shorter than ten mean SSA waiting times the
 * stepper takes exact direct-method steps instead; a leap that would make a count negative is
 * retried with half the step. Counts and Omega as in {@link GillespieDirectStepper}.
 */
public final class TauLeapingStepper implements CircuitStepper {

    private static final int CRITICAL_FIRINGS = 10;
    private static final double EPSILON = 0.03;
    private static final int EXACT_STEPS = 100;

    private final ReactionNetwork network;
    private final double systemSize;
    private final ReactionTable table;
    private final double[] propensity;
    private final double[] concentration;
    private final boolean[] critical;
    private final double[] order;

    private TauLeapingStepper(ReactionNetwork network, double systemSize) {
        this.network = network;
        this.systemSize = systemSize;
        this.table = new ReactionTable(network);
        this.propensity = new double[network.reactionCount()];
        this.concentration = new double[network.speciesCount()];
        this.critical = new boolean[network.reactionCount()];
        this.order = new double[network.speciesCount()];
        for (int i = 0; i < order.length; i++) {
            order[i] = 1;
            for (int j = 0; j < propensity.length; j++) {
                int nu = network.stoichiometry(j, i);
                if (nu < 0) {
                    int consumed = 0;
                    for (int k = 0; k < order.length; k++) {
                        consumed += Math.max(0, -network.stoichiometry(j, k));
                    }
                    order[i] = Math.max(order[i], Math.min(3, consumed));
                }
            }
        }
    }

    /** A tau-leaping stepper at system size {@code systemSize}. */
    public static TauLeapingStepper of(ReactionNetwork network, double systemSize) {
        if (!(systemSize > 0) || Double.isInfinite(systemSize)) {
            throw new IllegalArgumentException("system size must be finite and greater than 0, got " + systemSize);
        }
        return new TauLeapingStepper(network, systemSize);
    }

    @Override
    public void advance(double[] state, double[] params, double dt, UniformRandomProvider rng) {
        int n = state.length;
        double[] counts = new double[n];
        double[] trial = new double[n];
        for (int i = 0; i < n; i++) {
            counts[i] = Math.rint(state[i] * systemSize);
        }
        double t = 0;
        int exactLeft = 0;
        while (t < dt) {
            double total = propensities(counts, params);
            if (!Double.isFinite(total)) {
                // A rate law gave no finite number: the state becomes NaN, for the caller to report.
                Arrays.fill(state, Double.NaN);
                return;
            }
            if (!(total > 0)) {
                break;
            }
            if (exactLeft > 0) {
                double wait = -Math.log(1.0 - rng.nextDouble()) / total;
                if (t + wait > dt) {
                    break;
                }
                t += wait;
                table.fire(pick(total, rng, false), 1.0, 1.0, counts);
                exactLeft--;
                continue;
            }
            markCritical(counts);
            double leap = noncriticalLeap(counts);
            if (leap < 10.0 / total) {
                exactLeft = EXACT_STEPS;
                continue;
            }
            double criticalTotal = 0;
            for (int j = 0; j < propensity.length; j++) {
                if (critical[j]) {
                    criticalTotal += propensity[j];
                }
            }
            double criticalWait = criticalTotal > 0 ? -Math.log(1.0 - rng.nextDouble()) / criticalTotal
                    : Double.POSITIVE_INFINITY;
            while (true) {
                double tau = Math.min(Math.min(leap, criticalWait), dt - t);
                System.arraycopy(counts, 0, trial, 0, n);
                for (int j = 0; j < propensity.length; j++) {
                    if (!critical[j] && propensity[j] > 0) {
                        table.fire(j, PoissonSampler.of(rng, propensity[j] * tau).sample(), 1.0, trial);
                    }
                }
                if (criticalWait <= leap && criticalWait <= dt - t) {
                    table.fire(pick(criticalTotal, rng, true), 1.0, 1.0, trial);
                }
                if (nonNegative(trial)) {
                    System.arraycopy(trial, 0, counts, 0, n);
                    t += tau;
                    break;
                }
                leap *= 0.5;
            }
        }
        for (int i = 0; i < n; i++) {
            state[i] = counts[i] / systemSize;
        }
    }

    private double propensities(double[] counts, double[] params) {
        for (int i = 0; i < counts.length; i++) {
            concentration[i] = counts[i] / systemSize;
        }
        network.propensities(concentration, params, propensity);
        double total = 0;
        for (int j = 0; j < propensity.length; j++) {
            propensity[j] = Math.max(propensity[j], 0.0) * systemSize;
            total += propensity[j];
        }
        return total;
    }

    private void markCritical(double[] counts) {
        for (int j = 0; j < propensity.length; j++) {
            double firings = Double.POSITIVE_INFINITY;
            for (int k = 0; k < table.species[j].length; k++) {
                int nu = table.change[j][k];
                if (nu < 0) {
                    firings = Math.min(firings, Math.floor(counts[table.species[j][k]] / -nu));
                }
            }
            critical[j] = propensity[j] > 0 && firings < CRITICAL_FIRINGS;
        }
    }

    /** Equation (33) of Cao, Gillespie &amp; Petzold (2006) over the non-critical reactions. */
    private double noncriticalLeap(double[] counts) {
        double leap = Double.POSITIVE_INFINITY;
        for (int i = 0; i < counts.length; i++) {
            double mean = 0;
            double variance = 0;
            boolean reactant = false;
            for (int j = 0; j < propensity.length; j++) {
                if (critical[j]) {
                    continue;
                }
                for (int k = 0; k < table.species[j].length; k++) {
                    if (table.species[j][k] == i) {
                        int nu = table.change[j][k];
                        mean += nu * propensity[j];
                        variance += (double) nu * nu * propensity[j];
                        reactant |= nu < 0;
                    }
                }
            }
            if (!reactant) {
                continue;
            }
            double bound = Math.max(EPSILON * counts[i] / order[i], 1.0);
            if (mean != 0) {
                leap = Math.min(leap, bound / Math.abs(mean));
            }
            if (variance > 0) {
                leap = Math.min(leap, bound * bound / variance);
            }
        }
        return leap;
    }

    private int pick(double total, UniformRandomProvider rng, boolean criticalOnly) {
        double target = rng.nextDouble() * total;
        double cumulative = 0;
        int last = -1;
        for (int j = 0; j < propensity.length; j++) {
            if (criticalOnly && !critical[j]) {
                continue;
            }
            cumulative += propensity[j];
            last = j;
            if (cumulative > target) {
                return j;
            }
        }
        return last;
    }

    private static boolean nonNegative(double[] counts) {
        for (double c : counts) {
            if (c < 0) {
                return false;
            }
        }
        return true;
    }

    @Override
    public CircuitStepper copy() {
        return new TauLeapingStepper(network, systemSize);
    }
}
