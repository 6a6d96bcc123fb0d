package org.fatefield.circuits.inference;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.fatefield.circuits.random.RandomStreams;
import org.hipparchus.special.Erf;
import org.junit.jupiter.api.Test;

/**
 * ABC-SMC on the normal mean with known variance and a conjugate normal prior, where everything
 * is known exactly. Data: n = 10 draws of N(mu, 1) with mean 1.3; prior mu ~ N(0, 2^2). The exact
 * posterior is normal with variance v = 1 / (1/4 + 10) and mean 13 v (conjugate update, Gelman et
 * al. 2013, Bayesian Data Analysis, 3rd ed., section 2.5). The ABC posterior at tolerance eps
 * with distance |xbar_sim - xbar_obs| is exactly p_eps(mu) proportional to N(mu; 0, 4) [Phi((1.3 +
 * eps - mu) / s) - Phi((1.3 - eps - mu) / s)] with s = 1 / sqrt(10), whose mean and variance are
 * computed here by quadrature; it tends to the exact posterior as eps tends to 0.
 *
 * <p>Statistical checks: at every generation the weighted mean is within 4 standard errors
 * (sqrt(v_eps / ESS)) of the exact ABC mean and the weighted variance within 4 standard errors
 * (v_eps sqrt(2 / ESS)) of the exact ABC variance; 2000 particles, seed 7, so a false failure has
 * probability below 1e-4 per check.
 */
class AbcSmcNormalMeanTest {

    private static final double XBAR = 1.3;
    private static final double S = 1 / Math.sqrt(10);
    private static final double PRIOR_SD = 2;

    @Test
    void posteriorMomentsFollowTheExactAbcPosteriorAndConvergeToTheConjugateOne() throws Exception {
        AbcSmc.Result result = calibrate(false);
        double exactVariance = 1 / (1 / (PRIOR_SD * PRIOR_SD) + 1 / (S * S));
        double exactMean = exactVariance * XBAR / (S * S);
        double previousTolerance = Double.POSITIVE_INFINITY;
        assertTrue(result.generations().size() >= 5, "at least five generations: " + result.stopReason());
        for (Generation g : result.generations()) {
            Population p = g.populations().get(0);
            double ess = p.effectiveSampleSize();
            double[] reference = abcMoments(g.tolerance());
            assertTrue(g.index() == 0 || g.tolerance() < previousTolerance, "tolerances decrease");
            previousTolerance = g.tolerance();
            assertEquals(reference[0], p.mean(0), 4 * Math.sqrt(reference[1] / ess), "mean at generation " + g.index());
            assertEquals(reference[1], p.variance(0), 4 * reference[1] * Math.sqrt(2 / ess),
                    "variance at generation " + g.index());
        }
        Generation last = result.last();
        // The exact ABC posterior at the final tolerance is within 2% of the conjugate posterior.
        double[] atEnd = abcMoments(last.tolerance());
        assertEquals(exactVariance, atEnd[1], 0.02 * exactVariance);
        assertEquals(exactMean, atEnd[0], 0.01);
        Population p = last.populations().get(0);
        System.out.printf("normal mean: %d generations, final tolerance %.4g, ESS %.0f, mean %.4f (exact %.4f),"
                + " variance %.5f (exact %.5f); %s%n", result.generations().size(), last.tolerance(),
                p.effectiveSampleSize(), p.mean(0), exactMean, p.variance(0), exactVariance, result.stopReason());
        assertEquals(exactMean, p.mean(0), 4 * Math.sqrt(exactVariance / p.effectiveSampleSize()) + 0.01);
    }

    @Test
    void theSameSeedGivesTheSameCalibrationWhateverOrderTheBatchIsSimulatedIn() throws Exception {
        AbcSmc.Result serial = calibrate(false);
        AbcSmc.Result parallel = calibrate(true);
        assertEquals(serial.generations().size(), parallel.generations().size());
        for (int g = 0; g < serial.generations().size(); g++) {
            Population a = serial.generations().get(g).populations().get(0);
            Population b = parallel.generations().get(g).populations().get(0);
            assertArrayEquals(a.weights(), b.weights(), 0.0);
            assertArrayEquals(a.distances(), b.distances(), 0.0);
        }
    }

    private static AbcSmc.Result calibrate(boolean parallel) throws Exception {
        AbcModel model = new AbcModel("normal mean", List.of("mu"), List.of(new Prior.Normal(0, PRIOR_SD)));
        ScaledDistance distance = new ScaledDistance(new double[] {XBAR}, new double[] {1});
        AbcSettings settings = new AbcSettings(2000, 2000, 0.5, 0.03, 9, 0, 7);
        BatchSimulator simulator = batch -> {
            double[][] out = new double[batch.size()][];
            IntStream indices = IntStream.range(0, batch.size());
            (parallel ? indices.parallel() : indices).forEach(i -> {
                Candidate c = batch.get(i);
                double z = ZigguratSampler.NormalizedGaussian.of(RandomStreams.of(c.seed()).stream(0)).sample();
                out[i] = new double[] {c.theta()[0] + S * z};
            });
            return out;
        };
        List<Generation> seen = new ArrayList<>();
        AbcSmc.Result result = new AbcSmc(List.of(model), distance, settings, simulator).run(new AbcSmc.Listener() {
            @Override
            public void generation(Generation generation) {
                seen.add(generation);
            }
        });
        assertEquals(seen.size(), result.generations().size(), "the listener hears every generation");
        return result;
    }

    /** Mean and variance of the exact ABC posterior at tolerance eps, by the trapezoid rule on a fine grid. */
    static double[] abcMoments(double eps) {
        double lo = -12;
        double hi = 12;
        int n = 200_000;
        double h = (hi - lo) / n;
        double z = 0;
        double m1 = 0;
        double m2 = 0;
        for (int i = 0; i <= n; i++) {
            double mu = lo + i * h;
            double prior = Math.exp(-0.5 * mu * mu / (PRIOR_SD * PRIOR_SD));
            double likelihood = Double.isInfinite(eps) ? 1
                    : 0.5 * (Erf.erf((XBAR + eps - mu) / (S * Math.sqrt(2))) - Erf.erf((XBAR - eps - mu) / (S * Math.sqrt(2))));
            double w = (i == 0 || i == n ? 0.5 : 1) * prior * likelihood;
            z += w;
            m1 += w * mu;
            m2 += w * mu * mu;
        }
        double mean = m1 / z;
        return new double[] {mean, m2 / z - mean * mean};
    }
}
