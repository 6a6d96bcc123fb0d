package org.fatefield.circuits.analysis.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.junit.jupiter.api.Test;

/** Continuation against bifurcations with exact answers from the literature. */
class PublishedBifurcationsTest {

    /**
     * Toggle u' = a/(1+v^2) - u, v' = a/(1+u^2) - v (the model of Gardner, Cantor &amp; Collins
     * 2000): the symmetric branch loses stability in a pitchfork at a = 2; the asymmetric branch
     * satisfies u v = 1 and u + v = a exactly, with eigenvalues -1 +- 2/a (derived from the model).
     */
    @Test
    void togglePitchforkAndItsExactAsymmetricBranch() {
        SelfActivatingSwitch toggle = SelfActivatingSwitch.symmetric("U", "V",
                new GeneKinetics(0, 0, 1, 1, 1.0, 1, 2, 1));
        int a = toggle.parameterIndex("U.repression");
        int b = toggle.parameterIndex("V.repression");
        ParametrisedSystem system = new ParametrisedSystem() {
            private final NetworkSystem u = new NetworkSystem(toggle, toggle.defaultParameters(), a);

            @Override
            public int dimension() {
                return 2;
            }

            @Override
            public void value(double[] x, double lambda, double[] out) {
                double[] p = u.parametersAt(lambda);
                p[b] = lambda;
                toggle.drift(x, p, out, new double[4]);
            }

            @Override
            public void jacobian(double[] x, double lambda, double[][] out) {
                double[] p = u.parametersAt(lambda);
                p[b] = lambda;
                toggle.jacobian(x, p, out);
            }
        };
        List<Branch> branches = EquilibriumContinuation.of(system, ContinuationSettings.defaults())
                .diagram(new double[] {0.68, 0.68}, 1.0, 1.0, 4.0, true, 1);
        SpecialPoint pitchfork = branches.get(0).specials().stream()
                .filter(s -> s.type().isBranchPoint()).findFirst().orElseThrow();
        assertEquals(2.0, pitchfork.parameter(), 1e-8);
        assertEquals(1.0, pitchfork.state()[0], 1e-6);
        assertTrue(branches.size() >= 2);
        int checked = 0;
        for (BranchPoint p : branches.get(1).points()) {
            double u = p.state()[0];
            double v = p.state()[1];
            double lambda = p.parameter();
            if (lambda < 2.0 + 1e-3) {
                continue;
            }
            assertEquals(1.0, u * v, 1e-10);
            assertEquals(lambda, u + v, 1e-10);
            assertEquals(-1 + 2 / lambda, p.eigenvalues()[0].getReal(), 1e-9);
            assertEquals(-1 - 2 / lambda, p.eigenvalues()[1].getReal(), 1e-9);
            checked++;
        }
        assertTrue(checked > 20, "points checked: " + checked);
    }

    /**
     * Brusselator x' = a - (b + 1) x + x^2 y, y' = b x - x^2 y: steady state (a, b/a), Hopf
     * bifurcation at b = 1 + a^2 with frequency a (Prigogine &amp; Lefever 1968, J. Chem. Phys.
     * 48:1695; see Strogatz 2015, ex. 8.3.1).
     */
    @Test
    void brusselatorHopf() {
        double a = 2.0;
        ParametrisedSystem brusselator = new ParametrisedSystem() {
            @Override
            public int dimension() {
                return 2;
            }

            @Override
            public void value(double[] s, double b, double[] out) {
                out[0] = a - (b + 1) * s[0] + s[0] * s[0] * s[1];
                out[1] = b * s[0] - s[0] * s[0] * s[1];
            }

            @Override
            public void jacobian(double[] s, double b, double[][] out) {
                out[0][0] = -(b + 1) + 2 * s[0] * s[1];
                out[0][1] = s[0] * s[0];
                out[1][0] = b - 2 * s[0] * s[1];
                out[1][1] = -s[0] * s[0];
            }
        };
        List<Branch> branches = EquilibriumContinuation.of(brusselator, ContinuationSettings.defaults())
                .diagram(new double[] {2, 0.5}, 1.0, 1.0, 8.0, false, 0);
        SpecialPoint hopf = branches.get(0).specials().stream()
                .filter(s -> s.type() == SpecialPointType.HOPF).findFirst().orElseThrow();
        assertEquals(1 + a * a, hopf.parameter(), 1e-8);
        assertEquals(a, hopf.frequency(), 1e-7);
        assertEquals(a, hopf.state()[0], 1e-9);
        assertEquals((1 + a * a) / a, hopf.state()[1], 1e-7);
    }
}
