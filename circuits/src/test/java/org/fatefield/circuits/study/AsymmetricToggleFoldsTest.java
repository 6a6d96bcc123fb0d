package org.fatefield.circuits.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.ContinuationSettings;
import org.fatefield.circuits.analysis.continuation.FoldCurveContinuation;
import org.fatefield.circuits.analysis.continuation.SpecialPoint;
import org.fatefield.circuits.analysis.continuation.SpecialPointType;
import org.fatefield.circuits.analysis.continuation.TwoParameterSystem;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.hipparchus.analysis.polynomials.PolynomialFunction;
import org.hipparchus.analysis.solvers.LaguerreSolver;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The asymmetric two-gene toggle u' = a1/(1+v^2) - u, v' = a2/(1+u^2) - v (Gardner, Cantor &amp;
 * Collins 2000, Nature 403:339, with cooperativity 2 in both repressions).
 *
 * <p>Exact answers, derived here. A fold has det J = 0, i.e. (1+u^2)(1+v^2) = 4 u^2 v^2 with
 * a1 = u (1+v^2), a2 = v (1+u^2); so along the fold curve v^2 = (1+u^2)/(3u^2-1) and
 * a1 = 4u^3/(3u^2-1). At a2 = 3, w = u^2 solves w^3 + 3w^2 - 24w + 10 = 0, whose two roots above
 * 1/3 give the two folds of the one-parameter diagram in a1 (about 2.7008 and 3.5424). The two
 * fold branches meet in a cusp where u = v, that is at u = v = 1, a1 = a2 = 2. The roots are
 * taken by Hipparchus' Laguerre solver as the reference.
 */
class AsymmetricToggleFoldsTest {

    private static final SelfActivatingSwitch TOGGLE = SelfActivatingSwitch.of("U", "V",
            new GeneKinetics(0, 0, 1, 1, 1.0, 1, 2, 1), new GeneKinetics(0, 0, 1, 1, 3.0, 1, 2, 1));
    private static final int A1 = TOGGLE.parameterIndex("U.repression");
    private static final int A2 = TOGGLE.parameterIndex("V.repression");

    /** The exact folds (a1, u, v) at a2 = 3, by increasing a1. */
    private static List<double[]> exactFolds() {
        Complex[] roots = new LaguerreSolver(1e-15, 1e-15).solveAllComplex(new double[] {10, -24, 3, 1}, 1.0);
        List<double[]> folds = new ArrayList<>();
        for (Complex w : roots) {
            if (Math.abs(w.getImaginary()) < 1e-12 && w.getReal() > 1.0 / 3) {
                double u = Math.sqrt(w.getReal());
                folds.add(new double[] {4 * u * u * u / (3 * u * u - 1), u, 3 / (1 + u * u)});
            }
        }
        folds.sort(Comparator.comparingDouble(f -> f[0]));
        return folds;
    }

    @ParameterizedTest(name = "a1 in [{0}, {1}]")
    @CsvSource({"0.5, 5", "1, 10", "2, 3", "3, 3.6", "2.6, 3.7", "0.01, 100", "2.75, 3.5", "2.8, 3.4", "2.71, 3.54",
        "0.1, 3", "3.3, 20"})
    void eachFoldInTheRangeIsListedOnceAndNothingElse(double min, double max) {
        List<double[]> exact = exactFolds();
        assertEquals(2, exact.size());
        AnalysisPlan plan = new AnalysisPlan("U.repression", new int[] {A1}, min, max, (min + max) / 2, null,
                new int[0], 0, 0, 0, 1, 100, 10, 20, 1);
        List<Branch> branches = new CircuitAnalysis(TOGGLE, TOGGLE.defaultParameters(), plan).diagram();
        List<SpecialPoint> all = branches.stream().flatMap(b -> b.specials().stream())
                .sorted(Comparator.comparingDouble(SpecialPoint::parameter)).toList();
        List<double[]> inside = exact.stream().filter(f -> f[0] > min && f[0] < max).toList();
        assertEquals(inside.size(), all.size(), "special points " + all);
        for (int k = 0; k < inside.size(); k++) {
            SpecialPoint s = all.get(k);
            assertEquals(SpecialPointType.SADDLE_NODE, s.type());
            assertEquals(inside.get(k)[0], s.parameter(), 1e-8);
            assertEquals(inside.get(k)[1], s.state()[0], 1e-6);
            assertEquals(inside.get(k)[2], s.state()[1], 1e-6);
        }
    }

    @Test
    void foldCurveFollowsTheClosedFormAndMeetsInTheCusp() {
        double[] fold = exactFolds().get(0);
        TwoParameterSystem plane = new TwoParameterSystem(TOGGLE, TOGGLE.defaultParameters(), new int[] {A1},
                new int[] {A2});
        FoldCurveContinuation.FoldCurve curve = FoldCurveContinuation.of(plane,
                new ContinuationSettings(0.01, 1e-9, 0.05, 4000, 1e-12))
                .trace(new double[] {fold[1], fold[2]}, fold[0], 3.0, 0.5, 6, 0.5, 6);
        assertTrue(curve.points().size() > 50);
        for (FoldCurveContinuation.FoldPoint p : curve.points()) {
            double u = p.state()[0];
            double v = p.state()[1];
            assertEquals(4 * u * u * u / (3 * u * u - 1), p.mu(), 1e-8);
            assertEquals(v * (1 + u * u), p.nu(), 1e-8);
            assertEquals(1 + u * u, v * v * (3 * u * u - 1), 1e-8);
        }
        assertEquals(1, curve.cusps().size(), curve.cusps().toString());
        assertEquals(2.0, curve.cusps().get(0).mu(), 1e-6);
        assertEquals(2.0, curve.cusps().get(0).nu(), 1e-6);
        assertEquals(1.0, curve.cusps().get(0).state()[0], 1e-5);
    }

    @Test
    void theFoldCubicHasTheQuotedRoots() {
        // Guards the derivation: the cubic's value at the located folds' u^2 is zero.
        PolynomialFunction cubic = new PolynomialFunction(new double[] {10, -24, 3, 1});
        for (double[] f : exactFolds()) {
            assertEquals(0.0, cubic.value(f[1] * f[1]), 1e-10);
        }
        assertEquals(2.7007936383, exactFolds().get(0)[0], 1e-9);
        assertEquals(3.5424074398, exactFolds().get(1)[0], 1e-9);
    }
}
