package org.fatefield.engine.tissue;

import java.util.ArrayList;
import java.util.List;
import org.fatefield.circuits.analysis.SteadyState;
import org.fatefield.circuits.analysis.SteadyStateFinder;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenSpec;
import org.junit.jupiter.api.Test;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;


class TissueTest {

    /** Bistable symmetric switch: weak self-activation, strong mutual repression. */
    private static final SelfActivatingSwitch SWITCH = SelfActivatingSwitch.symmetric("A", "B",
            new GeneKinetics(0.1, 0.35, 0.5, 4, 1.0, 0.5, 4, 1.0));

    private static TissueSpec spec(int cells, double[] initial, CycleTimeDistribution cycle, double duration,
            double omega) {
        FateClassifier fates = new FateClassifier(List.of(
                new FateRule("a-high", new double[] {1.0, Double.NaN}, new double[] {Double.NaN, 0.6}),
                new FateRule("b-high", new double[] {Double.NaN, 1.0}, new double[] {0.6, Double.NaN})),
                "undecided");
        return TissueSpec.of(new CircuitSetup(SWITCH, NoiseMode.LANGEVIN, omega, initial),
                new ParameterMapping(SWITCH.defaultParameters(), List.of()), MorphogenSpec.of(0, 0, 50, 0, List.of()),
                new Domain.Rectangle(1000, 1000), GrowthSpec.of(cells, 2.0, 0.0, cycle, Partitioning.binomial()), fates,
                new Timing(duration, 0.01, 1.0));
    }

    private static double[] saddle() {
        List<SteadyState> states = SteadyStateFinder.of(SWITCH)
                .find(SWITCH.defaultParameters(), new double[] {0, 0}, new double[] {3, 3});
        assertEquals(3, states.size(), "bistable: two stable states and a saddle " + states);
        return states.get(1).state();
    }

    @Test
    void symmetricNoiseSplitsASymmetricSwitchFiftyFifty() {
        // By symmetry each cell takes either branch with probability 1/2 (common practice).
        // N = 2000 independent cells; accept |p - 1/2| <= z_0.995 sqrt(1/4N) = 0.0288 (99% level).
        int n = 2000;
        Tissue tissue = new Tissue(spec(n, saddle(), new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 1e6,
                0),
                30.0, 200.0), 12345);
        tissue.start();
        tissue.runToEnd();
        int[] counts = tissue.series().last().fateCounts();
        assertTrue(counts[2] <= n / 200, "at most 0.5% still undecided, got " + counts[2]);
        int decided = counts[0] + counts[1];
        double p = (double) counts[0] / decided;
        assertTrue(Math.abs(p - 0.5) <= 2.5758 * Math.sqrt(0.25 / decided), "fraction a-high " + p);
    }

    @Test
    void withAFixedCycleEveryFounderDividesOnceInOneCycle() {
        // Founder ages are uniform in [0, T): each divides exactly once in (0, T]; daughters, born
        // after time 0, cannot reach age T by time T.
        int founders = 300;
        double cycle = 5.0;
        Tissue tissue = new Tissue(spec(founders, new double[] {0.5, 0.5},
                new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, cycle, 0), cycle, 100.0), 9);
        tissue.start();
        tissue.runToEnd();
        assertEquals(2 * founders, tissue.cells().size());
        for (Cell cell : tissue.cells()) {
            assertEquals(1, cell.generation());
        }
    }

    @Test
    void resultsAreBitIdenticalForOneTwoAndFourThreads() {
        // Each cell draws only from its own stream and forces come from one snapshot, so the
        // thread count must not change a single bit (the design's promise).
        CycleTimeDistribution gamma = new CycleTimeDistribution(CycleTimeDistribution.Kind.GAMMA, 2.0, 0.3);
        List<Tissue> runs = new ArrayList<>();
        for (int threads : new int[] {1, 2, 4}) {
            Tissue t = new Tissue(spec(300, new double[] {0.5, 0.5}, gamma, 5.0, 60.0), 31, threads);
            t.start();
            t.runToEnd();
            t.finish();
            runs.add(t);
        }
        Tissue serial = runs.get(0);
        assertTrue(serial.cells().size() > 1000);
        for (Tissue other : runs.subList(1, runs.size())) {
            assertEquals(serial.cells().size(), other.cells().size());
            for (int i = 0; i < serial.cells().size(); i++) {
                Cell a = serial.cells().get(i);
                Cell b = other.cells().get(i);
                assertEquals(a.id(), b.id());
                assertEquals(a.x(), b.x(), 0.0);
                assertEquals(a.y(), b.y(), 0.0);
                assertArrayEquals(a.state(), b.state(), 0.0);
            }
            for (int r = 0; r < serial.series().rows().size(); r++) {
                assertArrayEquals(serial.series().rows().get(r).fateCounts(), other.series().rows().get(r)
                        .fateCounts());
            }
        }
    }

    @Test
    void sameSeedGivesTheSameTissue() {
        CycleTimeDistribution gamma = new CycleTimeDistribution(CycleTimeDistribution.Kind.GAMMA, 3.0, 0.3);
        Tissue first = new Tissue(spec(100, new double[] {0.5, 0.5}, gamma, 6.0, 80.0), 77);
        Tissue second = new Tissue(spec(100, new double[] {0.5, 0.5}, gamma, 6.0, 80.0), 77);
        first.start();
        first.runToEnd();
        second.start();
        second.runToEnd();
        assertEquals(first.cells().size(), second.cells().size());
        assertTrue(first.cells().size() > 200);
        for (int i = 0; i < first.cells().size(); i++) {
            Cell a = first.cells().get(i);
            Cell b = second.cells().get(i);
            assertEquals(a.id(), b.id());
            assertEquals(a.x(), b.x(), 0.0);
            assertArrayEquals(a.state(), b.state(), 0.0);
        }
    }
}
