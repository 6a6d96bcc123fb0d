package org.fatefield.engine.bench;

/**
 * The mechanics stage's bare baseline: the same overlap repulsion (speed rate * overlap along
 * the line of centres, shared equally, a square root only for overlapping pairs) over plain
 * position arrays and a neighbour list built once (each pair closer than 1.2 contact distances
 * at the start listed once, its force added to both cells), with no bucket rebuild, no cell
 * objects and no walls: a floor for the pair arithmetic a mechanics step cannot avoid.
 */
final class BareMechanicsLoop {

    private final double[] x;
    private final double[] y;
    private final double[] r;
    private final double[] fx;
    private final double[] fy;
    private final int[] start;
    private final int[] neighbours;
    private final double rate;

    BareMechanicsLoop(double[] x, double[] y, double[] r, double rate) {
        int n = x.length;
        this.x = x.clone();
        this.y = y.clone();
        this.r = r.clone();
        this.fx = new double[n];
        this.fy = new double[n];
        this.rate = rate;
        double largest = 0;
        double maxX = 0;
        double maxY = 0;
        for (int i = 0; i < n; i++) {
            largest = Math.max(largest, r[i]);
            maxX = Math.max(maxX, x[i]);
            maxY = Math.max(maxY, y[i]);
        }
        double side = 2.4 * Math.max(largest, 1e-9);
        int gx = (int) (maxX / side) + 1;
        int gy = (int) (maxY / side) + 1;
        int[] head = new int[gx * gy];
        int[] link = new int[n];
        java.util.Arrays.fill(head, -1);
        for (int i = 0; i < n; i++) {
            int b = (int) (y[i] / side) * gx + (int) (x[i] / side);
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
            for (int yy = Math.max(0, by - 1); yy <= Math.min(gy - 1, by + 1); yy++) {
                for (int xx = Math.max(0, bx - 1); xx <= Math.min(gx - 1, bx + 1); xx++) {
                    for (int k = head[yy * gx + xx]; k >= 0; k = link[k]) {
                        double dx = x[i] - x[k];
                        double dy = y[i] - y[k];
                        double reach = 1.2 * (r[i] + r[k]);
                        if (k > i && dx * dx + dy * dy < reach * reach) {
                            if (used == list.length) {
                                list = java.util.Arrays.copyOf(list, 2 * list.length);
                            }
                            list[used++] = k;
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
        for (int i = 0; i < n; i++) {
            for (int q = start[i]; q < start[i + 1]; q++) {
                int k = neighbours[q];
                double ex = x[i] - x[k];
                double ey = y[i] - y[k];
                double reach = r[i] + r[k];
                double d2 = ex * ex + ey * ey;
                if (d2 < reach * reach && d2 > 1e-24) {
                    double d = Math.sqrt(d2);
                    double push = rate * (reach - d) / d;
                    fx[i] += ex * push;
                    fy[i] += ey * push;
                    fx[k] -= ex * push;
                    fy[k] -= ey * push;
                }
            }
        }
        double step = 0.5 * dt;
        for (int i = 0; i < n; i++) {
            x[i] += step * fx[i];
            y[i] += step * fy[i];
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
