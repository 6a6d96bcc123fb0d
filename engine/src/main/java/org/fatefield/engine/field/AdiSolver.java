package org.fatefield.engine.field;

import org.fatefield.engine.parallel.BlockParallel;

/**
 * The Peaceman-Rachford alternating-direction implicit scheme for
 * {@code dc/dt = D lap(c) - k c + s} on a cell-centred grid with no-flux walls: a half step
 * implicit along x and explicit along y, then the reverse, each a set of independent tridiagonal
 * systems (Thomas algorithm). Unconditionally stable and second order in time; its fixed point is
 * exactly the steady state of the five-point grid equations. Decay and synthesis are shared
 * equally between the half steps. Along a periodic y the implicit systems are cyclic tridiagonal,
 * solved by the Sherman-Morrison correction of the Thomas algorithm (Press, Teukolsky,
 * Vetterling &amp; Flannery 2007, Numerical Recipes, 3rd ed., section 2.7.2). Peaceman &amp; Rachford (1955), J. Soc. Indust. Appl. Math.
 * 3:28-41; Morton &amp; Mayers (2005), Numerical Solution of Partial Differential Equations, 2nd
 * ed., section 3.8.
 */
final class AdiSolver {

    private final int nx;
    private final int ny;
    private final double diffusion;
    private final double decay;
    private final double h;
    private final double[] half;
    private final double[][] scratch;
    private final boolean periodicY;

    AdiSolver(int nx, int ny, double diffusion, double decay, double h, int workers, boolean periodicY) {
        this.periodicY = periodicY;
        this.nx = nx;
        this.ny = ny;
        this.diffusion = diffusion;
        this.decay = decay;
        this.h = h;
        this.half = new double[nx * ny];
        int longest = Math.max(nx, ny);
        this.scratch = new double[workers][4 * longest];
    }

    /**
     * Advances {@code c} (row-major, x fastest) by {@code tau} in place. Cell secretion and uptake
     * ({@code cellSource}, {@code cellUptake}, both null when cells exchange nothing) are treated
     * explicitly in each half step; a fixed value at the left wall enters through a
     * mirrored ghost square ({@code 2 wall - c_0}).
     */
    void step(double[] c, double[] synthesis, double[] cellSource, double[] cellUptake, double tau, BlockParallel pool,
            boolean leftFixed, double wall) {
        double r = 0.5 * tau * diffusion / (h * h);
        double q = 0.25 * tau * decay;
        // Half step 1: implicit in x, explicit in y.
        pool.forEach(ny, (from, to, worker) -> {
            double[] work = scratch[worker];
            for (int j = from; j < to; j++) {
                int row = j * nx;
                for (int i = 0; i < nx; i++) {
                    int k = row + i;
                    double down = j > 0 ? c[k - nx] : periodicY ? c[k + (ny - 1) * nx] : c[k];
                    double up = j < ny - 1 ? c[k + nx] : periodicY ? c[i] : c[k];
                    double cells = cellSource == null ? 0.0 : cellSource[k] - cellUptake[k] * c[k];
                    work[2 * nx + i] = c[k] + r * (down - 2 * c[k] + up) - q * c[k] + 0.5 * tau * (synthesis[k] + cells);
                }
                if (leftFixed) {
                    work[2 * nx] += 2 * r * wall;
                }
                solve(work, nx, r, q, half, row, 1, leftFixed ? 2 * r : 0);
            }
        });
        // Half step 2: implicit in y, explicit in x.
        pool.forEach(nx, (from, to, worker) -> {
            double[] work = scratch[worker];
            for (int i = from; i < to; i++) {
                for (int j = 0; j < ny; j++) {
                    int k = j * nx + i;
                    double left = i > 0 ? half[k - 1] : leftFixed ? 2 * wall - half[k] : half[k];
                    double right = i < nx - 1 ? half[k + 1] : half[k];
                    double cells = cellSource == null ? 0.0 : cellSource[k] - cellUptake[k] * half[k];
                    work[2 * ny + j] = half[k] + r * (left - 2 * half[k] + right) - q * half[k]
                            + 0.5 * tau * (synthesis[k] + cells);
                }
                if (periodicY) {
                    solveCyclic(work, ny, r, q, c, i, nx);
                } else {
                    solve(work, ny, r, q, c, i, nx, 0);
                }
            }
        });
    }

    /**
     * Solves {@code (1 + q) x_m - r (x_(m-1) - 2 x_m + x_(m+1)) = d_m} with mirrored ends (Thomas
     * algorithm), {@code firstExtra} added to the first diagonal entry (a fixed-value wall);
     * {@code d} sits in {@code work[2n..3n)}, the result goes to {@code out[offset + m * stride]}.
     */
    static void solve(double[] work, int n, double r, double q, double[] out, int offset, int stride,
            double firstExtra) {
        if (n == 1) {
            out[offset] = work[2] / (1 + q + firstExtra);
            return;
        }
        // work[0..n): modified super-diagonal; work[n..2n): modified right-hand side.
        double diagonal = 1 + q + r + firstExtra;
        work[0] = -r / diagonal;
        work[n] = work[2 * n] / diagonal;
        for (int m = 1; m < n; m++) {
            double b = 1 + q + (m == n - 1 ? r : 2 * r);
            double denominator = b + r * work[m - 1];
            work[m] = -r / denominator;
            work[n + m] = (work[2 * n + m] + r * work[n + m - 1]) / denominator;
        }
        double x = work[2 * n - 1];
        out[offset + (n - 1) * stride] = x;
        for (int m = n - 2; m >= 0; m--) {
            x = work[n + m] - work[m] * x;
            out[offset + m * stride] = x;
        }
    }

    /**
     * Solves {@code (1 + q) x_m - r (x_(m-1) - 2 x_m + x_(m+1)) = d_m} with periodic ends
     * ({@code x_(-1) = x_(n-1)}, {@code x_n = x_0}), n at least 3: the cyclic matrix is a
     * tridiagonal T plus the rank-one {@code u v^T}, so {@code x = y - (v.y / (1 + v.z)) z} with
     * {@code T y = d} and {@code T z = u}. {@code d} sits in {@code work[2n..3n)}, the result goes
     * to {@code out[offset + m * stride]}.
     */
    static void solveCyclic(double[] work, int n, double r, double q, double[] out, int offset, int stride) {
        double b = 1 + q + 2 * r;
        double gamma = -b;
        double corner = -r;
        double first = b - gamma;
        double last = b - corner * corner / gamma;
        // work[0..n): modified super-diagonal; [n..2n): y; [3n..4n): z.
        work[0] = -r / first;
        work[n] = work[2 * n] / first;
        work[3 * n] = gamma / first;
        for (int m = 1; m < n; m++) {
            double denominator = (m == n - 1 ? last : b) + r * work[m - 1];
            work[m] = -r / denominator;
            work[n + m] = (work[2 * n + m] + r * work[n + m - 1]) / denominator;
            work[3 * n + m] = ((m == n - 1 ? corner : 0.0) + r * work[3 * n + m - 1]) / denominator;
        }
        for (int m = n - 2; m >= 0; m--) {
            work[n + m] -= work[m] * work[n + m + 1];
            work[3 * n + m] -= work[m] * work[3 * n + m + 1];
        }
        double factor = (work[n] + corner * work[2 * n - 1] / gamma)
                / (1 + work[3 * n] + corner * work[4 * n - 1] / gamma);
        for (int m = 0; m < n; m++) {
            out[offset + m * stride] = work[n + m] - factor * work[3 * n + m];
        }
    }
}
