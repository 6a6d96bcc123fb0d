package org.fatefield.engine.field;

/**
 * Bilinear interpolation on one layer of a cell-centred grid (x fastest): between the four
 * nearest square centres, held constant beyond the outermost centres, wrapped across a periodic
 * y. The field's sampling on the hot path of the cell loop; static so that it inlines.
 */
final class GridInterpolation {

    private GridInterpolation() {
    }

    /** The value at (x, y) µm of the layer of {@code c} starting at index {@code base}. */
    static double layer(double[] c, int base, int nx, int ny, double h, boolean periodicY, double x, double y) {
        double gx = x / h - 0.5;
        double gy = y / h - 0.5;
        int i0 = (int) Math.floor(gx);
        int j0 = (int) Math.floor(gy);
        double fx = gx - i0;
        double fy = gy - j0;
        int ia = clamp(i0, nx);
        int ib = clamp(i0 + 1, nx);
        int ja = periodicY ? Math.floorMod(j0, ny) : clamp(j0, ny);
        int jb = periodicY ? Math.floorMod(j0 + 1, ny) : clamp(j0 + 1, ny);
        double bottom = c[base + ja * nx + ia] * (1 - fx) + c[base + ja * nx + ib] * fx;
        double top = c[base + jb * nx + ia] * (1 - fx) + c[base + jb * nx + ib] * fx;
        return bottom * (1 - fy) + top * fy;
    }

    /** {@code index} brought into [0, size). */
    static int clamp(int index, int size) {
        return index < 0 ? 0 : (index >= size ? size - 1 : index);
    }
}
