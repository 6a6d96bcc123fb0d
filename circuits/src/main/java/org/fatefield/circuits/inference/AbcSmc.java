package org.fatefield.circuits.inference;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.fatefield.circuits.random.RandomStreams;

/**
 * Approximate Bayesian computation by sequential Monte Carlo (Toni, Welch, Strelkowa, Ipsen &amp;
 * Stumpf 2009, J. R. Soc. Interface 6:187) with the importance weights of population Monte Carlo
 * ABC (Beaumont, Cornuet, Marin &amp; Robert 2009, Biometrika 96:983), the locally adapted move of
 * Filippi et al. (2013, see {@link PerturbationKernel}) and an adaptive
 * tolerance schedule: each tolerance is a quantile of the previous generation's accepted
 * distances (Drovandi &amp; Pettitt 2011, Biometrics 67:225; Del Moral, Doucet &amp; Jasra 2012,
 * Stat. Comput. 22:1009).
 *
 * <p>Generation 0 samples each model's prior. Generation t proposes in rounds of
 * {@code batch} candidates per model, each a particle of generation t-1 drawn by weight and moved
 * by {@link PerturbationKernel}; every in-support candidate of a round is simulated in one call of
 * the {@link BatchSimulator}, and the first {@code particles} accepted ones in proposal order are
 * kept, with weights pi(u)/q(u). The proposals also give each model's evidence at the tolerance,
 * the mean of pi(u)/q(u) 1(d &lt;= tolerance) over all proposals (Didelot et al. 2011), hence
 * the posterior model probabilities.
 *
 * <p>Every random number comes from a stream keyed by (seed, generation, round, model), and
 * results are consumed in proposal order, so a calibration is identical for any number of
 * workers and can be replayed: a simulator that caches its results resumes a killed calibration
 * by replaying it.
 *
 * <p>It stops after the generation whose tolerance reaches {@code targetTolerance}, whose
 * acceptance rate falls below {@code minAcceptance}, after {@code maxGenerations}, or when the
 * tolerance cannot decrease any more (every accepted distance equals it).
 */
public final class AbcSmc {

    /** What the calibration reports while it runs. */
    public interface Listener {
        /** A round of {@code size} candidates is about to be simulated. */
        default void round(int generation, int round, int size, double tolerance) {
        }

        /** A generation is finished. */
        default void generation(Generation generation) {
        }
    }

    /**
     * The finished calibration.
     *
     * @param generations every generation, the last holding the posterior
     * @param stopReason  why it stopped, in words
     */
    public record Result(List<Generation> generations, String stopReason) {
        /** The last generation. */
        public Generation last() {
            return generations.get(generations.size() - 1);
        }
    }

    private final List<AbcModel> models;
    private final ScaledDistance distance;
    private final AbcSettings settings;
    private final BatchSimulator simulator;

    /** A calibration of {@code models} against {@code distance}'s observations. */
    public AbcSmc(List<AbcModel> models, ScaledDistance distance, AbcSettings settings, BatchSimulator simulator) {
        if (models.isEmpty()) {
            throw new IllegalArgumentException("need at least one model");
        }
        this.models = List.copyOf(models);
        this.distance = distance;
        this.settings = settings;
        this.simulator = simulator;
    }

    /** Runs to a stopping rule. */
    public Result run(Listener listener) throws IOException {
        List<Generation> done = new ArrayList<>();
        double tolerance = Double.POSITIVE_INFINITY;
        List<Population> previous = null;
        for (int t = 0; ; t++) {
            Generation g = generation(t, tolerance, previous, listener);
            done.add(g);
            listener.generation(g);
            if (t > 0 && g.acceptanceRate() < settings.minAcceptance()) {
                return new Result(done, String.format(java.util.Locale.ROOT, "the acceptance rate %.4g fell below"
                        + " min_acceptance %.4g", g.acceptanceRate(), settings.minAcceptance()));
            }
            if (tolerance <= settings.targetTolerance()) {
                return new Result(done, "the tolerance reached the target " + settings.targetTolerance());
            }
            if (t + 1 >= settings.maxGenerations()) {
                return new Result(done, "the last of " + settings.maxGenerations() + " generations is done");
            }
            double next = nextTolerance(g, tolerance);
            if (Double.isNaN(next)) {
                return new Result(done, "the tolerance cannot decrease: every accepted particle is at distance "
                        + tolerance);
            }
            boolean alive = g.populations().stream().anyMatch(p -> p.size() > 0);
            if (!alive) {
                return new Result(done, "no model has accepted particles");
            }
            tolerance = next;
            previous = g.populations();
        }
    }

    private double nextTolerance(Generation g, double current) {
        List<Double> pooled = new ArrayList<>();
        for (Population p : g.populations()) {
            for (double d : p.distances()) {
                pooled.add(d);
            }
        }
        double[] d = pooled.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        if (d.length == 0) {
            return Double.NaN;
        }
        double q = d[(int) Math.min(d.length - 1, Math.floor(settings.quantile() * (d.length - 1)))];
        if (q < current) {
            return Math.max(q, settings.targetTolerance());
        }
        // Discrete distances: the quantile may equal the tolerance; take the next smaller value.
        double below = Double.NaN;
        for (double v : d) {
            if (v < current) {
                below = v;
            }
        }
        return Double.isNaN(below) ? Double.NaN : Math.max(below, settings.targetTolerance());
    }

    private Generation generation(int t, double tolerance, List<Population> previous, Listener listener)
            throws IOException {
        int n = models.size();
        Accumulator[] acc = new Accumulator[n];
        PerturbationKernel[] kernels = new PerturbationKernel[n];
        for (int m = 0; m < n; m++) {
            acc[m] = new Accumulator();
            if (previous != null && previous.get(m).size() > 0) {
                Population last = previous.get(m);
                kernels[m] = PerturbationKernel.local(last.working(), last.weights(), last.distances(), tolerance,
                        fallbackSpread(models.get(m)));
            }
        }
        RandomStreams streams = RandomStreams.of(settings.seed());
        for (int round = 0; ; round++) {
            List<Candidate> batch = new ArrayList<>();
            List<double[]> workingOfBatch = new ArrayList<>();
            boolean any = false;
            for (int m = 0; m < n; m++) {
                if (!acc[m].wantsMore(t, previous, m)) {
                    continue;
                }
                any = true;
                UniformRandomProvider random = streams.stream(((long) t * 100_003L + round) * 1024L + m);
                ZigguratSampler.NormalizedGaussian gaussian = ZigguratSampler.NormalizedGaussian.of(random);
                AbcModel model = models.get(m);
                for (int i = 0; i < settings.batch(); i++) {
                    double[] u = kernels[m] == null ? priorDraw(model, random) : kernels[m].propose(random, gaussian);
                    long seed = random.nextLong() >>> 11;
                    acc[m].proposals++;
                    if (model.logPrior(u) == Double.NEGATIVE_INFINITY) {
                        continue;
                    }
                    batch.add(new Candidate(m, t, round, i, model.natural(u), seed));
                    workingOfBatch.add(u);
                }
            }
            if (!any) {
                break;
            }
            listener.round(t, round, batch.size(), tolerance);
            double[][] stats = simulator.simulate(batch);
            if (stats.length != batch.size()) {
                throw new IllegalStateException("the simulator returned " + stats.length + " rows for " + batch.size()
                        + " candidates");
            }
            for (int c = 0; c < batch.size(); c++) {
                Candidate candidate = batch.get(c);
                int m = candidate.model();
                double[] u = workingOfBatch.get(c);
                double d = distance.of(stats[c]);
                acc[m].simulated++;
                boolean accepted = Double.isFinite(d) && d <= tolerance;
                double ratio = 0;
                if (accepted) {
                    ratio = kernels[m] == null ? 1
                            : Math.exp(models.get(m).logPrior(u) - kernels[m].logDensity(u));
                    acc[m].accepted++;
                    acc[m].keep(u, candidate.theta(), d, ratio, settings.particles());
                }
                acc[m].term(ratio);
            }
        }
        List<Population> populations = new ArrayList<>();
        double[] evidence = new double[n];
        double[] evidenceSe = new double[n];
        for (int m = 0; m < n; m++) {
            Population p = acc[m].population(m);
            populations.add(p);
            evidence[m] = p.evidence();
            evidenceSe[m] = p.evidenceSe();
        }
        return new Generation(t, tolerance, populations, ModelProbabilities.of(evidence, evidenceSe));
    }

    private static double[] priorDraw(AbcModel model, UniformRandomProvider random) {
        double[] u = new double[model.dimension()];
        for (int a = 0; a < u.length; a++) {
            u[a] = model.priors().get(a).sample(random);
        }
        return u;
    }

    /** A thousandth of each prior's spread in working space: the move used when a coordinate does not vary. */
    private static double[] fallbackSpread(AbcModel model) {
        double[] s = new double[model.dimension()];
        for (int a = 0; a < s.length; a++) {
            Prior prior = model.priors().get(a);
            double spread;
            if (prior instanceof Prior.Uniform u) {
                spread = u.high() - u.low();
            } else if (prior instanceof Prior.LogUniform l) {
                spread = Math.log(l.high() / l.low());
            } else {
                spread = ((Prior.Normal) prior).sd();
            }
            s[a] = 1e-3 * spread;
        }
        return s;
    }

    /** One model's tally within a generation. */
    private final class Accumulator {
        private final List<double[]> working = new ArrayList<>();
        private final List<double[]> theta = new ArrayList<>();
        private final List<Double> distances = new ArrayList<>();
        private final List<Double> ratios = new ArrayList<>();
        private long proposals;
        private long simulated;
        private long accepted;
        private double termSum;
        private double termSquares;

        boolean wantsMore(int t, List<Population> previous, int m) {
            if (t > 0 && previous.get(m).size() == 0) {
                return false;
            }
            return working.size() < settings.particles() && proposals < settings.proposalCap();
        }

        void keep(double[] u, double[] natural, double d, double ratio, int limit) {
            if (working.size() < limit) {
                working.add(u);
                theta.add(natural);
                distances.add(d);
                ratios.add(ratio);
            }
        }

        void term(double ratio) {
            termSum += ratio;
            termSquares += ratio * ratio;
        }

        Population population(int m) {
            int size = working.size();
            double[] w = new double[size];
            double total = 0;
            for (int j = 0; j < size; j++) {
                w[j] = ratios.get(j);
                total += w[j];
            }
            for (int j = 0; j < size; j++) {
                w[j] /= total;
            }
            // Proposals outside the prior's support count with a zero term.
            double mean = proposals > 0 ? termSum / proposals : 0;
            double variance = proposals > 1 ? Math.max(0, (termSquares - proposals * mean * mean) / (proposals - 1)) : 0;
            double se = proposals > 0 ? Math.sqrt(variance / proposals) : 0;
            return new Population(m, theta.toArray(new double[0][]), working.toArray(new double[0][]), w,
                    distances.stream().mapToDouble(Double::doubleValue).toArray(), proposals, simulated, accepted, mean,
                    se);
        }
    }
}
