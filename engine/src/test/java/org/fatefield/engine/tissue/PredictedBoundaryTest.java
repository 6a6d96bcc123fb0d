package org.fatefield.engine.tissue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.engine.coupling.CouplingLaw;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.field.SourceRegion;
import org.fatefield.engine.metrics.FateProfile;
import org.fatefield.engine.metrics.PredictedBoundary;
import org.hipparchus.distribution.continuous.FDistribution;
import org.junit.jupiter.api.Test;

/**
 * A one-gene self-activating switch read out along a gradient: cells start low and turn high only
 * where the morphogen pushes the activation strength past the fold at which the low state
 * vanishes. With little noise the tissue's boundary must sit where the single-cell analysis puts
 * it (within a cell diameter); with more noise, cells also escape inside the bistable range and
 * the boundary scatters more between replicate tissues.
 */
class PredictedBoundaryTest {

    private static final double CELL_DIAMETER = 2.0;

    private static TissueSpec spec(double systemSize) {
        CustomNetwork gene = CustomNetwork.of(List.of("X"), List.of("b", "s", "K", "k"),
                new double[] {0.05, 1.0, 0.2, 1.0}, List.of(
                        new CustomNetwork.ReactionDefinition("make", new int[] {1}, "b + s * hill_act(X, K, 4)"),
                        new CustomNetwork.ReactionDefinition("lose", new int[] {-1}, "k * X")));
        return TissueSpec.of(new CircuitSetup(gene, NoiseMode.LANGEVIN, systemSize, new double[] {0.05}),
                new ParameterMapping(gene.defaultParameters(),
                        List.of(SignalCoupling.of("s", new int[] {1}, new CouplingLaw.Linear(0.0, 2.0)))),
                                MorphogenSpec.of(400, 1.0, 2.0, 0.0, List.of(new SourceRegion(0, 0, 10, 40, 20.0)))
                                        .withSolver(MorphogenSpec.Solver.ADI), new Domain.Rectangle(300, 40),
                                        GrowthSpec.of(1200, CELL_DIAMETER / 2,
                                0.0, new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 1e6, 0),
                                Partitioning.binomial()), new FateClassifier(List.of(new FateRule("high",
                                new double[] {0.5}, new double[] {Double.NaN})), "low"), new Timing(30, 0.01, 1));
    }

    private static double[] boundaries(double systemSize, int replicates, double[] predictedOut) {
        double[] out = new double[replicates];
        for (int r = 0; r < replicates; r++) {
            Tissue tissue = new Tissue(spec(systemSize), 100 + r, 2);
            tissue.start();
            tissue.runToEnd();
            tissue.finish();
            out[r] = FateProfile.of(tissue.cells(), 2, 300, 60).boundary(0);
            if (predictedOut != null && r == 0) {
                PredictedBoundary predicted = PredictedBoundary.of(tissue.spec(), tissue.field());
                // The fold at the larger activation strength is where the low state disappears.
                predictedOut[0] = predicted.positions()[predicted.positions().length - 1];
            }
        }
        return out;
    }

    @Test
    void lowNoiseBoundaryMatchesTheSingleCellPredictionAndNoiseSpreadsIt() {
        int replicates = 8;
        double[] predicted = new double[1];
        double[] quiet = boundaries(1e5, replicates, predicted);
        double[] noisy = boundaries(30, replicates, null);
        double[] q = meanAndVariance(quiet);
        double[] n = meanAndVariance(noisy);
        assertEquals(predicted[0], q[0], CELL_DIAMETER, "mean low-noise boundary against the fold's position");
        // One-sided F test at the 1% level that the noisy variance is larger.
        double critical = new FDistribution(replicates - 1, replicates - 1).inverseCumulativeProbability(0.99);
        assertTrue(n[1] / q[1] > critical, "variance ratio " + n[1] / q[1] + " below " + critical);
    }

    private static double[] meanAndVariance(double[] values) {
        double mean = 0;
        for (double v : values) {
            mean += v / values.length;
        }
        double variance = 0;
        for (double v : values) {
            variance += (v - mean) * (v - mean) / (values.length - 1);
        }
        return new double[] {mean, variance};
    }
}
