package org.fatefield.engine.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.junit.jupiter.api.Test;

/**
 * The explicit morphogen solver against the synthesis-diffusion-degradation steady state.
 * A one-row domain makes the problem one-dimensional: synthesis s on [0, w], no-flux walls at
 * 0 and L. Solving D c'' - k c + s 1[x &lt; w] = 0 piecewise (derived here; standard, e.g. Crank
 * 1975, The Mathematics of Diffusion, ch. 14) gives, with lambda = sqrt(D / k),
 * c = s/k (1 - sinh((L - w)/lambda) cosh(x/lambda) / sinh(L/lambda)) for x &lt; w and
 * c = s/k sinh(w/lambda) cosh((L - x)/lambda) / sinh(L/lambda) for x &gt; w: the cosh form,
 * exponential with decay length lambda far from the far wall.
 */
class MorphogenFieldTest {

    private static final double D = 100.0;
    private static final double K = 1.0;
    private static final double S = 1.0;
    private static final double W = 20.0;

    private static double analytic(double x, double length) {
        double lambda = Math.sqrt(D / K);
        if (x < W) {
            return S / K * (1 - Math.sinh((length - W) / lambda) * Math.cosh(x / lambda) / Math.sinh(length / lambda));
        }
        return S / K * Math.sinh(W / lambda) * Math.cosh((length - x) / lambda) / Math.sinh(length / lambda);
    }

    private static MorphogenField relaxed(double length, double h, double hours) {
        return relaxed(length, h, hours, MorphogenSpec.Solver.EXPLICIT, 0.05);
    }

    private static MorphogenField relaxed(double length, double h, double hours, MorphogenSpec.Solver solver,
            double dt) {
        MorphogenSpec spec = MorphogenSpec.of(D, K, h, 0.0, List.of(new SourceRegion(0, 0, W, h, S)))
                .withSolver(solver);
        MorphogenField field = new MorphogenField(spec, length, h, false);
        for (int i = 0; i < Math.round(hours / dt); i++) {
            field.advance(dt);
        }
        return field;
    }

    @Test
    void steadyStateMatchesTheCoshSolutionWithinOnePercent() {
        double length = 60.0;
        double h = 0.5;
        MorphogenField field = relaxed(length, h, 40.0);
        for (int i = 0; i < field.columns(); i++) {
            double x = (i + 0.5) * h;
            double expected = analytic(x, length);
            assertEquals(expected, field.value(i, 0), 0.01 * expected, "x = " + x);
        }
    }

    @Test
    void longDomainDecaysExponentiallyWithLengthSqrtDOverK() {
        double length = 200.0;
        double h = 0.5;
        MorphogenField field = relaxed(length, h, 40.0);
        double lambda = Math.sqrt(D / K);
        // Between 2 and 6 decay lengths beyond the source the far wall is negligible (e^-30).
        int a = (int) ((W + 2 * lambda) / h);
        int b = (int) ((W + 6 * lambda) / h);
        double fitted = (b - a) * h / Math.log(field.value(a, 0) / field.value(b, 0));
        assertEquals(lambda, fitted, 0.01 * lambda);
    }

    @Test
    void steadyStateEqualsTheDiscreteSolutionOfTheGridEquations() {
        double length = 60.0;
        double h = 1.0;
        MorphogenField field = relaxed(length, h, 60.0);
        int n = field.columns();
        // The grid equations: D (c[i-1] - 2 c[i] + c[i+1]) / h^2 - k c[i] + s[i] = 0, mirrored at the walls.
        RealMatrix a = new Array2DRowRealMatrix(n, n);
        RealVector rhs = new ArrayRealVector(n);
        double g = D / (h * h);
        for (int i = 0; i < n; i++) {
            int left = Math.max(i - 1, 0);
            int right = Math.min(i + 1, n - 1);
            a.addToEntry(i, left, g);
            a.addToEntry(i, right, g);
            a.addToEntry(i, i, -2 * g - K);
            rhs.setEntry(i, (i + 0.5) * h < W ? -S : 0.0);
        }
        RealVector exact = new LUDecomposition(a).getSolver().solve(rhs);
        for (int i = 0; i < n; i++) {
            assertEquals(exact.getEntry(i), field.value(i, 0), 1e-10 * Math.max(1.0, exact.getEntry(i)), "i = " + i);
        }
    }

    @Test
    void adiReachesTheSameGridSteadyStateWithHugeSteps() {
        // The ADI fixed point satisfies the five-point grid equations exactly, whatever the step;
        // 2 h steps are 800 times the explicit limit here.
        MorphogenField explicit = relaxed(60.0, 1.0, 60.0);
        MorphogenField adi = relaxed(60.0, 1.0, 200.0, MorphogenSpec.Solver.ADI, 2.0);
        for (int i = 0; i < explicit.columns(); i++) {
            assertEquals(explicit.value(i, 0), adi.value(i, 0), 1e-10 * Math.max(1.0, explicit.value(i, 0)),
                    "i = " + i);
            double x = (i + 0.5);
            assertEquals(analytic(x, 60.0), adi.value(i, 0), 0.01 * analytic(x, 60.0) + 1e-12);
        }
    }

    @Test
    void adiAndExplicitAgreeInTimeOnATwoDimensionalSource() {
        // ADI against the explicit reference at small steps: after 0.5 h with dt = 0.001 h the
        // first-order error of the explicit scheme dominates, and both agree to 0.1% of the peak.
        MorphogenSpec explicitSpec = MorphogenSpec.of(400.0, 0.5, 5.0, 0.0, List.of(new SourceRegion(0, 20, 25, 60,
                4.0))).withSolver(MorphogenSpec.Solver.EXPLICIT);
        MorphogenSpec adiSpec = MorphogenSpec.of(400.0, 0.5, 5.0, 0.0, List.of(new SourceRegion(0, 20, 25, 60, 4.0)))
                .withSolver(MorphogenSpec.Solver.ADI);
        MorphogenField a = new MorphogenField(explicitSpec, 200, 100, false);
        MorphogenField b = new MorphogenField(adiSpec, 200, 100, false);
        for (int i = 0; i < 500; i++) {
            a.advance(0.001);
            b.advance(0.001);
        }
        double peak = a.max();
        assertTrue(peak > 0.5);
        for (int j = 0; j < a.rows(); j++) {
            for (int i = 0; i < a.columns(); i++) {
                assertEquals(a.value(i, j), b.value(i, j), 1e-3 * peak);
            }
        }
    }

    @Test
    void subStepsKeepEveryStepUnderTheStabilityLimit() {
        // Von Neumann limit of the 2D explicit scheme: dt <= 2 / (k + 8 D / h^2) (Morton & Mayers 2005).
        MorphogenSpec spec = MorphogenSpec.of(3600.0, 0.5, 10.0, 0.0, List.of());
        MorphogenField field = new MorphogenField(spec, 100, 100, false);
        assertEquals(2.0 / (0.5 + 8 * 3600.0 / 100.0), field.stableStepLimit(), 1e-15);
        double dt = 0.1;
        assertTrue(dt / field.subStepsFor(dt) <= 0.9 * field.stableStepLimit());
    }

    @Test
    void explicitStepsBeyondTheLimitWouldGrowButSubSteppingStaysBounded() {
        MorphogenSpec spec = MorphogenSpec.of(3600.0, 0.5, 10.0, 0.0, List.of(new SourceRegion(0, 0, 20, 100, 5)));
        MorphogenField field = new MorphogenField(spec, 200, 100, false);
        for (int i = 0; i < 1000; i++) {
            field.advance(0.1);
        }
        // Bounded by the source with no diffusion loss: s / k.
        assertTrue(field.max() <= 5 / 0.5 + 1e-9, "max " + field.max());
        assertTrue(field.max() > 0.1);
    }
}
