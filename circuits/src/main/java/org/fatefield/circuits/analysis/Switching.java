package org.fatefield.circuits.analysis;

import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.circuits.sim.CircuitStepper;

/**
 * How often noise flips a switch: mean first-passage times between attractors and commitment
 * probabilities, from independent trajectories of the chemical Langevin equation or of
 * Gillespie's direct method ({@link SwitchingSettings.Method}). A trajectory reaches an
 * attractor when, at one of its observation times (every {@link SwitchingSettings#step()}), it
 * is within {@code radius} (Euclidean, in concentrations) of it.
 */
public final class Switching {

    private Switching() {
    }

    /**
     * A mean first-passage time estimate.
     *
     * @param mean      mean over trajectories that arrived (h)
     * @param standardDeviation standard deviation of the passage times (h)
     * @param low95     lower end of the 95% confidence interval of the mean (normal approximation)
     * @param high95    upper end of the 95% confidence interval
     * @param arrived   trajectories that arrived within the time limit
     * @param censored  trajectories that did not (if any, the mean is biased low)
     */
    public record FirstPassage(double mean, double standardDeviation, double low95, double high95, int arrived,
            int censored) {
    }

    /**
     * Mean first-passage time from {@code from} to within {@code radius} of {@code to}, with
     * trajectories limited to {@link SwitchingSettings#passageLimit()}.
     */
    public static FirstPassage meanFirstPassage(ReactionNetwork network, double[] params, double systemSize,
            double[] from, double[] to, double radius, int trajectories, SwitchingSettings settings, long seed) {
        CircuitStepper stepper = settings.method().stepper(network, systemSize);
        RandomStreams streams = RandomStreams.of(seed);
        double step = settings.step();
        double sum = 0;
        double sumSq = 0;
        int arrived = 0;
        long limit = Math.round(settings.passageLimit() / step);
        for (int k = 0; k < trajectories; k++) {
            UniformRandomProvider rng = streams.stream(k);
            double[] x = from.clone();
            for (long s = 1; s <= limit; s++) {
                stepper.advance(x, params, step, rng);
                if (distance(x, to) < radius) {
                    double t = s * step;
                    sum += t;
                    sumSq += t * t;
                    arrived++;
                    break;
                }
            }
        }
        if (arrived < 2) {
            return new FirstPassage(Double.NaN, Double.NaN, Double.NaN, Double.NaN, arrived, trajectories - arrived);
        }
        double mean = sum / arrived;
        double sd = Math.sqrt(Math.max(0, (sumSq - arrived * mean * mean) / (arrived - 1)));
        double half = 1.959964 * sd / Math.sqrt(arrived);
        return new FirstPassage(mean, sd, mean - half, mean + half, arrived, trajectories - arrived);
    }

    /**
     * Probability that a trajectory from {@code start} reaches {@code target} before
     * {@code other} (trajectories reaching neither within {@link SwitchingSettings#commitmentLimit()}
     * count as half).
     */
    public static double commitment(ReactionNetwork network, double[] params, double systemSize, double[] start,
            double[] target, double[] other, double radius, int trajectories, SwitchingSettings settings, long seed) {
        CircuitStepper stepper = settings.method().stepper(network, systemSize);
        RandomStreams streams = RandomStreams.of(seed);
        double hits = 0;
        long limit = Math.round(settings.commitmentLimit() / settings.step());
        for (int k = 0; k < trajectories; k++) {
            UniformRandomProvider rng = streams.stream(k);
            double[] x = start.clone();
            double outcome = 0.5;
            for (long s = 0; s < limit; s++) {
                if (distance(x, target) < radius) {
                    outcome = 1;
                    break;
                }
                if (distance(x, other) < radius) {
                    outcome = 0;
                    break;
                }
                stepper.advance(x, params, settings.step(), rng);
            }
            hits += outcome;
        }
        return hits / trajectories;
    }

    private static double distance(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += (a[i] - b[i]) * (a[i] - b[i]);
        }
        return Math.sqrt(s);
    }
}
