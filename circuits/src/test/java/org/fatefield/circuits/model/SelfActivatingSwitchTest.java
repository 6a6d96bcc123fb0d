package org.fatefield.circuits.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SelfActivatingSwitchTest {

    private static final GeneKinetics GENE = new GeneKinetics(0.1, 1.3, 0.5, 4, 1.0, 0.5, 4, 1.0);

    @Test
    void jacobianMatchesCentralFiniteDifferences() {
        // Central differences have error O(h^2) (common practice); h = 1e-6 gives ~1e-9 here.
        SelfActivatingSwitch circuit = SelfActivatingSwitch.of("A", "B", GENE,
                new GeneKinetics(0.05, 0.9, 0.7, 2.5, 1.4, 0.4, 3, 0.8));
        double[] p = circuit.defaultParameters();
        double[][] points = {{0.3, 0.8}, {1.2, 0.05}, {0.5, 0.5}, {2.0, 1.7}};
        double h = 1e-6;
        for (double[] x : points) {
            double[][] jac = new double[2][2];
            circuit.jacobian(x, p, jac);
            for (int k = 0; k < 2; k++) {
                double[] up = x.clone();
                double[] down = x.clone();
                up[k] += h;
                down[k] -= h;
                double[] fUp = circuit.drift(up, p);
                double[] fDown = circuit.drift(down, p);
                for (int i = 0; i < 2; i++) {
                    assertEquals((fUp[i] - fDown[i]) / (2 * h), jac[i][k], 1e-7, "d f" + i + "/d x" + k);
                }
            }
        }
    }

    @Test
    void driftEqualsStoichiometryTimesPropensities() {
        SelfActivatingSwitch circuit = SelfActivatingSwitch.symmetric("A", "B", GENE);
        double[] p = circuit.defaultParameters();
        double[] x = {0.7, 0.2};
        double[] a = new double[4];
        circuit.propensities(x, p, a);
        double[] f = circuit.drift(x, p);
        assertEquals(a[0] - a[1], f[0], 1e-15);
        assertEquals(a[2] - a[3], f[1], 1e-15);
        // Hand evaluation of the first production term (definition of the Hill functions).
        double expected = 0.1 + 1.3 * Math.pow(0.7 / 0.5, 4) / (1 + Math.pow(0.7 / 0.5, 4))
                + 1.0 / (1 + Math.pow(0.2 / 0.5, 4));
        assertEquals(expected, a[0], 1e-14);
    }

    @Test
    void parameterNamesAreQualifiedByGene() {
        SelfActivatingSwitch circuit = SelfActivatingSwitch.symmetric("Up", "Down", GENE);
        assertEquals(16, circuit.parameterNames().size());
        assertEquals(9, circuit.parameterIndex("Down.self_activation"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> circuit.parameterIndex("Up.speed"));
        assertTrue(e.getMessage().contains("Up.speed"));
    }

    @Test
    void badKineticsAreRejectedWithTheFieldName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new GeneKinetics(0.1, 1, 0.5, 4, 1, 0.5, 4, -1));
        assertTrue(e.getMessage().contains("degradation"), e.getMessage());
        assertTrue(e.getMessage().contains("-1"), e.getMessage());
    }
}
