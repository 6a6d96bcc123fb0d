package org.fatefield.engine.metrics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.ContinuationSettings;
import org.fatefield.circuits.analysis.continuation.EquilibriumContinuation;
import org.fatefield.circuits.analysis.continuation.NetworkSystem;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.junit.jupiter.api.Test;

/**
 * The fate-call boundary on the symmetric toggle u' = a/(1+v^2) - u, v' = a/(1+u^2) - v
 * (Gardner, Cantor &amp; Collins 2000, Nature 403:339), continued in a. Past the pitchfork at
 * a = 2 the asymmetric branch satisfies u v = 1 and u + v = a exactly, so its high state is
 * u = (a + sqrt(a^2 - 4))/2 and first satisfies the rule u &gt;= 3/2 at a = 3/2 + 2/3 = 13/6,
 * not at the pitchfork where bistability begins.
 */
class FateCallBoundaryTest {

    @Test
    void stableStatesEnterTheRuleWhereTheClosedFormSays() {
        SelfActivatingSwitch toggle = SelfActivatingSwitch.symmetric("U", "V", new GeneKinetics(0, 0, 1, 1, 1.0, 1, 2, 1));
        int[] a = {toggle.parameterIndex("U.repression"), toggle.parameterIndex("V.repression")};
        List<Branch> branches = EquilibriumContinuation.of(new NetworkSystem(toggle, toggle.defaultParameters(), a),
                ContinuationSettings.defaults().withMaxStep(0.01)).diagram(new double[] {0.68, 0.68}, 1.0, 1.0, 4.0,
                true, 1);
        FateClassifier fates = new FateClassifier(List.of(new FateRule("high", new double[] {1.5, Double.NaN},
                new double[] {Double.NaN, Double.NaN})), "other");
        List<FateCallBoundary> calls = FateCallBoundary.of(branches, fates);
        assertEquals(1, calls.size(), calls.toString());
        assertEquals(0, calls.get(0).fate());
        // Bisection along chords of at most 0.01: the chord's deviation from the branch, about 1e-5.
        assertEquals(13.0 / 6, calls.get(0).controlValue(), 1e-4);
    }

    /**
     * The n = 2 self-activation/mutual-inhibition switch x' = a x^2/(S^2 + x^2) + b S^2/(S^2 + y^2)
     * - k x (and x, y swapped; Huang, Guo, May &amp; Enver 2007, Dev Biol 305:695), continued in b.
     * Derived here: on y = S^2/x both equations reduce to k x^2 - (a + b) x + k S^2 = 0, so the
     * asymmetric states exist for a + b &gt;= 2kS and their high member x reaches the rule's level
     * X at b = k (X^2 + S^2) / X - a. With a = 0.5, S = 0.5, k = 1 and the rule x &gt;= 0.8,
     * y &lt; 0.35 (y = 0.3125 there): b = 0.6125, while the branch is born at b = 0.5.
     */
    @Test
    void selfActivatingSwitchEntersTheRuleWhereTheQuadraticSays() {
        SelfActivatingSwitch sw = SelfActivatingSwitch.symmetric("X", "Y",
                new GeneKinetics(0, 0.5, 0.5, 2, 0.3, 0.5, 2, 1));
        int[] b = {sw.parameterIndex("X.repression"), sw.parameterIndex("Y.repression")};
        List<Branch> branches = EquilibriumContinuation.of(new NetworkSystem(sw, sw.defaultParameters(), b),
                ContinuationSettings.defaults().withMaxStep(0.005)).diagram(new double[] {0.3, 0.3}, 0.3, 0.3, 1.5,
                true, 2);
        FateClassifier fates = new FateClassifier(List.of(new FateRule("x-high", new double[] {0.8, Double.NaN},
                new double[] {Double.NaN, 0.35})), "other");
        List<FateCallBoundary> calls = FateCallBoundary.of(branches, fates);
        assertEquals(1, calls.size(), calls.toString());
        assertEquals(0.6125, calls.get(0).controlValue(), 1e-4);
    }
}
