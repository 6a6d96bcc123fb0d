package org.fatefield.circuits.analysis;

import org.fatefield.circuits.model.ReactionNetwork;

/**
 * The stationary distribution of the chemical Langevin dynamics of a one- or two-species circuit,
 * solved on a grid rather than sampled, so that wells separated by rare switches get their right
 * relative depth.
 *
 * <p>The Fokker-Planck operator with drift {@code f = N a} and diffusion
 * {@code D_ii = sum_j nu_ij^2 a_j / (2 Omega)} is approximated by a Markov chain on the grid
 * (Kushner &amp; Dupuis 2001, Numerical Methods for Stochastic Control Problems in Continuous
 * Time, 2nd ed., Springer, ch. 5) whose jump rates to the neighbours are exponentially fitted,
 * {@code (D / h^2) B(-+f h / D)} with the Bernoulli function {@code B(z) = z / (e^z - 1)}
 * (Scharfetter &amp; Gummel 1969, IEEE Trans. Electron Devices 16:64): every probability stays
 * positive and the ratio of opposite rates is exactly {@code exp(f h / D)}, so the stationary
 * density follows {@code exp(int f / D)} without the artificial diffusion of plain upwinding. Its
 * stationary master equation is solved directly, within the generator's band, by the
 * subtraction-free state reduction of Grassmann, Taksar &amp; Heyman (1985, Operations Research
 * 33:1107-1116), which keeps full relative accuracy however small the probabilities across a
 * barrier (plain Gaussian elimination lost it: mirror-image wells drifted apart as the grid was
 * refined). Walls are
 * reflecting. Cross-diffusion between the two axes is ignored, which is exact when no reaction
 * changes both species (as in the built-in switch).
 */
public final class StationaryFokkerPlanck {

    private StationaryFokkerPlanck() {
    }

    /**
     * Stationary landscape {@code U = -ln(P / P_max)} over {@code [lower, upper]} with
     * {@code bins} cells per axis; {@code ySpecies = -1} for a one-species circuit.
     *
     * @throws IllegalArgumentException if the circuit has species off the axes
     */
    public static QuasiPotential solve(ReactionNetwork network, double[] params, double systemSize, int xSpecies,
            int ySpecies, double[] lower, double[] upper, int bins) {
        int dims = ySpecies < 0 ? 1 : 2;
        if (network.speciesCount() != dims) {
            throw new IllegalArgumentException("the grid solution needs every species on an axis: the circuit has "
                    + network.speciesCount() + " species, the landscape " + dims + " axes; use sampling instead");
        }
        int nx = bins;
        int ny = dims == 2 ? bins : 1;
        double hx = (upper[0] - lower[0]) / nx;
        double hy = dims == 2 ? (upper[1] - lower[1]) / ny : 1;
        int size = nx * ny;
        int band = nx;
        // Banded storage of the jump rates Q: rate from r to c at matrix[r][c - r + band].
        double[][] matrix = new double[size][2 * band + 1];
        double[] x = new double[network.speciesCount()];
        double[] a = new double[network.reactionCount()];
        double[] f = new double[network.speciesCount()];
        int[] species = dims == 2 ? new int[] {xSpecies, ySpecies} : new int[] {xSpecies};
        double[] h = {hx, hy};
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int cell = j * nx + i;
                x[xSpecies] = lower[0] + (i + 0.5) * hx;
                if (dims == 2) {
                    x[ySpecies] = lower[1] + (j + 0.5) * hy;
                }
                network.propensities(x, params, a);
                network.drift(x, params, f, new double[a.length]);
                for (int d = 0; d < dims; d++) {
                    int s = species[d];
                    double diffusion = 0;
                    for (int r = 0; r < a.length; r++) {
                        int nu = network.stoichiometry(r, s);
                        diffusion += nu * nu * Math.max(a[r], 0) / (2 * systemSize);
                    }
                    double hd = h[d];
                    int step = d == 0 ? 1 : nx;
                    boolean hasUp = d == 0 ? i + 1 < nx : j + 1 < ny;
                    boolean hasDown = d == 0 ? i > 0 : j > 0;
                    double peclet = diffusion > 0 ? f[s] * hd / diffusion : 0;
                    double up = diffusion > 0 ? diffusion / (hd * hd) * bernoulli(-peclet) : Math.max(0, f[s]) / hd;
                    double down = diffusion > 0 ? diffusion / (hd * hd) * bernoulli(peclet) : Math.max(0, -f[s]) / hd;
                    if (hasUp) {
                        add(matrix, cell, cell + step, up, band);
                    }
                    if (hasDown) {
                        add(matrix, cell, cell - step, down, band);
                    }
                }
            }
        }
        double[] p = stateReduction(matrix, band);
        long[][] counts = new long[ny][nx];
        double[][] u = new double[ny][nx];
        double max = 0;
        for (double v : p) {
            max = Math.max(max, v);
        }
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                double v = Math.max(p[j * nx + i], 0);
                u[j][i] = v > 0 ? -Math.log(v / max) : Double.POSITIVE_INFINITY;
            }
        }
        double[] xs = new double[nx];
        for (int i = 0; i < nx; i++) {
            xs[i] = lower[0] + (i + 0.5) * hx;
        }
        double[] ys = new double[ny];
        for (int j = 0; j < ny && dims == 2; j++) {
            ys[j] = lower[1] + (j + 0.5) * hy;
        }
        return new QuasiPotential(xs, ys, counts, u);
    }

    /** B(z) = z / (e^z - 1), with B(0) = 1. */
    private static double bernoulli(double z) {
        return Math.abs(z) < 1e-10 ? 1.0 - z / 2 : z / Math.expm1(z);
    }

    private static void add(double[][] matrix, int row, int column, double value, int band) {
        matrix[row][column - row + band] += value;
    }

    /**
     * Stationary distribution (unnormalised) of the chain with banded jump rates {@code q}
     * (modified in place) by GTH state reduction: states are censored out from the last down,
     * each step using only additions, multiplications and divisions of positive numbers. Fill-in
     * stays inside the band. The back pass rescales whenever values grow large, so states far
     * less likely than the most likely one underflow to zero instead of overflowing the rest.
     */
    private static double[] stateReduction(double[][] q, int band) {
        int n = q.length;
        for (int k = n - 1; k > 0; k--) {
            int lo = Math.max(0, k - band);
            double out = 0;
            for (int j = lo; j < k; j++) {
                out += q[k][j - k + band];
            }
            if (!(out > 0)) {
                throw new IllegalArgumentException("the landscape cannot be solved on this grid: from grid cell " + k
                        + " no probability flows back (the noise is too weak there for the grid spacing, as at a very"
                        + " large system size, or the diffusion vanishes); lower --system-size or raise --grid");
            }
            for (int i = lo; i < k; i++) {
                double toK = q[i][k - i + band] / out;
                if (toK == 0) {
                    continue;
                }
                for (int j = lo; j < k; j++) {
                    if (j != i) {
                        q[i][j - i + band] += toK * q[k][j - k + band];
                    }
                }
                q[i][k - i + band] = toK;
            }
        }
        double[] x = new double[n];
        x[0] = 1;
        for (int k = 1; k < n; k++) {
            double sum = 0;
            for (int i = Math.max(0, k - band); i < k; i++) {
                sum += x[i] * q[i][k - i + band];
            }
            x[k] = sum;
            if (sum > 1e200) {
                for (int i = 0; i <= k; i++) {
                    x[i] /= sum;
                }
            }
        }
        return x;
    }
}
