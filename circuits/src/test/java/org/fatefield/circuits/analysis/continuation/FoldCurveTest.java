package org.fatefield.circuits.analysis.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.junit.jupiter.api.Test;

class FoldCurveTest {

    /**
     * Cusp normal form x' = a + b x - x^3: folds where b = 3 x^2 and a = -2 x^3, that is on
     * 27 a^2 = 4 b^3, meeting in a cusp at a = b = 0 (Strogatz 2015, section 3.6; Kuznetsov 2004,
     * section 8.2).
     */
    @Test
    void cuspNormalFormFoldCurveAndCusp() {
        CustomNetwork cusp = CustomNetwork.of(List.of("x"), List.of("a", "b"), new double[] {0, 1},
                List.of(new CustomNetwork.ReactionDefinition("gain", new int[] {1}, "a + b * x"),
                        new CustomNetwork.ReactionDefinition("loss", new int[] {-1}, "x ^ 3")));
        TwoParameterSystem system = new TwoParameterSystem(cusp, cusp.defaultParameters(), new int[] {0}, new int[] {1});
        double x0 = 1 / Math.sqrt(3);
        FoldCurveContinuation.FoldCurve curve = FoldCurveContinuation.of(system,
                new ContinuationSettings(0.01, 1e-9, 0.05, 4000, 1e-12))
                .trace(new double[] {x0}, -2 * x0 * x0 * x0, 1.0, -1, 1, -0.5, 1.5);
        assertTrue(curve.points().size() > 50);
        for (FoldCurveContinuation.FoldPoint p : curve.points()) {
            double x = p.state()[0];
            assertEquals(3 * x * x, p.nu(), 1e-9);
            assertEquals(-2 * x * x * x, p.mu(), 1e-9);
        }
        assertTrue(curve.points().stream().anyMatch(p -> p.state()[0] < -0.3), "both folds are traced");
        assertEquals(1, curve.cusps().size(), curve.cusps().toString());
        assertEquals(0.0, curve.cusps().get(0).mu(), 1e-8);
        assertEquals(0.0, curve.cusps().get(0).nu(), 1e-6);
    }

    @Test
    void foldCurvePointsAreFoldsOfTheOneParameterContinuation() {
        // Within-project consistency: a point of the two-parameter curve, fixed in its second
        // parameter, must be a fold of the one-parameter continuation there.
        SelfActivatingSwitch sw = SelfActivatingSwitch.of("A", "B",
                new GeneKinetics(0.05, 0.2, 0.5, 4, 1.0, 0.5, 4, 1.0),
                new GeneKinetics(0.08, 0.2, 0.5, 4, 1.0, 0.5, 4, 1.0));
        int repression = sw.parameterIndex("A.repression");
        int basal = sw.parameterIndex("B.basal");
        TwoParameterSystem plane = new TwoParameterSystem(sw, sw.defaultParameters(), new int[] {repression}, new int[] {basal});
        List<Branch> branches = EquilibriumContinuation.of(plane.alongFirst(0.08), ContinuationSettings.defaults())
                .diagram(new double[] {2.0, 0.06}, 2.0, 0.05, 3.0, false, 0);
        SpecialPoint fold = branches.get(0).specials().stream()
                .filter(s -> s.type() == SpecialPointType.SADDLE_NODE).findFirst().orElseThrow();
        FoldCurveContinuation.FoldCurve curve = FoldCurveContinuation.of(plane, ContinuationSettings.defaults())
                .trace(fold.state(), fold.parameter(), 0.08, 0.05, 3.0, 0.0, 0.3);
        FoldCurveContinuation.FoldPoint sample = curve.points().get(curve.points().size() / 3);
        List<Branch> check = EquilibriumContinuation.of(plane.alongFirst(sample.nu()), ContinuationSettings.defaults())
                .diagram(sample.state(), sample.mu(), 0.05, 3.0, false, 0);
        double nearest = check.get(0).specials().stream().filter(s -> s.type() == SpecialPointType.SADDLE_NODE)
                .mapToDouble(s -> Math.abs(s.parameter() - sample.mu())).min().orElseThrow();
        assertEquals(0.0, nearest, 1e-7);
    }
}
