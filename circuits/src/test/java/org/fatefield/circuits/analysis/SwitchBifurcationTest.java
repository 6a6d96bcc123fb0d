package org.fatefield.circuits.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.kinetics.HillFunctions;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * Steady states and stability of the two-gene switch against conditions derived by hand.
 */
class SwitchBifurcationTest {

    private static final double BASAL = 0.1;
    private static final double THETA = 0.5;
    private static final double HILL = 4;
    private static final double REPRESSION = 1.0;
    private static final double DEGRADATION = 1.0;

    private static double[] symmetricParameters(double selfActivation) {
        GeneKinetics gene = new GeneKinetics(BASAL, selfActivation, THETA, HILL, REPRESSION, THETA, HILL, DEGRADATION);
        return SelfActivatingSwitch.symmetric("A", "B", gene).defaultParameters();
    }

    /**
     * Derivation: on the symmetric state A = B = s the Jacobian is [[d, o], [o, d]] with
     * d = a act'(s) - k and o = r rep'(s); its antisymmetric eigenvector (1, -1) has eigenvalue
     * d - o. The pitchfork is where F(s, a) = b + a act(s) + r rep(s) - k s = 0 and
     * G(s, a) = a act'(s) - r rep'(s) - k = 0. Eliminating a = (k + r rep'(s)) / act'(s) leaves one
     * equation in s, solved here with Hipparchus' Brent solver, independent of the code under test.
     */
    private static double analyticCriticalSelfActivation() {
        UnivariateFunction residual = s -> {
            double a = (DEGRADATION + REPRESSION * HillFunctions.repressionSlope(s, THETA, HILL))
                    / HillFunctions.activationSlope(s, THETA, HILL);
            return BASAL + a * HillFunctions.activation(s, THETA, HILL) + REPRESSION * HillFunctions.repression(s,
                    THETA, HILL)
                    - DEGRADATION * s;
        };
        double s = new BrentSolver(1e-15, 1e-15, 1e-15).solve(1000, residual, 0.72, 0.86);
        return (DEGRADATION + REPRESSION * HillFunctions.repressionSlope(s, THETA,
                HILL)) / HillFunctions.activationSlope(s, THETA, HILL);
    }

    private static SteadyState symmetricState(double selfActivation) {
        SelfActivatingSwitch circuit = SelfActivatingSwitch.symmetric("A", "B",
                new GeneKinetics(BASAL, selfActivation, THETA, HILL, REPRESSION, THETA, HILL, DEGRADATION));
        List<SteadyState> states = SteadyStateFinder.of(circuit)
                .find(circuit.defaultParameters(), new double[] {0, 0}, new double[] {3, 3});
        return closestToDiagonal(states);
    }

    @Test
    void symmetricStateLosesStabilityAtTheDerivedPitchfork() {
        double critical = analyticCriticalSelfActivation();
        assertTrue(critical > 0.3 && critical < 1.5, "critical self-activation " + critical);
        // The code's stability verdict must flip within 1e-8 of the derived value. With these
        // kinetics, strong self-activation stabilises the co-expressing state: unstable below.
        assertFalse(symmetricState(critical - 1e-8).isStable());
        assertTrue(symmetricState(critical + 1e-8).isStable());
        assertFalse(symmetricState(critical - 0.05).isStable());
        assertTrue(symmetricState(critical + 0.05).isStable());
    }

    @Test
    void antisymmetricEigenvalueCrossesZeroWithNonzeroSpeed() {
        // Generic crossing: the leading eigenvalue changes sign linearly in a (not a higher-order touch).
        double critical = analyticCriticalSelfActivation();
        double delta = 1e-4;
        double below = symmetricState(critical - delta).leadingRealPart();
        double above = symmetricState(critical + delta).leadingRealPart();
        assertTrue(below > 0 && above < 0, below + " " + above);
        assertEquals(1.0, -below / above, 0.01);
    }

    @Test
    void belowThePitchforkTheSwitchIsBistableAndAboveItTristable() {
        // Tristability of the self-activating switch at strong self-activation: Huang, Guo, May
        // & Enver (2007), Dev. Biol. 305:695-713.
        double critical = analyticCriticalSelfActivation();
        assertStateCounts(critical - 0.3, 2, 1);
        assertStateCounts(critical + 0.3, 3, 2);
    }

    private static void assertStateCounts(double selfActivation, int stable, int saddles) {
        SelfActivatingSwitch circuit = SelfActivatingSwitch.symmetric("A", "B",
                new GeneKinetics(BASAL, selfActivation, THETA, HILL, REPRESSION, THETA, HILL, DEGRADATION));
        List<SteadyState> states = SteadyStateFinder.of(circuit)
                .find(circuit.defaultParameters(), new double[] {0, 0}, new double[] {3, 3});
        assertEquals(stable, states.stream().filter(SteadyState::isStable).count(), states.toString());
        assertEquals(saddles, states.stream().filter(s -> s.type() == SteadyStateType.SADDLE).count(),
                states.toString());
        for (SteadyState s : states) {
            double[] f = circuit.drift(s.state(), circuit.defaultParameters());
            assertEquals(0.0, f[0], 1e-12);
            assertEquals(0.0, f[1], 1e-12);
        }
    }

    /**
     * Toggle u' = a / (1 + v^n) - u, v' = a / (1 + u^n) - v: the symmetric state is unstable iff
     * a > n / (n - 1) (n - 1)^(-1/n). Cherry &amp; Adler (2000), How to make a biological switch,
     * J. Theor. Biol. 203:117-133; Gardner, Cantor &amp; Collins (2000), Nature 403:339-342.
     */
    @ParameterizedTest
    @ValueSource(doubles = {2.0, 2.5, 3.0, 4.0})
    void toggleBistabilityThreshold(double n) {
        double expected = n / (n - 1) * Math.pow(n - 1, -1.0 / n);
        double low = 0.5 * expected;
        double high = 2.0 * expected;
        assertTrue(toggleSymmetricStateStable(low, n));
        assertFalse(toggleSymmetricStateStable(high, n));
        while (high - low > 2e-9) {
            double mid = 0.5 * (low + high);
            if (toggleSymmetricStateStable(mid, n)) {
                low = mid;
            } else {
                high = mid;
            }
        }
        assertEquals(expected, 0.5 * (low + high), 1e-8, "n = " + n);
    }

    @Test
    void toggleWithHillTwoAboveThresholdHasThreeStates() {
        // a = 3, n = 2: asymmetric states solve uv = 1, u + v = a (from the model's equations).
        SelfActivatingSwitch toggle = toggle(3.0, 2.0);
        List<SteadyState> states = SteadyStateFinder.of(toggle)
                .find(toggle.defaultParameters(), new double[] {0, 0}, new double[] {4, 4});
        assertEquals(3, states.size(), states.toString());
        double u = (3.0 - Math.sqrt(5.0)) / 2.0;
        assertEquals(u, states.get(0).state()[0], 1e-10);
        assertEquals(1.0 / u, states.get(0).state()[1], 1e-10);
        assertEquals(SteadyStateType.SADDLE, states.get(1).type());
        assertTrue(states.get(2).isStable());
    }

    private static SelfActivatingSwitch toggle(double a, double n) {
        GeneKinetics gene = new GeneKinetics(0.0, 0.0, 1.0, 1.0, a, 1.0, n, 1.0);
        return SelfActivatingSwitch.symmetric("U", "V", gene);
    }

    private static boolean toggleSymmetricStateStable(double a, double n) {
        SelfActivatingSwitch toggle = toggle(a, n);
        List<SteadyState> states = SteadyStateFinder.of(toggle).withStartsPerAxis(12)
                .find(toggle.defaultParameters(), new double[] {0, 0}, new double[] {2 * a, 2 * a});
        return closestToDiagonal(states).leadingRealPart() < 0;
    }

    /**
     * The symmetric state: the one nearest the diagonal. Near a pitchfork the state is determined
     * only to about (rounding / eigenvalue) across the diagonal, so an exact equality test would fail.
     */
    private static SteadyState closestToDiagonal(List<SteadyState> states) {
        SteadyState best = null;
        for (SteadyState state : states) {
            double[] x = state.state();
            if (best == null || Math.abs(x[0] - x[1]) < Math.abs(best.state()[0] - best.state()[1])) {
                best = state;
            }
        }
        if (best == null || Math.abs(best.state()[0] - best.state()[1]) > 1e-5) {
            throw new AssertionError("no symmetric steady state among " + states);
        }
        return best;
    }
}
