package org.fatefield.circuits.inference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.PoissonSampler;
import org.fatefield.circuits.random.RandomStreams;
import org.hipparchus.special.Gamma;
import org.junit.jupiter.api.Test;

/**
 * ABC model choice between Poisson and geometric counts, where the Bayes factor given the sum is
 * exact (the example of Grelaud, Robert, Marin, Rodolphe &amp; Taly 2009, Bayesian Analysis 4:317,
 * and Robert, Cornuet, Marin &amp; Pillai 2011, PNAS 108:15112). Ten counts summing to S = 15.
 * Model 1: Poisson(lambda), lambda ~ U(0, 10), so S ~ Poisson(10 lambda) and P(S = s) =
 * P(s + 1, 100) / 100 with P the regularised lower incomplete gamma function. Model 2:
 * geometric(p) on {0, 1, ...}, p ~ U(0, 1), so S is negative binomial and P(S = s) = C(n + s - 1,
 * s) B(n + 1, s + 1) = n / ((n + s)(n + s + 1)). With tolerance 0 on |S_sim - S_obs| the ABC
 * evidence of each model is exactly P(S = 15 | model), and each estimate must lie within 4 of its
 * reported standard errors (2000 particles per model, seed 3), as must the model probability.
 */
class AbcModelChoiceTest {

    private static final int N = 10;
    private static final int SUM = 15;

    @Test
    void evidencesAndModelProbabilityMatchTheExactMarginalLikelihoods() throws Exception {
        double poisson = Gamma.regularizedGammaP(SUM + 1, 10.0 * N) / (10.0 * N);
        double geometric = (double) N / ((N + SUM) * (N + SUM + 1.0));
        double exactP1 = poisson / (poisson + geometric);

        AbcModel m1 = new AbcModel("Poisson", List.of("lambda"), List.of(new Prior.Uniform(0, 10)));
        AbcModel m2 = new AbcModel("geometric", List.of("p"), List.of(new Prior.Uniform(0, 1)));
        ScaledDistance distance = new ScaledDistance(new double[] {SUM}, new double[] {1});
        AbcSettings settings = new AbcSettings(2000, 2000, 0.5, 0.005, 12, 0, 3);
        BatchSimulator simulator = batch -> {
            double[][] out = new double[batch.size()][];
            for (int i = 0; i < batch.size(); i++) {
                Candidate c = batch.get(i);
                UniformRandomProvider random = RandomStreams.of(c.seed()).stream(0);
                double sum;
                if (c.model() == 0) {
                    sum = c.theta()[0] > 0 ? PoissonSampler.of(random, N * c.theta()[0]).sample() : 0;
                } else {
                    double p = c.theta()[0];
                    if (p <= 0) {
                        out[i] = null;
                        continue;
                    }
                    sum = 0;
                    for (int k = 0; k < N; k++) {
                        sum += p >= 1 ? 0 : Math.floor(Math.log(1 - random.nextDouble()) / Math.log1p(-p));
                    }
                }
                out[i] = new double[] {sum};
            }
            return out;
        };
        AbcSmc.Result result = new AbcSmc(List.of(m1, m2), distance, settings, simulator).run(new AbcSmc.Listener() {
        });
        Generation last = result.last();
        assertEquals(0.0, last.tolerance(), 0.0, "reached tolerance 0: " + result.stopReason());
        Population p1 = last.populations().get(0);
        Population p2 = last.populations().get(1);
        assertEquals(poisson, p1.evidence(), 4 * p1.evidenceSe(), "Poisson evidence");
        assertEquals(geometric, p2.evidence(), 4 * p2.evidenceSe(), "geometric evidence");
        assertTrue(p1.evidenceSe() < 0.1 * poisson && p2.evidenceSe() < 0.1 * geometric, "errors below 10%");
        assertEquals(exactP1, last.models().probabilities()[0], 4 * last.models().errors()[0]);
        assertEquals(1.0, last.models().probabilities()[0] + last.models().probabilities()[1], 1e-12);
    }
}
