package org.fatefield.circuits.analysis.continuation;

import java.util.Arrays;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;

/**
 * Normal-form coefficients that decide the criticality of a bifurcation of equilibria.
 *
 * <p>Formulas of Kuznetsov, Y. A. (2004), Elements of Applied Bifurcation Theory, 3rd ed.,
 * Springer: the first Lyapunov coefficient of a Hopf point (§3.5, eq. 3.20) and, at a simple
 * branch point, the quadratic coefficient {@code <p, B(q,q)>} and the cubic coefficient on the
 * centre manifold {@code <p, C(q,q,q) + 3 B(q, h2)>} with {@code A h2 = -B(q,q)} (§3.4 and §5.4,
 * the projection method). {@code A} is the Jacobian, {@code B} and {@code C} the second and third
 * derivatives of the right-hand side as multilinear forms; they are taken by central differences
 * of the analytic Jacobian (second derivatives to about 1e-8 relative, third to about 1e-6).
 */
public final class NormalFormCoefficients {

    private final ParametrisedSystem system;
    private final double[] x;
    private final double lambda;
    private final int n;
    private final double[][] a;

    private NormalFormCoefficients(ParametrisedSystem system, double[] x, double lambda) {
        this.system = system;
        this.x = x.clone();
        this.lambda = lambda;
        this.n = system.dimension();
        this.a = new double[n][n];
        system.jacobian(this.x, lambda, a);
    }

    /** Coefficients of {@code system} at the equilibrium {@code x} for parameter {@code lambda}. */
    public static NormalFormCoefficients at(ParametrisedSystem system, double[] x, double lambda) {
        return new NormalFormCoefficients(system, x, lambda);
    }

    /**
     * First Lyapunov coefficient at a Hopf point with critical eigenvalues {@code +-i omega}:
     * negative for a supercritical Hopf bifurcation (a stable cycle is born), positive for a
     * subcritical one. With {@code <q, q> = 1} and {@code <p, q> = 1} it equals
     * {@code Re c1 / omega}, c1 the cubic coefficient of the complex normal form.
     */
    public double firstLyapunov(double omega) {
        ComplexVector q = nullVector(a, omega, false).normalised();
        ComplexVector p = nullVector(a, omega, true);
        p = p.divideConjugate(p.dot(q));
        ComplexVector qBar = q.conjugate();
        ComplexVector cqqqBar = trilinear(q, q, qBar);
        ComplexVector bqqBar = bilinear(q, qBar);
        ComplexVector bqq = bilinear(q, q);
        // A^-1 B(q, conj q), as (0 i I - A)^-1 negated.
        ComplexVector inner1 = solveShifted(0.0, bqqBar).negated();
        ComplexVector inner2 = solveShifted(2 * omega, bqq);
        double[] sum = p.dot(cqqqBar);
        double[] second = p.dot(bilinear(q, inner1));
        double[] third = p.dot(bilinear(qBar, inner2));
        return (sum[0] - 2 * second[0] + third[0]) / (2 * omega);
    }

    /**
     * At a simple branch point (one zero eigenvalue): {@code {quadratic, cubic, pScale}} where
     * quadratic is {@code <p, B(q,q)>}, cubic is the centre-manifold coefficient
     * {@code <p, C(q,q,q) + 3 B(q,h2)>} (meaningful when quadratic vanishes, as at a Z2-symmetric
     * pitchfork; negative means supercritical) and pScale is {@code |p| |B(q,q)|}, the size the
     * quadratic coefficient is judged against.
     */
    public double[] branchPointCoefficients() {
        ComplexVector q = nullVector(a, 0.0, false).normalised();
        ComplexVector p = nullVector(a, 0.0, true);
        p = p.divideConjugate(p.dot(q));
        double[] qr = q.re;
        double[] pr = p.re;
        double[] bqq = realBilinear(qr, qr, x);
        double quadratic = dot(pr, bqq);
        double[] rhs = new double[n + 1];
        for (int i = 0; i < n; i++) {
            rhs[i] = -(bqq[i] - quadratic * qr[i]);
        }
        double[][] bordered = new double[n + 1][n + 1];
        for (int i = 0; i < n; i++) {
            System.arraycopy(a[i], 0, bordered[i], 0, n);
            bordered[i][n] = qr[i];
            bordered[n][i] = pr[i];
        }
        double[] h2 = new LUDecomposition(new Array2DRowRealMatrix(bordered, false)).getSolver()
                .solve(new ArrayRealVector(rhs, false)).toArray();
        double[] c = realTrilinear(qr, qr, qr);
        double[] b = realBilinear(qr, Arrays.copyOf(h2, n), x);
        double cubic = 0;
        for (int i = 0; i < n; i++) {
            cubic += pr[i] * (c[i] + 3 * b[i]);
        }
        return new double[] {quadratic, cubic, norm(pr) * norm(bqq)};
    }

    /** Null vector of {@code A - i omega I} (or of {@code A^T + i omega I} if transposed), from an SVD. */
    private ComplexVector nullVector(double[][] jac, double omega, boolean transposed) {
        int m = omega == 0.0 ? n : 2 * n;
        double[][] real = new double[m][m];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double v = transposed ? jac[j][i] : jac[i][j];
                real[i][j] = v;
                if (m > n) {
                    real[n + i][n + j] = v;
                }
            }
            if (m > n) {
                real[i][n + i] = transposed ? -omega : omega;
                real[n + i][i] = transposed ? omega : -omega;
            }
        }
        RealMatrix v = new SingularValueDecomposition(new Array2DRowRealMatrix(real, false)).getV();
        double[] column = v.getColumn(m - 1);
        double[] re = Arrays.copyOf(column, n);
        double[] im = m > n ? Arrays.copyOfRange(column, n, 2 * n) : new double[n];
        return new ComplexVector(re, im);
    }

    /** Solves {@code (i shift I - A) z = v} as a real system of twice the size. */
    private ComplexVector solveShifted(double shift, ComplexVector v) {
        double[][] m = new double[2 * n][2 * n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                m[i][j] = -a[i][j];
                m[n + i][n + j] = -a[i][j];
            }
            m[i][n + i] = -shift;
            m[n + i][i] = shift;
        }
        double[] rhs = new double[2 * n];
        System.arraycopy(v.re, 0, rhs, 0, n);
        System.arraycopy(v.im, 0, rhs, n, n);
        DecompositionSolver solver = new LUDecomposition(new Array2DRowRealMatrix(m, false)).getSolver();
        double[] z = solver.solve(new ArrayRealVector(rhs, false)).toArray();
        return new ComplexVector(Arrays.copyOf(z, n), Arrays.copyOfRange(z, n, 2 * n));
    }

    private ComplexVector bilinear(ComplexVector u, ComplexVector v) {
        double[] rr = realBilinear(u.re, v.re, x);
        double[] ii = realBilinear(u.im, v.im, x);
        double[] ri = realBilinear(u.re, v.im, x);
        double[] ir = realBilinear(u.im, v.re, x);
        double[] re = new double[n];
        double[] im = new double[n];
        for (int k = 0; k < n; k++) {
            re[k] = rr[k] - ii[k];
            im[k] = ri[k] + ir[k];
        }
        return new ComplexVector(re, im);
    }

    private ComplexVector trilinear(ComplexVector u, ComplexVector v, ComplexVector w) {
        double[] re = new double[n];
        double[] im = new double[n];
        double[][] us = {u.re, u.im};
        double[][] vs = {v.re, v.im};
        double[][] ws = {w.re, w.im};
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                for (int k = 0; k < 2; k++) {
                    // i^(i+j+k): 1, i, -1, -i
                    int power = i + j + k;
                    double[] term = realTrilinear(us[i], vs[j], ws[k]);
                    for (int s = 0; s < n; s++) {
                        switch (power) {
                            case 0 -> re[s] += term[s];
                            case 1 -> im[s] += term[s];
                            case 2 -> re[s] -= term[s];
                            default -> im[s] -= term[s];
                        }
                    }
                }
            }
        }
        return new ComplexVector(re, im);
    }

    /** {@code B(u, v)} at {@code base}: the derivative of {@code J v} along {@code u}, by central differences. */
    private double[] realBilinear(double[] u, double[] v, double[] base) {
        double un = norm(u);
        double[] out = new double[n];
        if (un == 0 || norm(v) == 0) {
            return out;
        }
        double h = 1e-4 * (1 + norm(base)) / un;
        double[][] up = jacobianAt(base, u, h);
        double[][] down = jacobianAt(base, u, -h);
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += (up[i][j] - down[i][j]) * v[j];
            }
            out[i] = s / (2 * h);
        }
        return out;
    }

    /** {@code C(u, v, w)}: the derivative of {@code B(u, v)} along {@code w}, by central differences. */
    private double[] realTrilinear(double[] u, double[] v, double[] w) {
        double wn = norm(w);
        double[] out = new double[n];
        if (wn == 0) {
            return out;
        }
        double h = 1e-3 * (1 + norm(x)) / wn;
        double[] plus = new double[n];
        double[] minus = new double[n];
        for (int i = 0; i < n; i++) {
            plus[i] = x[i] + h * w[i];
            minus[i] = x[i] - h * w[i];
        }
        double[] bp = realBilinear(u, v, plus);
        double[] bm = realBilinear(u, v, minus);
        for (int i = 0; i < n; i++) {
            out[i] = (bp[i] - bm[i]) / (2 * h);
        }
        return out;
    }

    private double[][] jacobianAt(double[] base, double[] direction, double h) {
        double[] shifted = new double[n];
        for (int i = 0; i < n; i++) {
            shifted[i] = base[i] + h * direction[i];
        }
        double[][] out = new double[n][n];
        system.jacobian(shifted, lambda, out);
        return out;
    }

    private static double dot(double[] u, double[] v) {
        double s = 0;
        for (int i = 0; i < u.length; i++) {
            s += u[i] * v[i];
        }
        return s;
    }

    private static double norm(double[] v) {
        return Math.sqrt(dot(v, v));
    }

    /** A complex vector as real and imaginary parts. */
    private record ComplexVector(double[] re, double[] im) {

        ComplexVector negated() {
            double[] r = new double[re.length];
            double[] m = new double[re.length];
            for (int i = 0; i < re.length; i++) {
                r[i] = -re[i];
                m[i] = -im[i];
            }
            return new ComplexVector(r, m);
        }

        ComplexVector conjugate() {
            double[] negated = new double[im.length];
            for (int i = 0; i < im.length; i++) {
                negated[i] = -im[i];
            }
            return new ComplexVector(re, negated);
        }

        /** {@code <this, v> = sum conj(this_i) v_i} as {re, im}. */
        double[] dot(ComplexVector v) {
            double sr = 0;
            double si = 0;
            for (int i = 0; i < re.length; i++) {
                sr += re[i] * v.re[i] + im[i] * v.im[i];
                si += re[i] * v.im[i] - im[i] * v.re[i];
            }
            return new double[] {sr, si};
        }

        ComplexVector normalised() {
            double s = Math.sqrt(dot(this)[0]);
            double[] r = new double[re.length];
            double[] m = new double[re.length];
            for (int i = 0; i < re.length; i++) {
                r[i] = re[i] / s;
                m[i] = im[i] / s;
            }
            return new ComplexVector(r, m);
        }

        /** This vector divided by the conjugate of {@code s}, so that {@code <result, q> = 1} when {@code s = <this, q>}. */
        ComplexVector divideConjugate(double[] s) {
            double cr = s[0];
            double ci = -s[1];
            double d = cr * cr + ci * ci;
            double[] r = new double[re.length];
            double[] m = new double[re.length];
            for (int i = 0; i < re.length; i++) {
                // (re + i im) / (cr + i ci)
                r[i] = (re[i] * cr + im[i] * ci) / d;
                m[i] = (im[i] * cr - re[i] * ci) / d;
            }
            return new ComplexVector(r, m);
        }
    }
}
