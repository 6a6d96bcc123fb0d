package org.fatefield.circuits.analysis;

import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.circuits.sim.LangevinStepper;

/**
 * The quasi-potential landscape {@code U = -ln P_ss}: the stationary distribution of the chemical
 * Langevin dynamics, estimated by a long-run histogram pooled over independent trajectories,
 * turned into a landscape whose wells are the attractors and whose ridges are the barriers noise
 * must cross (Wang, Xu &amp; Wang 2008, PNAS 105:12271, for the landscape view of gene circuits).
 * U is shifted to a minimum of 0; bins never visited have U = +infinity.
 *
 * @param xs     bin centres along x
 * @param ys     bin centres along y (a single 0 for a one-dimensional landscape)
 * @param counts visits per bin, {@code counts[j][i]}
 * @param u      landscape per bin, {@code u[j][i]}
 */
public record QuasiPotential(double[] xs, double[] ys, long[][] counts, double[][] u) {

    /**
     * Sampling plan of a landscape.
     *
     * @param trajectories independent trajectories pooled
     * @param burnIn       time discarded at the start of each (h)
     * @param duration     time sampled after the burn-in (h)
     * @param step         Euler-Maruyama step (h)
     * @param seed         seed of the trajectories' streams
     */
    public record Sampling(int trajectories, double burnIn, double duration, double step, long seed) {

        /** Validates. */
        public Sampling {
            if (trajectories < 1 || !(duration > 0) || !(step > 0) || !(burnIn >= 0)) {
                throw new IllegalArgumentException("sampling needs at least one trajectory and positive duration"
                        + " and step, got " + trajectories + ", " + duration + ", " + step);
            }
        }
    }

    /**
     * Landscape over the plane of species {@code xSpecies} and {@code ySpecies} (pass
     * {@code ySpecies = -1} for one dimension).
     *
     * @param start  initial state of every trajectory (concentrations)
     * @param lower  lower corner of the histogram (x, y)
     * @param upper  upper corner (x, y)
     * @param bins   bins per axis
     */
    public static QuasiPotential estimate(ReactionNetwork network, double[] params, double systemSize, double[] start,
            int xSpecies, int ySpecies, double[] lower, double[] upper, int bins, Sampling sampling) {
        int ny = ySpecies < 0 ? 1 : bins;
        long[][] counts = new long[ny][bins];
        LangevinStepper stepper = LangevinStepper.of(network, systemSize);
        RandomStreams streams = RandomStreams.of(sampling.seed());
        long burn = Math.round(sampling.burnIn() / sampling.step());
        long total = Math.round(sampling.duration() / sampling.step());
        double wx = (upper[0] - lower[0]) / bins;
        double wy = ySpecies < 0 ? 1 : (upper[1] - lower[1]) / bins;
        for (int k = 0; k < sampling.trajectories(); k++) {
            UniformRandomProvider rng = streams.stream(k);
            double[] x = start.clone();
            for (long s = 0; s < burn; s++) {
                stepper.advance(x, params, sampling.step(), rng);
            }
            for (long s = 0; s < total; s++) {
                stepper.advance(x, params, sampling.step(), rng);
                int i = (int) Math.floor((x[xSpecies] - lower[0]) / wx);
                int j = ySpecies < 0 ? 0 : (int) Math.floor((x[ySpecies] - lower[1]) / wy);
                if (i >= 0 && i < bins && j >= 0 && j < ny) {
                    counts[j][i]++;
                }
            }
        }
        double[] xs = new double[bins];
        for (int i = 0; i < bins; i++) {
            xs[i] = lower[0] + (i + 0.5) * wx;
        }
        double[] ys = new double[ny];
        for (int j = 0; j < ny && ySpecies >= 0; j++) {
            ys[j] = lower[1] + (j + 0.5) * wy;
        }
        return new QuasiPotential(xs, ys, counts, landscape(counts));
    }

    /** The one-dimensional landscape of the x species, summing the probability over y. */
    public QuasiPotential marginalX() {
        double[] p = new double[xs.length];
        long[] c = new long[xs.length];
        double max = 0;
        for (int i = 0; i < xs.length; i++) {
            for (int j = 0; j < ys.length; j++) {
                p[i] += Math.exp(-u[j][i]);
                c[i] += counts[j][i];
            }
            max = Math.max(max, p[i]);
        }
        double[][] out = new double[1][xs.length];
        for (int i = 0; i < xs.length; i++) {
            out[0][i] = p[i] > 0 ? -Math.log(p[i] / max) : Double.POSITIVE_INFINITY;
        }
        return new QuasiPotential(xs.clone(), new double[] {0}, new long[][] {c}, out);
    }

    /**
     * As {@link #estimate} but with the trajectories started in turn from each of {@code starts},
     * so that every well is visited even when switching between them is rarer than the sampling
     * time (the wells' shapes are then right; their relative depths reflect the starts).
     */
    public static QuasiPotential estimateFrom(ReactionNetwork network, double[] params, double systemSize,
            List<double[]> starts, int xSpecies, int ySpecies, double[] lower, double[] upper, int bins,
            Sampling sampling) {
        QuasiPotential total = null;
        int per = Math.max(1, sampling.trajectories() / starts.size());
        for (int s = 0; s < starts.size(); s++) {
            QuasiPotential part = estimate(network, params, systemSize, starts.get(s), xSpecies, ySpecies, lower, upper,
                    bins, new Sampling(per, sampling.burnIn(), sampling.duration(), sampling.step(),
                            sampling.seed() + 7919L * s));
            if (total == null) {
                total = part;
            } else {
                for (int j = 0; j < total.counts.length; j++) {
                    for (int i = 0; i < total.counts[j].length; i++) {
                        total.counts[j][i] += part.counts[j][i];
                    }
                }
            }
        }
        return new QuasiPotential(total.xs, total.ys, total.counts, landscape(total.counts));
    }

    private static double[][] landscape(long[][] counts) {
        long max = 0;
        for (long[] row : counts) {
            for (long c : row) {
                max = Math.max(max, c);
            }
        }
        double[][] u = new double[counts.length][counts[0].length];
        for (int j = 0; j < counts.length; j++) {
            for (int i = 0; i < counts[j].length; i++) {
                u[j][i] = counts[j][i] == 0 ? Double.POSITIVE_INFINITY : Math.log((double) max / counts[j][i]);
            }
        }
        return u;
    }
}
