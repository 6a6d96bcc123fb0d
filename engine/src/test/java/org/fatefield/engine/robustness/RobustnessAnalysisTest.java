package org.fatefield.engine.robustness;

import static org.junit.jupiter.api.Assertions.assertEquals;

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
import org.fatefield.engine.tissue.CircuitSetup;
import org.fatefield.engine.tissue.GrowthSpec;
import org.fatefield.engine.tissue.NoiseMode;
import org.fatefield.engine.tissue.Timing;
import org.fatefield.engine.tissue.TissueSpec;
import org.junit.jupiter.api.Test;

/**
 * The sensitivity of a threshold boundary to the morphogen amplitude. A gene switches on where
 * the local level exceeds a fixed threshold; the level falls as exp(-x / lambda) away from a held
 * wall value, so the boundary sits at x* = lambda ln(A / c*) and scaling A by 1 +- f moves it by
 * lambda ln((1 + f) / (1 - f)): the central-difference sensitivity is lambda atanh(f) / f
 * (Wolpert 1969's French-flag argument; derived here).
 */
class RobustnessAnalysisTest {

    @Test
    void boundarySensitivityToAmplitudeIsTheDecayLength() {
        double lambda = 20.0;
        double f = 0.3;
        CustomNetwork gene = CustomNetwork.of(List.of("X"), List.of("b", "s", "K", "k"),
                new double[] {0.05, 1.0, 0.2, 1.0}, List.of(
                        new CustomNetwork.ReactionDefinition("make", new int[] {1}, "b + s * hill_act(X, K, 4)"),
                        new CustomNetwork.ReactionDefinition("lose", new int[] {-1}, "k * X")));
        MorphogenSpec field = new MorphogenSpec("m", lambda * lambda, 1.0, 1.0, 0.0, List.of(),
                MorphogenSpec.Solver.ADI,
                new MorphogenSpec.WallCondition(MorphogenSpec.WallKind.FIXED_VALUE, 8.0),
                        MorphogenSpec.CellExchange.OFF,
                null, 0.0);
        TissueSpec spec = TissueSpec.of(new CircuitSetup(gene, NoiseMode.NONE, 1e4, new double[] {0.05}),
                new ParameterMapping(gene.defaultParameters(),
                        List.of(SignalCoupling.of("s", new int[] {1}, new CouplingLaw.Linear(0.0, 2.0)))), field,
                                new Domain.Rectangle(200, 20), GrowthSpec.of(2000, 0.5, 0.0,
                                new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 1e6, 0),
                                Partitioning.binomial()), new FateClassifier(List.of(new FateRule("high",
                                new double[] {0.5}, new double[] {Double.NaN})), "low"), new Timing(25, 0.01, 1))
                                .withExtrinsic(List.of()).withOtherFields(List.of());
        List<RobustnessAnalysis.Sensitivity> result = RobustnessAnalysis.run(spec,
                List.of(new Perturbation(Perturbation.AMPLITUDE, -1)), f, 2, 1, 2);
        RobustnessAnalysis.Sensitivity boundary = result.stream()
                .filter(s -> s.metric().equals("boundary_high_um")).findFirst().orElseThrow();
        double expected = lambda * 0.5 * Math.log((1 + f) / (1 - f)) / f;
        // Boundaries are read from 5 um bins of cells: about 0.5 um each, 1.7 in the sensitivity.
        assertEquals(expected, boundary.sensitivity(), 2.5);
    }
}
