package org.fatefield.circuits.analysis.continuation;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;


/**
 * The Bratu problem u'' + lambda e^u = 0, u(0) = u(1) = 0, by central finite differences with N
 * interior points. Its fold: 8/e for N = 1 and 9/e for N = 2 (solved by hand from the grid
 * equations), converging to lambda* = 3.513830719 of the continuous problem (Bratu 1914; Gelfand
 * 1963; value as commonly tabulated, e.g. Mohsen 2014, Comput. Math. Appl. 68:1008, from memory).
 */
class BratuTest {

    private static ParametrisedSystem bratu(int points) {
        double h2 = 1.0 / ((points + 1.0) * (points + 1.0));
        return new ParametrisedSystem() {
            @Override
            public int dimension() {
                return points;
            }

            @Override
            public void value(double[] u, double lambda, double[] out) {
                for (int i = 0; i < points; i++) {
                    double left = i > 0 ? u[i - 1] : 0;
                    double right = i < points - 1 ? u[i + 1] : 0;
                    out[i] = (left - 2 * u[i] + right) / h2 + lambda * Math.exp(u[i]);
                }
            }

            @Override
            public void jacobian(double[] u, double lambda, double[][] out) {
                for (int i = 0; i < points; i++) {
                    Arrays.fill(out[i], 0.0);
                    out[i][i] = -2 / h2 + lambda * Math.exp(u[i]);
                    if (i > 0) {
                        out[i][i - 1] = 1 / h2;
                    }
                    if (i < points - 1) {
                        out[i][i + 1] = 1 / h2;
                    }
                }
            }

            @Override
            public void parameterDerivative(double[] u, double lambda, double[] out) {
                for (int i = 0; i < points; i++) {
                    out[i] = Math.exp(u[i]);
                }
            }
        };
    }

    private static double fold(int points) {
        ContinuationSettings settings = new ContinuationSettings(0.02, 1e-9, 0.2, 3000, 1e-12);
        List<Branch> branches = EquilibriumContinuation.of(bratu(points), settings)
                .diagram(new double[points], 0.0, -0.5, 10.0, false, 0);
        return branches.get(0).specials().stream().filter(s -> s.type() == SpecialPointType.SADDLE_NODE)
                .mapToDouble(SpecialPoint::parameter).findFirst().orElseThrow();
    }

    @Test
    void foldsOfTheSmallGridsAreExact() {
        assertEquals(8 / Math.E, fold(1), 1e-9);
        assertEquals(9 / Math.E, fold(2), 1e-9);
    }

    @Test
    void foldConvergesAtSecondOrderToTheContinuousValue() {
        double exact = 3.513830719;
        double coarse = fold(19);
        double fine = fold(39);
        double errorCoarse = Math.abs(coarse - exact);
        double errorFine = Math.abs(fine - exact);
        // Halving h should divide the error by about 4 for a second-order scheme.
        assertEquals(4.0, errorCoarse / errorFine, 0.4);
        double extrapolated = (4 * fine - coarse) / 3;
        assertEquals(exact, extrapolated, 2e-5);
        assertTrue(errorFine < 2e-3);
    }
}
