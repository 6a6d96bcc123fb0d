package org.fatefield.circuits.kinetics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Hill functions against their closed forms, including the step-function limit of a huge Hill
 * coefficient, where {@code (x / theta)^n} overflows: activation tends to 1 above theta and 0
 * below it, repression the reverse, and both slopes to 0 away from theta (from the definitions).
 */
class HillFunctionsTest {

    @Test
    void closedFormsAtOrdinaryCoefficients() {
        // x = 1, theta = 0.5, n = 4: r = 16, activation 16/17, slope n r / (x (1 + r)^2) = 64/289.
        assertEquals(16.0 / 17.0, HillFunctions.activation(1.0, 0.5, 4), 1e-15);
        assertEquals(1.0 / 17.0, HillFunctions.repression(1.0, 0.5, 4), 1e-15);
        assertEquals(64.0 / 289.0, HillFunctions.activationSlope(1.0, 0.5, 4), 1e-15);
        // A non-integer coefficient goes through Math.pow: r = 2^2.5.
        double r = Math.pow(2.0, 2.5);
        assertEquals(r / (1 + r), HillFunctions.activation(1.0, 0.5, 2.5), 1e-15);
    }

    @Test
    void hugeCoefficientsGiveTheStepNotNaN() {
        double n = 1e6;
        assertEquals(1.0, HillFunctions.activation(0.6, 0.5, n), 0.0);
        assertEquals(0.0, HillFunctions.activation(0.4, 0.5, n), 0.0);
        assertEquals(0.0, HillFunctions.repression(0.6, 0.5, n), 0.0);
        assertEquals(1.0, HillFunctions.repression(0.4, 0.5, n), 0.0);
        assertEquals(0.0, HillFunctions.activationSlope(0.6, 0.5, n), 0.0);
        assertEquals(0.0, HillFunctions.activationSlope(0.4, 0.5, n), 0.0);
        assertEquals(0.5, HillFunctions.activation(0.5, 0.5, n), 0.0);
    }
}
