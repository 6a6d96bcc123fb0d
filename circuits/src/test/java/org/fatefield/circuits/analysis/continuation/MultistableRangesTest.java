package org.fatefield.circuits.analysis.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Bistable ranges read off continued diagrams of normal forms whose ranges are known exactly
 * (Strogatz, S. H. 2015, Nonlinear Dynamics and Chaos, 2nd ed., Westview, sections 3.4 and 3.6).
 */
class MultistableRangesTest {

    private static final ContinuationSettings SETTINGS = new ContinuationSettings(0.01, 1e-9, 0.05, 5000, 1e-12);

    @Test
    void hysteresisLoopIsBistableBetweenItsFolds() {
        // x' = r + x - x^3: folds where 1 - 3x^2 = 0, at r = -+2/(3 sqrt 3); bistable between them.
        ParametrisedSystem cubic = new ScalarSystem((x, r) -> r + x - x * x * x, (x, r) -> 1 - 3 * x * x);
        List<Branch> branches = EquilibriumContinuation.of(cubic, SETTINGS)
                .diagram(new double[] {-1.6}, -2, -2, 2, false, 0);
        List<MultistableRanges.Range> ranges = MultistableRanges.of(branches);
        double fold = 2 / (3 * Math.sqrt(3));
        assertEquals(1, ranges.size(), ranges.toString());
        assertEquals(-fold, ranges.get(0).from(), 1e-6, "lower fold (located special point)");
        assertEquals(fold, ranges.get(0).to(), 1e-6, "upper fold");
    }

    @Test
    void supercriticalPitchforkIsBistableBeyondItsBranchPoint() {
        // x' = r x - x^3: for r > 0 the states +-sqrt(r) are both stable.
        ParametrisedSystem pitchfork = new ScalarSystem((x, r) -> r * x - x * x * x, (x, r) -> r - 3 * x * x);
        List<Branch> branches = EquilibriumContinuation.of(pitchfork, SETTINGS)
                .diagram(new double[] {0}, -1, -1, 1, true, 1);
        List<MultistableRanges.Range> ranges = MultistableRanges.of(branches);
        assertEquals(1, ranges.size(), ranges.toString());
        assertEquals(0.0, ranges.get(0).from(), 1e-6, "located branch point");
        assertEquals(1.0, ranges.get(0).to(), 1e-6);
    }

    @Test
    void monostableDiagramHasNoRange() {
        ParametrisedSystem linear = new ScalarSystem((x, r) -> r - x, (x, r) -> -1);
        List<Branch> branches = EquilibriumContinuation.of(linear, SETTINGS)
                .diagram(new double[] {-1}, -1, -1, 1, false, 0);
        assertEquals(List.of(), MultistableRanges.of(branches));
    }
}
