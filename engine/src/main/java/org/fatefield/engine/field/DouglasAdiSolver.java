package org.fatefield.engine.field;

import org.fatefield.engine.parallel.BlockParallel;

/**
 * The Douglas alternating-direction implicit scheme for {@code dc/dt = D lap(c) - k c + s} on a
 * cell-centred 3-D grid with no-flux walls (Douglas 1962, Numerische Mathematik 4:41-63; Douglas
 * &amp; Gunn 1964, Numerische Mathematik 6:428-453): with {@code A_x = D tau delta_x^2 / h^2 -
 * k tau} and {@code A_y}, {@code A_z} the pure diffusion terms,
 * <pre>
 *   (1 - A_x / 2) c1 = (1 + A_x / 2 + A_y + A_z) c + tau s
 *   (1 - A_y / 2) c2 = c1 - (A_y / 2) c
 *   (1 - A_z / 2) c' = c2 - (A_z / 2) c
 * </pre>
 * each a set of independent tridiagonal systems (Thomas algorithm; cyclic along a periodic y).
 * Peaceman-Rachford is not stable in three dimensions; this scheme is, unconditionally, and is
 * second order in time. Its amplification factor for a Fourier mode with
 * {@code a, b, c = 2 D tau / h^2 sin^2(theta / 2)} per direction (a plus {@code k tau / 2}) is
 * {@code (1 - a - b - c + ab + bc + ca + abc) / ((1 + a)(1 + b)(1 + c))}, and its fixed point
 * is exactly the steady state of the seven-point grid equations. Cell secretion and uptake are
 * explicit in the first stage; a fixed value at the left wall enters through a mirrored ghost
 * square ({@code 2 wall - c_0}).
 */
final class DouglasAdiSolver {

    private final int nx;
    private final int ny;
    private final int nz;
    private final double diffusion;
    private final double decay;
    private final double h;
    private final double[] stage;
    private final double[][] scratch;
    private final boolean periodicY;

    DouglasAdiSolver(int nx, int ny, int nz, double diffusion, double decay, double h, int workers,
            boolean periodicY) {
        this.nx = nx;
        this.ny = ny;
        this.nz = nz;
        this.diffusion = diffusion;
        this.decay = decay;
        this.h = h;
        this.periodicY = periodicY;
        this.stage = new double[nx * ny * nz];
        this.scratch = new double[workers][4 * Math.max(nx, Math.max(ny, nz))];
    }

    /** Workers this solver has scratch space for. */
    int workers() {
        return scratch.length;
    }

    /** Advances {@code c} (x fastest, then y, then z) by {@code tau} hours in place. */
    void step(double[] c, double[] synthesis, double[] cellSource, double[] cellUptake, double tau, BlockParallel pool,
            boolean leftFixed, double wall) {
        double r = tau * diffusion / (h * h);
        double half = 0.5 * r;
        double q = 0.5 * tau * decay;
        int layer = nx * ny;
        // Stage 1: implicit along x (with half the decay), everything else explicit.
        pool.forEach(ny * nz, (from, to, worker) -> {
            double[] work = scratch[worker];
            for (int row = from; row < to; row++) {
                int l = row / ny;
                int j = row - l * ny;
                int start = row * nx;
                for (int i = 0; i < nx; i++) {
                    int k = start + i;
                    double centre = c[k];
                    double left = i > 0 ? c[k - 1] : leftFixed ? 2 * wall - centre : centre;
                    double right = i < nx - 1 ? c[k + 1] : centre;
                    double xx = left - 2 * centre + right;
                    double yy = neighbourY(c, k, j, -1) - 2 * centre + neighbourY(c, k, j, 1);
                    double zz = (l > 0 ? c[k - layer] : centre) - 2 * centre + (l < nz - 1 ? c[k + layer] : centre);
                    double cells = cellSource == null ? 0.0 : cellSource[k] - cellUptake[k] * centre;
                    work[2 * nx + i] = centre + half * xx - q * centre + r * (yy + zz) + tau * (synthesis[k] + cells);
                }
                if (leftFixed) {
                    work[2 * nx] += 2 * half * wall;
                }
                AdiSolver.solve(work, nx, half, q, stage, start, 1, leftFixed ? 2 * half : 0);
            }
        });
        // Stage 2: implicit along y, correcting the explicit y term of stage 1.
        pool.forEach(nx * nz, (from, to, worker) -> {
            double[] work = scratch[worker];
            for (int line = from; line < to; line++) {
                int l = line / nx;
                int i = line - l * nx;
                int start = l * layer + i;
                for (int j = 0; j < ny; j++) {
                    int k = start + j * nx;
                    double yy = neighbourY(c, k, j, -1) - 2 * c[k] + neighbourY(c, k, j, 1);
                    work[2 * ny + j] = stage[k] - half * yy;
                }
                if (periodicY) {
                    AdiSolver.solveCyclic(work, ny, half, 0, stage, start, nx);
                } else {
                    AdiSolver.solve(work, ny, half, 0, stage, start, nx, 0);
                }
            }
        });
        // Stage 3: implicit along z, correcting the explicit z term; the result replaces c.
        pool.forEach(layer, (from, to, worker) -> {
            double[] work = scratch[worker];
            for (int k0 = from; k0 < to; k0++) {
                for (int l = 0; l < nz; l++) {
                    int k = k0 + l * layer;
                    double zz = (l > 0 ? c[k - layer] : c[k]) - 2 * c[k] + (l < nz - 1 ? c[k + layer] : c[k]);
                    work[2 * nz + l] = stage[k] - half * zz;
                }
                AdiSolver.solve(work, nz, half, 0, c, k0, layer, 0);
            }
        });
    }

    /** The value next to square {@code k} (row {@code j}) along y in direction {@code dir}: mirrored or wrapped. */
    private double neighbourY(double[] c, int k, int j, int dir) {
        if (dir < 0) {
            return j > 0 ? c[k - nx] : periodicY ? c[k + (ny - 1) * nx] : c[k];
        }
        return j < ny - 1 ? c[k + nx] : periodicY ? c[k - (ny - 1) * nx] : c[k];
    }
}
