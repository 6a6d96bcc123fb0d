package org.fatefield.engine.tissue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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

/** The work estimate against the closed forms of exponential growth and the explicit scheme's sub-steps. */
class WorkEstimateTest {

    private static TissueSpec spec(int founders, double cycle, double death, double duration, double diffusion) {
        CustomNetwork inert = CustomNetwork.of(List.of("X"), List.of("k"), new double[] {0},
                List.of(new CustomNetwork.ReactionDefinition("none", new int[] {1}, "k * X")));
        return TissueSpec.of(new CircuitSetup(inert, NoiseMode.NONE, 100, new double[] {1.0}),
                new ParameterMapping(inert.defaultParameters(), List.of()),
                MorphogenSpec.of(diffusion, 0, 10, 0, List.of()), new Domain.Rectangle(200, 100),
                GrowthSpec.of(founders, 2, 0, new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, cycle, 0),
                        Partitioning.equal()).withDeathRate(death),
                new FateClassifier(List.of(new FateRule("high", new double[] {0.5}, new double[] {Double.NaN})), "low"),
                new Timing(duration, 0.01, 1));
    }

    @Test
    void growthCellStepsAndFieldUpdatesFollowTheirClosedForms() {
        // Two doublings: N(T) = 100 * 2^2; the integral of N0 e^{rt} over [0, T] is N0 (e^{rT} - 1) / r.
        WorkEstimate e = WorkEstimate.of(spec(100, 10, 0, 20, 3600));
        double r = Math.log(2) / 10;
        assertEquals(2000, e.steps(), 1e-9);
        assertEquals(400, e.finalCells(), 1e-9);
        assertEquals(100 * 3 / r / 0.01, e.cellSteps(), 1e-6);
        // Explicit limit 2 / (8 D / h^2) = 2 / 288 h; with the 0.9 safety factor, 0.01 h needs 2 sub-steps.
        assertEquals(20 * 10 * 2 * 2000, e.fieldUpdates(), 1e-6);
        assertEquals(100 * Math.PI * 4 / 20000, e.packing(), 1e-12);
        assertTrue(e.impossible().isEmpty() && e.lengthy().isEmpty(), e.summary());
        // Death at exactly the division rate: no net growth, N0 cells throughout.
        WorkEstimate flat = WorkEstimate.of(spec(100, 10, Math.log(2) / 10, 20, 3600));
        assertEquals(100, flat.finalCells(), 1e-6);
        assertEquals(100 * 2000, flat.cellSteps(), 1e-3);
    }

    @Test
    void hopelessRunsAreRefusedAndLongOnesNeedConfirming() {
        assertTrue(WorkEstimate.of(spec(100, 0.01, 0, 20, 3600)).impossible().get(0).contains("cells at the end"));
        assertTrue(WorkEstimate.of(spec(100, 10, 0, 1e12, 3600)).impossible().get(0).contains("time steps"));
        assertTrue(WorkEstimate.of(spec(100_000, 10, 0, 1, 3600)).impossible().get(0).contains("founders cover"));
        WorkEstimate fast = WorkEstimate.of(spec(100, 10, 0, 20, 1e12));
        assertTrue(fast.impossible().isEmpty());
        assertTrue(fast.lengthy().get(0).contains("field grid updates"), fast.lengthy().toString());
    }

    /**
     * Exact method: one reaction of rate k X at X = 1 with k = 2 and 100 molecules per unit is
     * 200 events per cell-hour; 100 cells that never divide, for 20 h: 4e5 events.
     */
    @Test
    void exactMethodEventsAreTheTotalRateTimesTheCellHours() {
        CustomNetwork birth = CustomNetwork.of(List.of("X"), List.of("k"), new double[] {2},
                List.of(new CustomNetwork.ReactionDefinition("make", new int[] {1}, "k * X")));
        TissueSpec spec = TissueSpec.of(new CircuitSetup(birth, NoiseMode.EXACT, 100, new double[] {1.0}),
                new ParameterMapping(birth.defaultParameters(), List.of()),
                MorphogenSpec.of(0, 0, 10, 0, List.of()), new Domain.Rectangle(200, 100),
                GrowthSpec.of(100, 2, 0, CycleTimeDistribution.none(), Partitioning.equal()),
                new FateClassifier(List.of(new FateRule("high", new double[] {0.5}, new double[] {Double.NaN})), "low"),
                new Timing(20, 0.01, 1));
        WorkEstimate e = WorkEstimate.of(spec);
        assertEquals(4e5, e.reactionEvents(), 1e-6);
        assertTrue(e.impossible().isEmpty() && e.lengthy().isEmpty());
        assertEquals(0.0, WorkEstimate.of(spec(100, 10, 0, 20, 3600)).reactionEvents(), 0.0);
    }
}
