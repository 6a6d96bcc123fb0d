package org.fatefield.engine.field;

import java.util.Arrays;

/**
 * The synthesis rate per grid square of a field: each source region's rate times its amplitude
 * at a time, weighted by the share of the square it covers, plus an inflow at the left wall
 * (spread over the first column's width). On a grid with layers, every layer gets the same map:
 * sources and the wall extend through the whole depth.
 */
final class SynthesisMap {

    private SynthesisMap() {
    }

    /** Fills {@code synthesis} (nx x ny x nz, x fastest) for {@code spec} at time {@code t} (h). */
    static void fill(double[] synthesis, MorphogenSpec spec, int nx, int ny, int nz, double t) {
        double h = spec.gridSpacing();
        int layer = nx * ny;
        Arrays.fill(synthesis, 0, layer, 0.0);
        if (spec.leftWall().kind() == MorphogenSpec.WallKind.FLUX) {
            for (int j = 0; j < ny; j++) {
                synthesis[j * nx] += spec.leftWall().value() / h;
            }
        }
        for (SourceRegion source : spec.sources()) {
            double rate = source.rate() * source.amplitude().at(t);
            int i0 = Math.max(0, (int) Math.floor(source.x0() / h));
            int i1 = Math.min(nx - 1, (int) Math.floor(source.x1() / h));
            int j0 = Math.max(0, (int) Math.floor(source.y0() / h));
            int j1 = Math.min(ny - 1, (int) Math.floor(source.y1() / h));
            for (int j = j0; j <= j1; j++) {
                for (int i = i0; i <= i1; i++) {
                    synthesis[j * nx + i] += rate * source.coverage(i * h, j * h, h);
                }
            }
        }
        // Every layer is the same map: computed once, copied to the rest.
        for (int l = 1; l < nz; l++) {
            System.arraycopy(synthesis, 0, synthesis, l * layer, layer);
        }
    }
}
