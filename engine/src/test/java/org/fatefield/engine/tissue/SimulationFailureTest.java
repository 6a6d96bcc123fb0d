package org.fatefield.engine.tissue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenSpec;
import org.junit.jupiter.api.Test;

/**
 * A state that stops being a number stops the run at once, naming the cell of lowest id, the
 * time and the species, whatever the method and the thread count.
 */
class SimulationFailureTest {

    private static TissueSpec spec(NoiseMode noise, String law, double initial) {
        CustomNetwork pole = CustomNetwork.of(List.of("X"), List.of("k"), new double[] {1},
                List.of(new CustomNetwork.ReactionDefinition("run-away", new int[] {1}, law)));
        return TissueSpec.of(new CircuitSetup(pole, noise, 100, new double[] {initial}),
                new ParameterMapping(pole.defaultParameters(), List.of()), MorphogenSpec.of(0, 0, 10, 0, List.of()),
                new Domain.Rectangle(100, 50), GrowthSpec.of(40, 2, 0,
                        new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 1e6, 0), Partitioning.equal()),
                new FateClassifier(List.of(new FateRule("high", new double[] {0.5}, new double[] {Double.NaN})), "low"),
                new Timing(2, 0.01, 0.1));
    }

    @Test
    void aRateLawWithoutAValueStopsTheRunAtTheFirstStepInEveryMethod() {
        // log(X - 1) at X = 0.5 is not a number: no method can take a step.
        for (NoiseMode noise : NoiseMode.values()) {
            for (int threads : new int[] {1, 2}) {
                Tissue tissue = new Tissue(spec(noise, "log(X - 1)", 0.5), 9, threads);
                tissue.start();
                SimulationFailure failure = assertThrows(SimulationFailure.class, tissue::runToEnd, noise.name());
                tissue.finish();
                assertEquals(0, failure.cellId(), noise + " on " + threads + " threads: " + failure.getMessage());
                assertEquals("X", failure.species());
                assertEquals(0.01, failure.time(), 1e-12, noise + ": the first step");
            }
        }
    }

    @Test
    void aSolutionThatBlowsUpStopsTheRunNearItsBlowUpTime() {
        // dX/dt = k X^2 from X = 1 is 1 / (1 - k t): infinite at t = 1 h (k = 1 per hour).
        for (NoiseMode noise : List.of(NoiseMode.NONE, NoiseMode.LANGEVIN)) {
            for (int threads : new int[] {1, 2}) {
                Tissue tissue = new Tissue(spec(noise, "k * X^2", 1.0), 9, threads);
                tissue.start();
                SimulationFailure failure = assertThrows(SimulationFailure.class, tissue::runToEnd, noise.name());
                tissue.finish();
                assertEquals("X", failure.species());
                assertEquals(tissue.time() + 0.01, failure.time(), 1e-12, "the state at the end of the failing step");
                // Overflow to infinity comes within a few steps of the blow-up (0.01 h each); 0.2 h is generous.
                assertEquals(1.0, failure.time(), 0.2, noise + ": stopped at " + failure.time() + " h");
            }
        }
    }
}
