package org.fatefield.engine.tissue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.engine.coupling.CouplingLaw;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.AmplitudeVariability;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.field.SourceRegion;
import org.fatefield.engine.metrics.FateProfile;
import org.fatefield.engine.metrics.PositionalError;
import org.fatefield.engine.metrics.PredictedBoundary;
import org.hipparchus.distribution.continuous.ChiSquaredDistribution;
import org.junit.jupiter.api.Test;

/**
 * Tissue-to-tissue amplitude variability of a morphogen and the positional error it predicts.
 * For an exponential gradient {@code c0 exp(-x / lambda)} read at a fixed threshold, a lognormal
 * {@code c0} moves the threshold position by {@code lambda ln(c0)}, so its SD is exactly
 * {@code lambda sd(ln c0)} (derived here; the linearised form is sigma_x = sigma_c / |dc/dx|,
 * Gregor et al. 2007, Cell 130:153).
 */
class AmplitudeVariabilityTest {

    @Test
    void factorsAreLognormalWithMeanOneAndTheStatedSpreadOfTheLog() {
        double cv = 0.5;
        int n = 4000;
        double sum = 0;
        double sumLog = 0;
        double sumLogSq = 0;
        for (int k = 0; k < n; k++) {
            double f = AmplitudeVariability.factor(cv, RandomStreams.of(k).stream(-2));
            sum += f;
            sumLog += Math.log(f);
            sumLogSq += Math.log(f) * Math.log(f);
        }
        double sigma = AmplitudeVariability.sigmaOfLog(cv);
        // Mean within 4 standard errors (cv / sqrt(n)); SD of the log within 4 of its standard
        // errors (about sigma / sqrt(2n)); n = 4000.
        assertEquals(1.0, sum / n, 4 * cv / Math.sqrt(n));
        double meanLog = sumLog / n;
        double sdLog = Math.sqrt((sumLogSq - n * meanLog * meanLog) / (n - 1));
        assertEquals(sigma, sdLog, 4 * sigma / Math.sqrt(2.0 * n));
        assertEquals(-0.5 * sigma * sigma, meanLog, 4 * sigma / Math.sqrt(n));
    }

    @Test
    void predictionOnAnExponentialGradientIsLambdaTimesTheSdOfTheLog() {
        double lambda = 37.0;
        double h = 5.0;
        double[] columns = new double[40];
        for (int i = 0; i < columns.length; i++) {
            columns[i] = 3.0 * Math.exp(-(i + 0.5) * h / lambda);
        }
        double cv = 0.3;
        double expected = lambda * Math.sqrt(Math.log1p(cv * cv));
        for (double x : new double[] {10.0, 52.5, 120.0, 190.0}) {
            assertEquals(expected, PositionalError.predicted(columns, h, x, cv), 1e-12 * expected, "x = " + x);
        }
        assertTrue(Double.isNaN(PositionalError.predicted(columns, h, 52.5, 0.0)));
        assertTrue(Double.isNaN(PositionalError.predicted(columns, h, 1.0, cv)), "before the first column centre");
    }

    /**
     * A deterministic one-gene switch turned on where the morphogen passes a fold: each tissue's
     * boundary moves with its amplitude factor, and the SD over 30 tissues must be consistent
     * with the prediction at the 1% level (two-sided chi-square test on 29 degrees of freedom).
     */
    @Test
    void replicateBoundariesSpreadAsTheGradientPredicts() {
        int replicates = 30;
        double[] boundary = new double[replicates];
        double predicted = Double.NaN;
        double firstFactor = Double.NaN;
        for (int r = 0; r < replicates; r++) {
            Tissue tissue = new Tissue(spec(0.5), 500 + r, 1);
            tissue.start();
            tissue.runToEnd();
            tissue.finish();
            boundary[r] = FateProfile.of(tissue.cells(), 2, 300, 60).boundary(0);
            if (r == 0) {
                PredictedBoundary p = PredictedBoundary.of(tissue.spec(), tissue.controlField());
                predicted = p.positionErrors()[p.positionErrors().length - 1];
                firstFactor = tissue.amplitudeFactor(0);
            } else if (r == 1) {
                assertNotEquals(firstFactor, tissue.amplitudeFactor(0), "each seed draws its own factor");
            }
        }
        double mean = 0;
        for (double b : boundary) {
            assertTrue(Double.isFinite(b), "every tissue has a boundary");
            mean += b / replicates;
        }
        double var = 0;
        for (double b : boundary) {
            var += (b - mean) * (b - mean) / (replicates - 1);
        }
        double lambda = Math.sqrt(400.0 / 1.0);
        assertEquals(lambda * AmplitudeVariability.sigmaOfLog(0.5), predicted, 0.02 * predicted,
                "the prediction on the (nearly exponential) steady gradient");
        ChiSquaredDistribution chi = new ChiSquaredDistribution(replicates - 1);
        double statistic = (replicates - 1) * var / (predicted * predicted);
        assertTrue(statistic > chi.inverseCumulativeProbability(0.005)
                && statistic < chi.inverseCumulativeProbability(0.995),
                "replicate SD " + Math.sqrt(var) + " µm against predicted " + predicted + " µm");
    }

    private static TissueSpec spec(double amplitudeCv) {
        CustomNetwork gene = CustomNetwork.of(List.of("X"), List.of("b", "s", "K", "k"),
                new double[] {0.05, 1.0, 0.2, 1.0}, List.of(
                        new CustomNetwork.ReactionDefinition("make", new int[] {1}, "b + s * hill_act(X, K, 4)"),
                        new CustomNetwork.ReactionDefinition("lose", new int[] {-1}, "k * X")));
        MorphogenSpec field = MorphogenSpec.of(400, 1.0, 2.0, 0.0, List.of(new SourceRegion(0, 0, 10, 40, 60.0)))
                .withSolver(MorphogenSpec.Solver.ADI).withAmplitudeCv(amplitudeCv);
        return TissueSpec.of(new CircuitSetup(gene, NoiseMode.NONE, 100, new double[] {0.05}),
                new ParameterMapping(gene.defaultParameters(),
                        List.of(SignalCoupling.of("s", new int[] {1}, new CouplingLaw.Linear(0.0, 2.0)))),
                field, new Domain.Rectangle(300, 40),
                GrowthSpec.of(400, 1.0, 0.0, new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 1e6, 0),
                        Partitioning.binomial()),
                new FateClassifier(List.of(new FateRule("high", new double[] {0.5}, new double[] {Double.NaN})),
                        "low"), new Timing(20, 0.01, 1));
    }
}
