package org.fatefield.circuits.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Comparator;
import java.util.List;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.BranchPoint;
import org.fatefield.circuits.analysis.continuation.Criticality;
import org.fatefield.circuits.analysis.continuation.SpecialPoint;
import org.fatefield.circuits.analysis.continuation.SpecialPointType;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The Z2-symmetric self-activation / mutual-repression switch (the circuit class of Huang, Guo,
 * May &amp; Enver 2007, Dev. Biol. 305:695) with Hill coefficient 2, no basal expression and unit
 * thresholds and decay: x' = a x^2/(1+x^2) + b/(1+y^2) - x and the same with x, y swapped,
 * continued in the repression strength b at a = 5/4.
 *
 * <p>Exact answers, derived here. On the symmetric branch x = y = s, b = s + s^3 - a s^2. The
 * antisymmetric eigenvalue is 2 s (a + b)/(1+s^2)^2 - 1; it vanishes where
 * (s^2 - 1)(s^2 - 2 a s + 1) = 0, so at s = 1 and s = a +- sqrt(a^2 - 1) = 2, 1/2: pitchforks at
 * b = 3/4, 5 and 5/16. For b = a the sum of the two equations gives x + y = 2a at every steady
 * state, and the asymmetric branches cross each other at (1/2, 2) and (2, 1/2): two transcritical
 * branch points at b = 5/4. The symmetric branch has no fold (db/ds = 1 + 3 s^2 - 2 a s > 0 for
 * a &lt; sqrt 3). Criticality is checked against the stability of the branch born at each
 * pitchfork (Kuznetsov 2004, §3.4: stable on the centre manifold if supercritical).
 */
class SymmetricSwitchPitchforksTest {

    private static final double A = 1.25;

    @ParameterizedTest(name = "b in [{0}, {1}]")
    @CsvSource({"0.2, 6", "0.1, 8", "0.25, 5.5", "0.05, 12"})
    void threePitchforksTwoCrossingsAndTheirCriticality(double min, double max) {
        List<Branch> branches = diagram(min, max);
        List<SpecialPoint> all = branches.stream().flatMap(b -> b.specials().stream()).toList();
        List<SpecialPoint> pitchforks = all.stream().filter(s -> s.type() == SpecialPointType.PITCHFORK)
                .sorted(Comparator.comparingDouble(SpecialPoint::parameter)).toList();
        List<SpecialPoint> crossings = all.stream().filter(s -> s.type() == SpecialPointType.BRANCH_POINT)
                .sorted(Comparator.comparingDouble(s -> s.state()[0])).toList();
        assertEquals(5, all.size(), all.toString());
        assertEquals(3, pitchforks.size(), all.toString());
        assertEquals(2, crossings.size(), all.toString());
        double[][] exact = {{5.0 / 16, 0.5}, {0.75, 1.0}, {5.0, 2.0}};
        Criticality[] expected = {Criticality.SUPERCRITICAL, Criticality.SUBCRITICAL, Criticality.SUBCRITICAL};
        for (int k = 0; k < 3; k++) {
            SpecialPoint p = pitchforks.get(k);
            assertEquals(exact[k][0], p.parameter(), 1e-8);
            assertEquals(exact[k][1], p.state()[0], 1e-7);
            assertEquals(exact[k][1], p.state()[1], 1e-7);
            assertEquals(expected[k], p.criticality(), "pitchfork at b = " + exact[k][0]);
            assertEquals(expected[k] == Criticality.SUPERCRITICAL, bornStable(branches, p),
                    "stability of the states born at b = " + exact[k][0]);
        }
        for (int k = 0; k < 2; k++) {
            SpecialPoint c = crossings.get(k);
            assertEquals(1.25, c.parameter(), 1e-7);
            assertEquals(k == 0 ? 0.5 : 2.0, c.state()[0], 1e-7);
            assertEquals(k == 0 ? 2.0 : 0.5, c.state()[1], 1e-7);
            assertEquals(Criticality.NOT_APPLICABLE, c.criticality());
        }
    }

    /** Stability of the asymmetric states within 0.3 of the pitchfork (off the symmetric line). */
    private static boolean bornStable(List<Branch> branches, SpecialPoint pitchfork) {
        int stable = 0;
        int unstable = 0;
        for (Branch b : branches) {
            for (BranchPoint p : b.points()) {
                double dx = p.state()[0] - pitchfork.state()[0];
                double dy = p.state()[1] - pitchfork.state()[1];
                double dl = p.parameter() - pitchfork.parameter();
                boolean near = Math.sqrt(dx * dx + dy * dy + dl * dl) < 0.3;
                if (near && Math.abs(p.state()[0] - p.state()[1]) > 1e-3) {
                    if (p.stable()) {
                        stable++;
                    } else {
                        unstable++;
                    }
                }
            }
        }
        assertTrue(stable + unstable >= 2, "asymmetric points traced near b = " + pitchfork.parameter());
        assertTrue(stable == 0 || unstable == 0, "mixed stability near b = " + pitchfork.parameter());
        return stable > 0;
    }

    private static List<Branch> diagram(double min, double max) {
        SelfActivatingSwitch sw = SelfActivatingSwitch.symmetric("X", "Y", new GeneKinetics(0, A, 1, 2, 0.75, 1, 2, 1));
        int[] b = {sw.parameterIndex("X.repression"), sw.parameterIndex("Y.repression")};
        AnalysisPlan plan = new AnalysisPlan("repression", b, min, max, 0.75, null, new int[0], 0, 0, 0, 1, 100, 10,
                20, 1);
        return new CircuitAnalysis(sw, sw.defaultParameters(), plan).diagram();
    }
}
