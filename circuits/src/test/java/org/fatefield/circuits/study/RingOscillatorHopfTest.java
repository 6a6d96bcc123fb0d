package org.fatefield.circuits.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.Criticality;
import org.fatefield.circuits.analysis.continuation.SpecialPoint;
import org.fatefield.circuits.analysis.continuation.SpecialPointType;
import org.fatefield.circuits.model.HillNetwork;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

/**
 * A ring of three repressors, x_i' = a/(1 + x_{i-1}^4) - x_i (the protein-only ring oscillator of
 * Elowitz &amp; Leibler 2000, Nature 403:335), continued in the common maximal rate a.
 *
 * <p>Exact answers, derived here. The symmetric steady state solves x (1 + x^4) = a; its
 * Jacobian is -I + g P (P the cyclic shift) with g = -4 x^4/(1 + x^4), eigenvalues
 * -1 + g e^(2 pi i k/3). The complex pair crosses the imaginary axis where -1 - g/2 = 0, i.e.
 * g = -2, x = 1, a = 2, with frequency |g| sqrt(3)/2 = sqrt(3) (onset period 2 pi/sqrt 3). The
 * real part grows at d(Re)/da = 1/3 there. Supercriticality is checked against a direct
 * simulation (Hipparchus' Dormand-Prince 8(5,3) integrator as the reference): the cycle's
 * amplitude grows as the square root of the distance past onset (Strogatz, S. H. 2015, Nonlinear
 * Dynamics and Chaos, 2nd ed., §8.2), and its size matches the normal form
 * |z| = sqrt(-beta/(omega l1)), each species oscillating by 2 |q_i| |z| with |q_i| = 1/sqrt 3.
 */
class RingOscillatorHopfTest {

    private static final int[][] RING = {{0, 0, -1}, {-1, 0, 0}, {0, -1, 0}};

    private static HillNetwork ring() {
        double[][] threshold = {{1, 1, 1}, {1, 1, 1}, {1, 1, 1}};
        double[][] hill = {{4, 4, 4}, {4, 4, 4}, {4, 4, 4}};
        return new HillNetwork(List.of("A", "B", "C"), RING, HillNetwork.Combination.ADDITIVE, new double[3],
                new double[] {1.5, 1.5, 1.5}, new double[] {1, 1, 1}, threshold, hill);
    }

    @Test
    void hopfAtTheDerivedPointIsSupercriticalAsTheCycleAmplitudeShows() {
        HillNetwork ring = ring();
        int[] rates = {ring.parameterIndex("A.max_rate"), ring.parameterIndex("B.max_rate"),
            ring.parameterIndex("C.max_rate")};
        AnalysisPlan plan = new AnalysisPlan("max_rate", rates, 1.0, 3.0, 1.5, null, new int[0], 0, 0, 0, 1, 100, 10,
                20, 1);
        List<Branch> branches = new CircuitAnalysis(ring, ring.defaultParameters(), plan).diagram();
        List<SpecialPoint> all = branches.stream().flatMap(b -> b.specials().stream()).toList();
        assertEquals(1, all.size(), all.toString());
        SpecialPoint hopf = all.get(0);
        assertEquals(SpecialPointType.HOPF, hopf.type());
        assertEquals(2.0, hopf.parameter(), 1e-8);
        assertEquals(Math.sqrt(3), hopf.frequency(), 1e-7);
        for (double x : hopf.state()) {
            assertEquals(1.0, x, 1e-8);
        }
        assertEquals(Criticality.SUPERCRITICAL, hopf.criticality());
        double l1 = hopf.coefficient();

        double[] amplitudes = new double[2];
        double[] distances = {0.02, 0.08};
        for (int k = 0; k < 2; k++) {
            double a = 2 + distances[k];
            double beta = realPartOfCriticalPair(a);
            assertEquals(distances[k] / 3, beta, 0.1 * distances[k] / 3, "d(Re)/da = 1/3 near onset");
            double predicted = 2 / Math.sqrt(3) * Math.sqrt(-beta / (Math.sqrt(3) * l1));
            amplitudes[k] = simulatedHalfRange(ring, a, predicted);
            assertEquals(predicted, amplitudes[k], 0.08 * predicted, "cycle amplitude at a = " + a);
        }
        // Quadrupling the distance past onset doubles the amplitude (square-root law), within 8%.
        assertEquals(2.0, amplitudes[1] / amplitudes[0], 0.16);
    }

    /**
     * The Hill coefficient shared by all three repressions, varied as one parameter: at a = 2 the
     * symmetric state is x = 1 for every n, and g = -n/2, so the Hopf point is at n = 4 exactly.
     */
    @Test
    void sharedHillCoefficientVariesAsOneParameter() {
        HillNetwork ring = ring();
        int[] hill = ring.parameterGroup("hill");
        assertEquals(3, hill.length);
        double[] base = ring.defaultParameters();
        for (String gene : List.of("A", "B", "C")) {
            base[ring.parameterIndex(gene + ".max_rate")] = 2.0;
        }
        AnalysisPlan plan = new AnalysisPlan("hill", hill, 2.0, 6.0, 3.0, null, new int[0], 0, 0, 0, 1, 100, 10, 20,
                1);
        List<SpecialPoint> all = new CircuitAnalysis(ring, base, plan).diagram().stream()
                .flatMap(b -> b.specials().stream()).toList();
        assertEquals(1, all.size(), all.toString());
        assertEquals(SpecialPointType.HOPF, all.get(0).type());
        assertEquals(4.0, all.get(0).parameter(), 1e-8);
        assertEquals(Math.sqrt(3), all.get(0).frequency(), 1e-7);
    }

    /** Re of the complex pair at the symmetric steady state, from the closed form. */
    private static double realPartOfCriticalPair(double a) {
        double x = new BrentSolver(1e-14).solve(200, s -> s * (1 + Math.pow(s, 4)) - a, 0.1, 3.0);
        double g = -4 * Math.pow(x, 4) / (1 + Math.pow(x, 4));
        return -1 - g / 2;
    }

    /** Half the peak-to-peak range of species A on the settled cycle, started near its predicted size. */
    private static double simulatedHalfRange(HillNetwork ring, double a, double guess) {
        double[] p = ring.defaultParameters();
        for (String gene : List.of("A", "B", "C")) {
            p[ring.parameterIndex(gene + ".max_rate")] = a;
        }
        double[] work = new double[ring.reactionCount()];
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 3;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                double[] out = new double[3];
                ring.drift(y, p, out, work);
                return out;
            }
        };
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-8, 1.0, 1e-11, 1e-11);
        double[] y = {1.0 + guess, 1.0, 1.0};
        ODEStateAndDerivative settled = integrator.integrate(ode, new ODEState(0, y), 1500);
        double[] state = settled.getPrimaryState();
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        double t = settled.getTime();
        for (int step = 0; step < 4000; step++) {
            ODEStateAndDerivative next = integrator.integrate(ode, new ODEState(t, state), t + 0.005);
            state = next.getPrimaryState();
            t = next.getTime();
            low = Math.min(low, state[0]);
            high = Math.max(high, state[0]);
        }
        assertTrue(high > low);
        return (high - low) / 2;
    }
}
