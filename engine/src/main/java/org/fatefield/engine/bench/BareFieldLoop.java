package org.fatefield.engine.bench;

/**
 * The field stage's bare baseline: the explicit diffusion-decay update of a grid of the same
 * size, with the same sub-steps, on plain arrays (five-point stencil, seven-point with layers;
 * no-flux edges; no sources, cell exchange or workers), so that the field stage's overhead can be
 * read as a ratio.
 */
final class BareFieldLoop {

    private final int nx;
    private final int ny;
    private final int nz;
    private final double diffusionNumber;
    private final double decayFactor;
    private final int subSteps;
    private double[] c;
    private double[] next;

    BareFieldLoop(int nx, int ny, int nz, double diffusionNumber, double decayFactor, int subSteps) {
        this.nx = nx;
        this.ny = ny;
        this.nz = nz;
        this.diffusionNumber = diffusionNumber;
        this.decayFactor = decayFactor;
        this.subSteps = subSteps;
        this.c = new double[nx * ny * nz];
        this.next = new double[nx * ny * nz];
        for (int k = 0; k < c.length; k++) {
            c[k] = (k % 97) / 97.0;
        }
    }

    /** One step: {@code subSteps} explicit updates of the whole grid. */
    void step() {
        int layer = nx * ny;
        double centreWeight = nz > 1 ? 6.0 : 4.0;
        for (int s = 0; s < subSteps; s++) {
            for (int l = 0; l < nz; l++) {
                for (int j = 0; j < ny; j++) {
                    int row = l * layer + j * nx;
                    int down = j > 0 ? row - nx : row;
                    int up = j < ny - 1 ? row + nx : row;
                    int back = l > 0 ? row - layer : row;
                    int front = l < nz - 1 ? row + layer : row;
                    for (int i = 0; i < nx; i++) {
                        int k = row + i;
                        double centre = c[k];
                        double left = i > 0 ? c[k - 1] : centre;
                        double right = i < nx - 1 ? c[k + 1] : centre;
                        double depth = nz > 1 ? c[back + i] + c[front + i] : 0.0;
                        double laplacian = left + right + c[down + i] + c[up + i] + depth - centreWeight * centre;
                        next[k] = decayFactor * centre + diffusionNumber * laplacian;
                    }
                }
            }
            double[] swap = c;
            c = next;
            next = swap;
        }
    }

    /** A value depending on every square, so the work cannot be skipped. */
    double checksum() {
        double sum = 0;
        for (double v : c) {
            sum += v;
        }
        return sum;
    }
}
