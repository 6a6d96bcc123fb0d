package org.fatefield.engine.field;

/**
 * One forward-time, centred-space step of {@code dc/dt = D lap(c) - k c + s} on a cell-centred
 * grid, for a block of rows: the five-point Laplacian on a flat grid, the seven-point one on a
 * grid with layers. No-flux walls mirror the edge square; a fixed value at the left wall enters
 * through the ghost square {@code 2 wall - c_0}; a periodic y wraps. Each row reads only the
 * previous buffer, so rows can be split among workers in any way and give the same result.
 * Morton &amp; Mayers (2005), Numerical Solution of Partial Differential Equations, 2nd ed.,
 * Cambridge, ch. 2-3.
 *
 * @param nx              squares along x
 * @param ny              squares along y
 * @param nz              layers along z (1 for a flat grid)
 * @param diffusionNumber {@code D tau / h^2}
 * @param decayFactor     {@code 1 - k tau}
 * @param tau             the step (h)
 * @param periodicY       true if y wraps around
 * @param leftFixed       true if the left wall holds {@code wall}
 * @param wall            the concentration held at the left wall
 */
record ExplicitScheme(int nx, int ny, int nz, double diffusionNumber, double decayFactor, double tau,
        boolean periodicY, boolean leftFixed, double wall) {

    /**
     * Writes rows {@code [fromRow, toRow)} of {@code out} from {@code c}; a row is one y index of
     * one layer, numbered {@code layer * ny + j}. Cell terms are skipped when {@code cellSource}
     * is null.
     */
    void rows(double[] c, double[] out, double[] synthesis, double[] cellSource, double[] cellUptake, int fromRow,
            int toRow) {
        if (nz == 1) {
            flatRows(c, out, synthesis, cellSource, cellUptake, fromRow, toRow);
            return;
        }
        int layer = nx * ny;
        for (int row = fromRow; row < toRow; row++) {
            int l = row / ny;
            int j = row - l * ny;
            int start = row * nx;
            int down = j > 0 ? start - nx : periodicY ? start + (ny - 1) * nx : start;
            int up = j < ny - 1 ? start + nx : periodicY ? start - (ny - 1) * nx : start;
            int back = l > 0 ? start - layer : start;
            int front = l < nz - 1 ? start + layer : start;
            for (int i = 0; i < nx; i++) {
                int k = start + i;
                double centre = c[k];
                double left = i > 0 ? c[k - 1] : leftFixed ? 2 * wall - centre : centre;
                double right = i < nx - 1 ? c[k + 1] : centre;
                double laplacian = left + right + c[down + i] + c[up + i] + c[back + i] + c[front + i] - 6.0 * centre;
                double cells = cellSource == null ? 0.0 : cellSource[k] - cellUptake[k] * centre;
                out[k] = decayFactor * centre + diffusionNumber * laplacian + tau * (synthesis[k] + cells);
            }
        }
    }

    /** The five-point update of rows {@code [fromRow, toRow)} of a flat grid. */
    private void flatRows(double[] c, double[] out, double[] synthesis, double[] cellSource, double[] cellUptake,
            int fromRow, int toRow) {
        for (int j = fromRow; j < toRow; j++) {
            int row = j * nx;
            int down = j > 0 ? row - nx : periodicY ? (ny - 1) * nx : row;
            int up = j < ny - 1 ? row + nx : periodicY ? 0 : row;
            for (int i = 0; i < nx; i++) {
                int k = row + i;
                double centre = c[k];
                double left = i > 0 ? c[k - 1] : leftFixed ? 2 * wall - centre : centre;
                double right = i < nx - 1 ? c[k + 1] : centre;
                double laplacian = left + right + c[down + i] + c[up + i] - 4.0 * centre;
                double cells = cellSource == null ? 0.0 : cellSource[k] - cellUptake[k] * centre;
                out[k] = decayFactor * centre + diffusionNumber * laplacian + tau * (synthesis[k] + cells);
            }
        }
    }
}
