package org.fatefield.circuits.analysis.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Criticality coefficients on systems already in normal form, where they can be read off: the
 * Hopf normal form w' = (mu + i omega) w + a w |w|^2 has first Lyapunov coefficient 2 a / omega
 * (Kuznetsov, Y. A. 2004, Elements of Applied Bifurcation Theory, 3rd ed., §3.5: l1 = Re c1 /
 * omega; with the eigenvector normalised to |q| = 1, w = x + i y is sqrt(2) times the normal-form
 * coordinate z, so c1 = 2 a), and the
 * pitchfork x' = r x + c x^3 reduced to its centre manifold has cubic coefficient 6 c (Kuznetsov
 * 2004, §5.4; the factor 6 is the third derivative of c x^3).
 */
class NormalFormCoefficientsTest {

    /** x' = -omega y + a x (x^2 + y^2), y' = omega x + a y (x^2 + y^2) at mu = 0. */
    private static ParametrisedSystem hopfNormalForm(double omega, double a) {
        return new ParametrisedSystem() {
            @Override
            public int dimension() {
                return 2;
            }

            @Override
            public void value(double[] s, double mu, double[] out) {
                double r2 = s[0] * s[0] + s[1] * s[1];
                out[0] = mu * s[0] - omega * s[1] + a * s[0] * r2;
                out[1] = omega * s[0] + mu * s[1] + a * s[1] * r2;
            }

            @Override
            public void jacobian(double[] s, double mu, double[][] out) {
                double x = s[0];
                double y = s[1];
                out[0][0] = mu + a * (3 * x * x + y * y);
                out[0][1] = -omega + 2 * a * x * y;
                out[1][0] = omega + 2 * a * x * y;
                out[1][1] = mu + a * (x * x + 3 * y * y);
            }
        };
    }

    @Test
    void firstLyapunovCoefficientOfTheHopfNormalForm() {
        for (double[] c : new double[][] {{1.0, -1.0}, {2.0, -0.5}, {0.7, 3.0}}) {
            double omega = c[0];
            double a = c[1];
            double l1 = NormalFormCoefficients.at(hopfNormalForm(omega, a), new double[] {0, 0}, 0.0)
                    .firstLyapunov(omega);
            assertEquals(2 * a / omega, l1, 1e-6 * Math.abs(a / omega), "omega " + omega + ", a " + a);
        }
    }

    @Test
    void cubicCoefficientOfTheScalarPitchfork() {
        ParametrisedSystem pitchfork = new ScalarSystem((x, r) -> r * x - x * x * x, (x, r) -> r - 3 * x * x);
        double[] k = NormalFormCoefficients.at(pitchfork, new double[] {0}, 0.0).branchPointCoefficients();
        assertEquals(0.0, k[0], 1e-9);
        assertEquals(-6.0, k[1], 1e-5);
    }

    /**
     * x' = r x - x^3 + x y, y' = -y + 2 x^2: the fast variable follows y = 2 x^2 on the centre
     * manifold, so the reduced equation is x' = r x + x^3 (subcritical) although the x equation
     * alone has -x^3. The coefficient 6 checks the correction term 3 B(q, h2).
     */
    @Test
    void cubicCoefficientIncludesTheCentreManifold() {
        ParametrisedSystem system = new ParametrisedSystem() {
            @Override
            public int dimension() {
                return 2;
            }

            @Override
            public void value(double[] s, double r, double[] out) {
                out[0] = r * s[0] - s[0] * s[0] * s[0] + s[0] * s[1];
                out[1] = -s[1] + 2 * s[0] * s[0];
            }

            @Override
            public void jacobian(double[] s, double r, double[][] out) {
                out[0][0] = r - 3 * s[0] * s[0] + s[1];
                out[0][1] = s[0];
                out[1][0] = 4 * s[0];
                out[1][1] = -1;
            }
        };
        double[] k = NormalFormCoefficients.at(system, new double[] {0, 0}, 0.0).branchPointCoefficients();
        assertEquals(0.0, k[0], 1e-8);
        assertEquals(6.0, k[1], 1e-5);
    }
}
