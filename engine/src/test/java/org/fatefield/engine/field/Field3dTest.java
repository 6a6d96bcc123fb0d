package org.fatefield.engine.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.fatefield.engine.parallel.BlockParallel;
import org.junit.jupiter.api.Test;

/**
 * Three-dimensional fields against Fourier analysis. On a cell-centred grid with mirrored
 * (no-flux) walls the product of cosines {@code cos(pi p (i + 1/2) / nx) cos(pi m (j + 1/2) / ny)
 * cos(pi n (l + 1/2) / nz)} is an exact eigenvector of the seven-point Laplacian with eigenvalue
 * {@code -4 (sx + sy + sz) / h^2}, {@code s = sin^2(theta / 2)}, {@code theta_x = pi p / nx}
 * (von Neumann analysis; Morton &amp; Mayers 2005, Numerical Solution of Partial Differential
 * Equations, 2nd ed., Cambridge, ch. 2-3). So one forward-Euler step multiplies it by exactly
 * {@code 1 - k tau - 4 r (sx + sy + sz)}, {@code r = D tau / h^2}, and one Douglas ADI step by
 * {@code (1 - a - b - c + ab + bc + ca + abc) / ((1 + a)(1 + b)(1 + c))} with
 * {@code a = 2 r sx + k tau / 2}, {@code b = 2 r sy}, {@code c = 2 r sz} (Douglas 1962,
 * Numerische Mathematik 4:41-63). The explicit scheme's limit in three dimensions is
 * {@code tau <= h^2 / (6 D)} without decay (Morton &amp; Mayers 2005).
 */
class Field3dTest {

    private static final double D = 50.0;
    private static final double K = 0.2;
    private static final double H = 2.0;
    private static final int NX = 8;
    private static final int NY = 6;
    private static final int NZ = 5;

    private static MorphogenField box(MorphogenSpec.Solver solver, double decay, boolean periodicY) {
        MorphogenSpec spec = MorphogenSpec.of(D, decay, H, 0.0, List.of()).withSolver(solver);
        return new MorphogenField(spec, NX * H, NY * H, NZ * H, periodicY);
    }

    /** Fills the (p, m, n) mode; along a periodic y the mode is cos(2 pi m (j + 1/2) / ny). */
    private static void fillMode(MorphogenField field, int p, int m, int n, boolean periodicY) {
        double ky = periodicY ? 2 * Math.PI * m / (NY * H) : Math.PI * m / (NY * H);
        field.fill((x, y, z) -> Math.cos(Math.PI * p * x / (NX * H)) * Math.cos(ky * y)
                * Math.cos(Math.PI * n * z / (NZ * H)));
    }

    /** Largest |value / expected - factor| over squares where the mode is not near zero. */
    private static double worstFactorError(MorphogenField field, int p, int m, int n, boolean periodicY,
            double factor) {
        double ky = periodicY ? 2 * Math.PI * m / (NY * H) : Math.PI * m / (NY * H);
        double worst = 0;
        for (int l = 0; l < NZ; l++) {
            for (int j = 0; j < NY; j++) {
                for (int i = 0; i < NX; i++) {
                    double mode = Math.cos(Math.PI * p * (i + 0.5) / NX) * Math.cos(ky * (j + 0.5) * H)
                            * Math.cos(Math.PI * n * (l + 0.5) / NZ);
                    if (Math.abs(mode) > 0.05) {
                        worst = Math.max(worst, Math.abs(field.value(i, j, l) / mode - factor));
                    }
                }
            }
        }
        return worst;
    }

    private static double sin2(double theta) {
        double s = Math.sin(0.5 * theta);
        return s * s;
    }

    @Test
    void explicitStepMultipliesAModeByItsAmplificationFactor() {
        MorphogenField field = box(MorphogenSpec.Solver.EXPLICIT, K, false);
        fillMode(field, 3, 2, 1, false);
        double tau = 0.5 * field.stableStepLimit();
        try (BlockParallel pool = new BlockParallel(2)) {
            field.explicitStep(tau, pool);
        }
        double r = D * tau / (H * H);
        double factor = 1 - K * tau - 4 * r * (sin2(Math.PI * 3 / NX) + sin2(Math.PI * 2 / NY) + sin2(Math.PI / NZ));
        assertEquals(0.0, worstFactorError(field, 3, 2, 1, false, factor), 1e-12);
    }

    @Test
    void douglasStepMultipliesAModeByItsAmplificationFactorAtAnyStep() {
        for (boolean periodic : new boolean[] {false, true}) {
            MorphogenField field = box(MorphogenSpec.Solver.ADI, K, periodic);
            fillMode(field, 2, periodic ? 1 : 3, 4, periodic);
            double dt = 40 * field.stableStepLimit();
            field.advance(dt);
            double r = D * dt / (H * H);
            double thetaY = periodic ? 2 * Math.PI / NY : Math.PI * 3 / NY;
            double a = 2 * r * sin2(Math.PI * 2 / NX) + 0.5 * K * dt;
            double b = 2 * r * sin2(thetaY);
            double c = 2 * r * sin2(Math.PI * 4 / NZ);
            double factor = (1 - a - b - c + a * b + b * c + c * a + a * b * c) / ((1 + a) * (1 + b) * (1 + c));
            assertTrue(Math.abs(factor) < 1, "unconditionally stable: |G| = " + Math.abs(factor));
            assertEquals(0.0, worstFactorError(field, 2, periodic ? 1 : 3, 4, periodic, factor), 1e-12,
                    "periodic y: " + periodic);
        }
    }

    /**
     * On a cell-centred grid of n squares the highest mode has {@code theta = pi (n - 1) / n},
     * not pi, so the discrete limit lies a little above {@code h^2 / (6 D)}; with n = 32 it is
     * 0.24% above, so 0.98 of the limit must damp that mode and 1.02 must amplify it.
     */
    @Test
    void explicitLimitIsTheThreeDimensionalOneAndTheHighestModeGrowsPastIt() {
        int n = 32;
        MorphogenSpec spec = MorphogenSpec.of(D, 0.0, H, 0.0, List.of());
        MorphogenField field = new MorphogenField(spec, n * H, n * H, n * H, false);
        assertEquals(H * H / (6 * D), field.stableStepLimit(), 1e-15);
        double theta = Math.PI * (n - 1) / n;
        for (double multiple : new double[] {0.98, 1.02}) {
            field.fill((x, y, z) -> Math.cos(theta * x / H) * Math.cos(theta * y / H) * Math.cos(theta * z / H));
            double before = field.value(0, 0, 0);
            try (BlockParallel pool = new BlockParallel(1)) {
                field.explicitStep(multiple * field.stableStepLimit(), pool);
            }
            double factor = 1 - 4 * (multiple / 6) * 3 * sin2(theta);
            assertEquals(factor, field.value(0, 0, 0) / before, 1e-12);
            assertEquals(factor, field.value(n - 1, 5, 17) / Math.pow(Math.cos(theta * (n - 0.5)), 1)
                    / Math.cos(theta * 5.5) / Math.cos(theta * 17.5), 1e-9);
            assertEquals(multiple < 1, Math.abs(factor) < 1, "|G| = " + Math.abs(factor) + " at " + multiple);
        }
        // advance() sub-steps under the limit, so the same step is stable through it.
        assertEquals(2, field.subStepsFor(1.02 * field.stableStepLimit()));
    }

    @Test
    void aFieldUniformInDepthFollowsTheFlatFieldExactly() {
        MorphogenSpec spec = MorphogenSpec.of(D, K, H, 0.5, List.of(new SourceRegion(0, 0, 4, 12, 3.0)))
                .withLeftWall(new MorphogenSpec.WallCondition(MorphogenSpec.WallKind.FIXED_VALUE, 2.0));
        MorphogenField flat = new MorphogenField(spec, NX * H, NY * H, false);
        MorphogenField deep = new MorphogenField(spec, NX * H, NY * H, NZ * H, false);
        // 0.01 h is under both the flat limit (0.020 h) and the 3-D one (0.013 h): one sub-step each.
        assertEquals(1, deep.subStepsFor(0.01));
        for (int s = 0; s < 100; s++) {
            flat.advance(0.01);
            deep.advance(0.01);
        }
        for (int l = 0; l < NZ; l++) {
            for (int j = 0; j < NY; j++) {
                for (int i = 0; i < NX; i++) {
                    assertEquals(flat.value(i, j), deep.value(i, j, l), 1e-12);
                }
            }
        }
    }

    /**
     * The steady gradient from a held wall, {@code c0 cosh((L - x) / lambda) / cosh(L / lambda)}
     * with {@code lambda = sqrt(D / k)} and no flux at x = L (the textbook solution of
     * {@code D c'' = k c}); both solvers reach it to the grid's second-order error.
     */
    @Test
    void bothSolversReachTheAnalyticSteadyGradientInABox() {
        double width = 200;
        double lambda = 40;
        double decay = 1.0;
        MorphogenSpec base = MorphogenSpec.of(lambda * lambda * decay, decay, 5.0, 0.0, List.of())
                .withLeftWall(new MorphogenSpec.WallCondition(MorphogenSpec.WallKind.FIXED_VALUE, 1.0));
        for (MorphogenSpec.Solver solver : MorphogenSpec.Solver.values()) {
            MorphogenField field = new MorphogenField(base.withSolver(solver), width, 20, 15, false);
            for (int s = 0; s < 400; s++) {
                field.advance(0.05);
            }
            for (int i = 0; i < field.columns(); i++) {
                double x = (i + 0.5) * 5.0;
                double exact = Math.cosh((width - x) / lambda) / Math.cosh(width / lambda);
                assertEquals(exact, field.value(i, 2, 1), 0.004, solver + " at x = " + x);
            }
        }
    }

    @Test
    void trilinearSamplingIsExactForALinearProfile() {
        MorphogenField field = box(MorphogenSpec.Solver.EXPLICIT, 0.0, false);
        field.fill((x, y, z) -> 1 + 0.5 * x - 0.25 * y + 2 * z);
        assertEquals(1 + 0.5 * 5.3 - 0.25 * 7.1 + 2 * 4.4, field.sample(5.3, 7.1, 4.4), 1e-12);
        // The depth mean at (x, y) of a flat sample.
        assertEquals(1 + 0.5 * 5.3 - 0.25 * 7.1 + 2 * (NZ * H / 2), field.sample(5.3, 7.1), 1e-12);
        assertEquals(NZ, field.layers());
    }

    @Test
    void anOversizedGridIsRefusedWithTheLimit() {
        MorphogenSpec spec = MorphogenSpec.of(D, K, 1.0, 0.0, List.of());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new MorphogenField(spec, 1000, 1000, 100, false));
        assertTrue(e.getMessage().contains("raise the grid spacing"), e.getMessage());
    }
}
