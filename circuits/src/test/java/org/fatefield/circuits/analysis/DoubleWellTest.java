package org.fatefield.circuits.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.fatefield.circuits.model.CustomNetwork;
import org.junit.jupiter.api.Test;

/**
 * Landscape and switching code on the double-well gradient SDE dx = -U'(x) dt + sqrt(2D) dW with
 * U(x) = u^4/4 - u^2/2, u = x - 3 (wells at x = 2 and 4, barrier 1/4 at x = 3). It is written as
 * a custom circuit whose two reactions have propensities c -+ U'(x)/2 with c = D Omega, so the
 * chemical Langevin drift is -U' and the noise variance 2D exactly. References: stationary density
 * proportional to exp(-U/D), mean first-passage time and committor as the exact integrals of
 * Gardiner (2009), Stochastic Methods, 4th ed., Springer, sections 5.2.7 and 6.2 (evaluated here by
 * Simpson's rule); Kramers (1940), Physica 7:284, as a loose check only.
 */
class DoubleWellTest {

    private static final double D = 0.1;
    private static final double OMEGA = 100.0;
    private static final DoubleUnaryOperator POTENTIAL = x -> {
        double u = x - 3;
        return u * u * u * u / 4 - u * u / 2;
    };

    private static CustomNetwork doubleWell() {
        return CustomNetwork.of(List.of("x"), List.of("c"), new double[] {D * OMEGA}, List.of(
                new CustomNetwork.ReactionDefinition("up", new int[] {1}, "c - ((x - 3)^3 - (x - 3)) / 2"),
                new CustomNetwork.ReactionDefinition("down", new int[] {-1}, "c + ((x - 3)^3 - (x - 3)) / 2")));
    }

    private static double simpson(DoubleUnaryOperator f, double a, double b, int intervals) {
        double h = (b - a) / intervals;
        double s = f.applyAsDouble(a) + f.applyAsDouble(b);
        for (int i = 1; i < intervals; i++) {
            s += (i % 2 == 1 ? 4 : 2) * f.applyAsDouble(a + i * h);
        }
        return s * h / 3;
    }

    @Test
    void landscapeRecoversTheBarrierOverD() {
        CustomNetwork network = doubleWell();
        QuasiPotential landscape = QuasiPotential.estimate(network, network.defaultParameters(), OMEGA,
                new double[] {2.0}, 0, -1, new double[] {1.0, 0}, new double[] {5.0, 0}, 80,
                new QuasiPotential.Sampling(20, 50, 5000, 0.01, 11));
        double[] u = landscape.u()[0];
        double[] xs = landscape.xs();
        int top = 0;
        int well = 0;
        for (int i = 0; i < xs.length; i++) {
            if (Math.abs(xs[i] - 3.025) < 1e-9) {
                top = i;
            }
            if (Math.abs(xs[i] - 2.025) < 1e-9) {
                well = i;
            }
        }
        double expected = (POTENTIAL.applyAsDouble(3.025) - POTENTIAL.applyAsDouble(2.025)) / D;
        assertEquals(expected, u[top] - u[well], 0.04 * expected);
    }

    @Test
    void gridSolutionHasTheStationaryShapeExpMinusUOverD() {
        CustomNetwork network = doubleWell();
        QuasiPotential landscape = StationaryFokkerPlanck.solve(network, network.defaultParameters(), OMEGA, 0, -1,
                new double[] {1.0, 0}, new double[] {5.0, 0}, 400);
        double[] u = landscape.u()[0];
        double[] xs = landscape.xs();
        double reference = POTENTIAL.applyAsDouble(xs[100]) / D - u[100];
        double barrier = Double.NaN;
        for (int i = 0; i < xs.length; i++) {
            double expected = POTENTIAL.applyAsDouble(xs[i]) / D;
            if (expected < 8) {
                // Exponential fitting with a varying drift: error O(h^2) in U, well below 0.01 here.
                assertEquals(expected - reference, u[i], 0.01, "x = " + xs[i]);
            }
            if (Math.abs(xs[i] - 3.005) < 1e-9) {
                barrier = u[i];
            }
        }
        assertEquals(0.25 / D, barrier - Math.min(u[99], u[100]), 0.04 * 0.25 / D);
    }

    @Test
    void meanFirstPassageMatchesTheExactIntegral() {
        CustomNetwork network = doubleWell();
        double radius = 0.1;
        double target = 4.0 - radius;
        // T(2 -> b) = (1/D) int_2^b exp(U(y)/D) int_-inf^y exp(-U(z)/D) dz dy.
        DoubleUnaryOperator inner = y -> simpson(z -> Math.exp(-POTENTIAL.applyAsDouble(z) / D), 0.0, y, 2000);
        double exact = simpson(y -> Math.exp(POTENTIAL.applyAsDouble(y) / D) * inner.applyAsDouble(y), 2.0, target, 400) / D;
        Switching.FirstPassage passage = Switching.meanFirstPassage(network, network.defaultParameters(), OMEGA,
                new double[] {2.0}, new double[] {4.0}, radius, 1000, langevin(0.005, 5000), 5);
        assertEquals(0, passage.censored());
        // Passage times are close to exponential, so the standard error is about mean / sqrt(N).
        double standardError = passage.standardDeviation() / Math.sqrt(passage.arrived());
        assertEquals(exact, passage.mean(), 4 * standardError, "exact integral " + exact);
        assertTrue(passage.low95() < passage.mean() && passage.mean() < passage.high95());
        // Kramers' escape rate sqrt(U''(well) |U''(top)|) / (2 pi) exp(-dU / D): loose, 30%.
        double kramers = 2 * Math.PI / Math.sqrt(2.0) * Math.exp(0.25 / D);
        assertEquals(kramers, passage.mean(), 0.3 * kramers);
    }

    private static SwitchingSettings langevin(double step, double limit) {
        return new SwitchingSettings(SwitchingSettings.Method.LANGEVIN, step, 0.25, limit, limit, -1, -1);
    }

    /**
     * The same circuit simulated exactly in molecule counts is a birth-death chain with birth
     * rates b_n = Omega a_up(n/Omega) and death rates d_n = Omega a_down(n/Omega) (negative
     * propensities clamped to 0: a reflecting edge where the death rate vanishes). Its mean first-passage time from n0 to N is
     * T = sum_{k=n0}^{N-1} 1/(b_k p_k) sum_{j=0}^{k} p_j with p_j = prod_{i=1}^{j} b_{i-1}/d_i
     * (Gardiner 2009, §7.4.1; van Kampen 2007, Stochastic Processes in Physics and Chemistry,
     * 3rd ed., §XII.2). Arrival is observed every 0.005 h, a bias far below the error of the
     * 300-trajectory mean.
     */
    @Test
    void exactMethodMeanFirstPassageMatchesTheBirthDeathSum() {
        CustomNetwork network = doubleWell();
        double radius = 0.1;
        int n0 = 200;
        int target = (int) Math.floor((4.0 - radius) * OMEGA) + 1;
        DoubleUnaryOperator force = x -> ((x - 3) * (x - 3) * (x - 3) - (x - 3)) / 2;
        double c = D * OMEGA;
        double[] logP = new double[target];
        double[] birth = new double[target];
        // Below the highest count under n0 whose death rate is 0 the chain never returns: the edge.
        int edge = 0;
        for (int n = 0; n < target; n++) {
            birth[n] = OMEGA * Math.max(0, c - force.applyAsDouble(n / OMEGA));
            double death = OMEGA * Math.max(0, c + force.applyAsDouble(n / OMEGA));
            if (death == 0 && n <= n0) {
                edge = n;
            }
            if (n > edge) {
                logP[n] = logP[n - 1] + Math.log(birth[n - 1]) - Math.log(death);
            }
        }
        double exact = 0;
        for (int k = n0; k < target; k++) {
            double inner = 0;
            for (int j = edge; j <= k; j++) {
                inner += Math.exp(logP[j] - logP[k]);
            }
            exact += inner / birth[k];
        }
        SwitchingSettings settings = new SwitchingSettings(SwitchingSettings.Method.EXACT, 0.005, 0.25, 5000, 5000,
                -1, -1);
        Switching.FirstPassage passage = Switching.meanFirstPassage(network, network.defaultParameters(), OMEGA,
                new double[] {2.0}, new double[] {4.0}, radius, 300, settings, 23);
        assertEquals(0, passage.censored());
        double standardError = passage.standardDeviation() / Math.sqrt(passage.arrived());
        assertEquals(exact, passage.mean(), 4 * standardError, "exact sum " + exact);
    }

    @Test
    void commitmentProbabilityMatchesTheExactCommittor() {
        CustomNetwork network = doubleWell();
        double radius = 0.1;
        double a = 2.0 + radius;
        double b = 4.0 - radius;
        DoubleUnaryOperator weight = y -> Math.exp(POTENTIAL.applyAsDouble(y) / D);
        double whole = simpson(weight, a, b, 2000);
        int n = 2000;
        for (double start : new double[] {2.8, 3.0, 3.3}) {
            double exact = simpson(weight, a, start, 2000) / whole;
            double estimate = Switching.commitment(network, network.defaultParameters(), OMEGA, new double[] {start},
                    new double[] {4.0}, new double[] {2.0}, radius, n, langevin(0.002, 1000), 17);
            // 99% binomial interval (normal approximation).
            assertEquals(exact, estimate, 2.576 * Math.sqrt(exact * (1 - exact) / n) + 0.01, "start " + start);
        }
    }
}
