package org.fatefield.circuits.analysis.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Continuation on the normal forms of the saddle-node (x' = r + x^2) and the supercritical
 * pitchfork (x' = r x - x^3): steady states, eigenvalues and the sqrt(r) amplitude law
 * (Strogatz, S. H. 2015, Nonlinear Dynamics and Chaos, 2nd ed., Westview, ch. 3).
 */
class NormalFormsTest {

    private static final ContinuationSettings SETTINGS = new ContinuationSettings(0.01, 1e-9, 0.05, 5000, 1e-12);

    @Test
    void saddleNodeFoldAtZero() {
        ParametrisedSystem saddleNode = new ScalarSystem((x, r) -> r + x * x, (x, r) -> 2 * x);
        List<Branch> branches = EquilibriumContinuation.of(saddleNode, SETTINGS)
                .diagram(new double[] {-1}, -1, -2, 2, false, 0);
        Branch branch = branches.get(0);
        List<SpecialPoint> folds = branch.specials().stream()
                .filter(s -> s.type() == SpecialPointType.SADDLE_NODE).toList();
        assertEquals(1, folds.size(), branch.specials().toString());
        assertEquals(0.0, folds.get(0).parameter(), 1e-8);
        assertEquals(0.0, folds.get(0).state()[0], 1e-4);
        for (BranchPoint p : branch.points()) {
            double x = p.state()[0];
            assertEquals(-x * x, p.parameter(), 1e-10);
            // Eigenvalue 2x: the lower branch (x < 0) is stable, the upper unstable.
            assertEquals(2 * x, p.eigenvalues()[0].getReal(), 1e-9);
            if (Math.abs(x) > 1e-6) {
                assertEquals(x < 0, p.stable());
            }
        }
        assertTrue(branch.points().stream().anyMatch(p -> p.state()[0] > 0.9));
    }

    @Test
    void pitchforkBranchPointAndSqrtAmplitude() {
        ParametrisedSystem pitchfork = new ScalarSystem((x, r) -> r * x - x * x * x, (x, r) -> r - 3 * x * x);
        List<Branch> branches = EquilibriumContinuation.of(pitchfork, SETTINGS)
                .diagram(new double[] {0}, -1, -1, 1, true, 1);
        List<SpecialPoint> crossings = branches.get(0).specials().stream()
                .filter(s -> s.type().isBranchPoint()).toList();
        assertEquals(1, crossings.size(), branches.get(0).specials().toString());
        assertEquals(0.0, crossings.get(0).parameter(), 1e-8);
        assertEquals(2, branches.size(), "the emerging branch is traced");
        Branch emerging = branches.get(1);
        assertTrue(emerging.points().size() > 20);
        boolean sawPositive = false;
        for (BranchPoint p : emerging.points()) {
            double x = p.state()[0];
            double r = p.parameter();
            assertEquals(r, x * x, 1e-10);
            if (r > 1e-3) {
                assertEquals(Math.sqrt(r), Math.abs(x), 1e-9);
                assertEquals(-2 * r, p.eigenvalues()[0].getReal(), 1e-8);
                assertTrue(p.stable());
                sawPositive |= x > 0;
            }
        }
        assertTrue(sawPositive);
        for (BranchPoint p : branches.get(0).points()) {
            assertEquals(0.0, p.state()[0], 1e-12);
            if (Math.abs(p.parameter()) > 1e-6) {
                assertEquals(p.parameter() < 0, p.stable());
            }
        }
        assertFalse(emerging.points().stream().anyMatch(p -> p.parameter() < -1e-9));
    }
}
