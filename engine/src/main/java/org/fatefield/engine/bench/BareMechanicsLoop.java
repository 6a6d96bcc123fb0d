package org.fatefield.engine.bench;

/**
 * The mechanics stage's bare baseline: the same overlap repulsion (speed rate * overlap along
 * the line of centres, shared equally, a square root only for overlapping pairs) over plain
 * position arrays and a neighbour list built once (each pair closer than 1.2 contact distances
 * at the start listed once, its force added to both cells), with no bucket rebuild, no cell
 * objects and no walls: a floor for the pair arithmetic a mechanics step cannot avoid. With z
 * coordinates the same in three dimensions (cube buckets, spheres).
 */
final class BareMechanicsLoop {

    private final double[] x;
    private final double[] y;
    /** z positions, all 0 in two dimensions. */
    private final double[] z;
    private final double[] fz;
    private final boolean threeD;
    private final double[] r;
    private final double[] fx;
    private final double[] fy;
    private final int[] start;
    private final int[] neighbours;
    private final double rate;

    BareMechanicsLoop(double[] x, double[] y, double[] z, double[] r, double rate) {
        int n = x.length;
        this.x = x.clone();
        this.y = y.clone();
        this.threeD = z != null;
        this.z = threeD ? z.clone() : new double[n];
        this.fz = new double[n];
        this.r = r.clone();
        this.fx = new double[n];
        this.fy = new double[n];
        this.rate = rate;
        double largest = 0;
        double maxX = 0;
        double maxY = 0;
        double maxZ = 0;
        for (int i = 0; i < n; i++) {
            largest = Math.max(largest, r[i]);
            maxX = Math.max(maxX, x[i]);
            maxY = Math.max(maxY, y[i]);
            maxZ = Math.max(maxZ, this.z[i]);
        }
        double side = 2.4 * Math.max(largest, 1e-9);
        int gx = (int) (maxX / side) + 1;
        int gy = (int) (maxY / side) + 1;
        int gz = (int) (maxZ / side) + 1;
        int[] head = new int[gx * gy * gz];
        int[] link = new int[n];
        java.util.Arrays.fill(head, -1);
        for (int i = 0; i < n; i++) {
            int b = ((int) (this.z[i] / side) * gy + (int) (y[i] / side)) * gx + (int) (x[i] / side);
            link[i] = head[b];
            head[b] = i;
        }
        start = new int[n + 1];
        int[] list = new int[Math.max(16, 16 * n)];
        int used = 0;
        for (int i = 0; i < n; i++) {
            start[i] = used;
            int bx = (int) (x[i] / side);
            int by = (int) (y[i] / side);
            int bz = (int) (this.z[i] / side);
            for (int zz = Math.max(0, bz - 1); zz <= Math.min(gz - 1, bz + 1); zz++) {
                for (int yy = Math.max(0, by - 1); yy <= Math.min(gy - 1, by + 1); yy++) {
                    for (int xx = Math.max(0, bx - 1); xx <= Math.min(gx - 1, bx + 1); xx++) {
                        for (int k = head[(zz * gy + yy) * gx + xx]; k >= 0; k = link[k]) {
                            double dx = x[i] - x[k];
                            double dy = y[i] - y[k];
                            double dz = this.z[i] - this.z[k];
                            double reach = 1.2 * (r[i] + r[k]);
                            if (k > i && dx * dx + dy * dy + dz * dz < reach * reach) {
                                if (used == list.length) {
                                    list = java.util.Arrays.copyOf(list, 2 * list.length);
                                }
                                list[used++] = k;
                            }
                        }
                    }
                }
            }
        }
        start[n] = used;
        neighbours = java.util.Arrays.copyOf(list, used);
    }

    /** One overdamped step of {@code dt}: forces from the current positions, then every move. */
    void step(double dt) {
        int n = x.length;
        java.util.Arrays.fill(fx, 0.0);
        java.util.Arrays.fill(fy, 0.0);
        java.util.Arrays.fill(fz, 0.0);
        for (int i = 0; i < n; i++) {
            for (int q = start[i]; q < start[i + 1]; q++) {
                int k = neighbours[q];
                double ex = x[i] - x[k];
                double ey = y[i] - y[k];
                double ez = threeD ? z[i] - z[k] : 0.0;
                double reach = r[i] + r[k];
                double d2 = ex * ex + ey * ey + ez * ez;
                if (d2 < reach * reach && d2 > 1e-24) {
                    double d = Math.sqrt(d2);
                    double push = rate * (reach - d) / d;
                    fx[i] += ex * push;
                    fy[i] += ey * push;
                    fz[i] += ez * push;
                    fx[k] -= ex * push;
                    fy[k] -= ey * push;
                    fz[k] -= ez * push;
                }
            }
        }
        double step = 0.5 * dt;
        for (int i = 0; i < n; i++) {
            x[i] += step * fx[i];
            y[i] += step * fy[i];
            z[i] += step * fz[i];
        }
    }

    /** Candidate pairs in the list per cell, each pair counted once (the tissue's search sees more). */
    double candidatesPerCell() {
        return x.length == 0 ? 0 : (double) neighbours.length / x.length;
    }

    /** A value depending on every position, so the work cannot be skipped. */
    double checksum() {
        double sum = 0;
        for (int i = 0; i < x.length; i++) {
            sum += x[i] + y[i];
        }
        return sum;
    }
}
