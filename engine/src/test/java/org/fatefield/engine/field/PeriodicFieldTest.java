package org.fatefield.engine.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Fields on a strip (periodic along y) against Fourier analysis. On a periodic grid of spacing h
 * the mode {@code sin(k y)}, {@code k = 2 pi / H}, is an exact eigenvector of the five-point
 * Laplacian with eigenvalue {@code -s / h^2}, {@code s = 2 - 2 cos(k h)} (von Neumann analysis;
 * Morton &amp; Mayers 2005, Numerical Solution of PDEs, 2nd ed., ch. 2), so with no decay or
 * source its amplitude is multiplied by exactly {@code 1 - D tau s / h^2} per explicit sub-step
 * and {@code (1 - r s) / (1 + r s)}, {@code r = D dt / (2 h^2)}, per Peaceman-Rachford step,
 * and tends to the continuum's {@code exp(-D k^2 t)} as h shrinks; the mean never changes. A
 * wrong seam would break the eigenvector and these identities.
 */
class PeriodicFieldTest {

    private static final double D = 400.0;
    private static final double H = 100.0;
    private static final double SPACING = 5.0;
    private static final double K = 2 * Math.PI / H;

    private static MorphogenField strip(MorphogenSpec.Solver solver) {
        MorphogenField field = new MorphogenField(MorphogenSpec.of(D, 0.0, SPACING, 0.0, List.of()).withSolver(solver),
                50, H, true);
        field.fill((x, y) -> 1.0 + 0.5 * Math.sin(K * y));
        return field;
    }

    /** Amplitude of the sin(k y) mode in column 3, by projection; and the column's mean. */
    private static double[] modeAndMean(MorphogenField field) {
        double amplitude = 0;
        double mean = 0;
        int rows = field.rows();
        for (int j = 0; j < rows; j++) {
            double y = (j + 0.5) * SPACING;
            amplitude += 2.0 / rows * field.value(3, j) * Math.sin(K * y);
            mean += field.value(3, j) / rows;
        }
        return new double[] {amplitude, mean};
    }

    @Test
    void explicitSchemeDampsTheModeByItsAmplificationFactor() {
        MorphogenField field = strip(MorphogenSpec.Solver.EXPLICIT);
        double dt = 0.01;
        int substeps = field.subStepsFor(dt);
        double tau = dt / substeps;
        double s = 2 - 2 * Math.cos(K * SPACING);
        for (int n = 0; n < 50; n++) {
            field.advance(dt);
        }
        double[] m = modeAndMean(field);
        double expected = 0.5 * Math.pow(1 - D * tau * s / (SPACING * SPACING), 50.0 * substeps);
        assertEquals(expected, m[0], 1e-12);
        assertEquals(1.0, m[1], 1e-12);
        // The continuum: the grid's rate D s / h^2 is within 1% of D k^2 at k h = 0.31.
        assertEquals(0.5 * Math.exp(-D * K * K * 0.5), m[0], 0.015 * m[0]);
    }

    @Test
    void adiDampsTheModeByTheCrankNicolsonFactor() {
        MorphogenField field = strip(MorphogenSpec.Solver.ADI);
        double dt = 0.05;
        double r = D * dt / (2 * SPACING * SPACING);
        double s = 2 - 2 * Math.cos(K * SPACING);
        for (int n = 0; n < 10; n++) {
            field.advance(dt);
        }
        double[] m = modeAndMean(field);
        assertEquals(0.5 * Math.pow((1 - r * s) / (1 + r * s), 10), m[0], 1e-12);
        assertEquals(1.0, m[1], 1e-12);
        assertEquals(0.5 * Math.exp(-D * K * K * 0.5), m[0], 0.015 * m[0]);
    }

    @Test
    void samplingInterpolatesAcrossTheSeam() {
        MorphogenField field = strip(MorphogenSpec.Solver.EXPLICIT);
        int last = field.rows() - 1;
        assertEquals(0.5 * (field.value(3, 0) + field.value(3, last)), field.sample(17.5, 0.0), 1e-12);
        assertEquals(0.5 * (field.value(3, 0) + field.value(3, last)), field.sample(17.5, H - 1e-9), 1e-9);
    }

    @Test
    void aStripMustHoldWholeGridSquares() {
        MorphogenSpec spec = MorphogenSpec.of(D, 0.0, SPACING, 0.0, List.of())
                .withSolver(MorphogenSpec.Solver.EXPLICIT);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new MorphogenField(spec, 50, 102, true));
        assertEquals(true, e.getMessage().contains("whole number of grid squares"), e.getMessage());
    }
}
