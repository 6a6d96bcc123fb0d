package org.fatefield.engine.mechanics;

import java.util.Arrays;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellPopulation;
import org.fatefield.engine.parallel.BlockParallel;

/**
 * Overdamped relaxation of overlapping discs inside a rectangle with walls, the disc inscribed
 * in it, or a strip periodic along y (walls at x = 0 and x = width only).
 *
 * <p>Each overlapping pair pushes apart along the line of centres with speed
 * {@code rate * overlap} shared equally; with adhesion, neighbours a little beyond contact pull
 * together with speed {@code adhesion * gap}; walls hold every disc inside the domain. Forces come
 * from a snapshot of positions (so the result does not depend on the order cells are visited)
 * and neighbours from a uniform bucket grid of side one largest diameter, so a step costs time
 * linear in the number of cells.
 */
public final class OverlapRepulsion {

    private final double width;
    private final double height;
    private final double rate;
    private final double newbornRadius;
    private final double adhesion;
    private final double adhesionRange;
    private final DomainShape shape;
    private double[] px = new double[0];
    private double[] py = new double[0];
    private double[] pr = new double[0];
    private int[] bucketStart = new int[0];
    private int[] bucketCells = new int[0];
    private int[] bucketOfCell = new int[0];
    private int[] bucketFill = new int[0];

    /**
     * @param width         domain width (µm)
     * @param height        domain height (µm)
     * @param rate          relaxation rate (1 / h): speed per µm of overlap, at least 0
     * @param newbornRadius radius of a cell of volume 1 in µm (a cell of volume V has radius sqrt(V) times it)
     */
    public OverlapRepulsion(double width, double height, double rate, double newbornRadius) {
        this(width, height, rate, newbornRadius, 0, 0.2, DomainShape.RECTANGLE);
    }

    /**
     * @param adhesion      attraction rate (1 / h): speed per µm of gap between neighbours closer than
     *                      contact distance times {@code 1 + adhesionRange}, at least 0
     * @param adhesionRange reach of adhesion beyond contact, as a fraction of the contact distance
     * @param shape         rectangle, the disc inscribed in it, or a strip periodic along y
     */
    public OverlapRepulsion(double width, double height, double rate, double newbornRadius, double adhesion,
            double adhesionRange, DomainShape shape) {
        if (!(rate >= 0) || Double.isInfinite(rate)) {
            throw new IllegalArgumentException("repulsion rate must be finite and at least 0, got " + rate);
        }
        if (!(adhesion >= 0) || !(adhesionRange >= 0) || Double.isInfinite(adhesion) || adhesionRange > 1) {
            throw new IllegalArgumentException("adhesion must be at least 0 and its range in [0, 1], got " + adhesion
                    + ", " + adhesionRange);
        }
        this.width = width;
        this.height = height;
        this.rate = rate;
        this.newbornRadius = newbornRadius;
        this.adhesion = adhesion;
        this.adhesionRange = adhesionRange;
        this.shape = shape;
    }

    /** Moves every cell by one overdamped step of {@code dt} hours, on the caller's thread. */
    public void relax(CellPopulation population, double dt) {
        try (BlockParallel serial = new BlockParallel(1)) {
            relax(population, dt, serial);
        }
    }

    /**
     * Moves every cell by one overdamped step of {@code dt} hours; the forces on disjoint blocks
     * of cells are computed in parallel from the same snapshot, so the result does not depend on
     * the number of workers.
     */
    public void relax(CellPopulation population, double dt, BlockParallel pool) {
        int n = population.size();
        ensureCapacity(n);
        pool.forEach(n, (from, to, worker) -> {
            for (int i = from; i < to; i++) {
                Cell c = population.get(i);
                px[i] = c.x();
                py[i] = c.y();
                pr[i] = c.radius(newbornRadius);
            }
        });
        double largest = Math.sqrt(2.0) * newbornRadius;
        for (int i = 0; i < n; i++) {
            largest = Math.max(largest, pr[i]);
        }
        // Buckets at least one interaction range wide, so every neighbour is in the 3 x 3 block around a cell.
        double side = 2.0 * largest * (1 + (adhesion > 0 ? adhesionRange : 0));
        int gx = Math.max(1, (int) Math.ceil(width / side));
        // Periodic rows must all be at least one range tall, the row across the seam included.
        int gy = shape == DomainShape.STRIP ? Math.max(1, (int) Math.floor(height / side))
                : Math.max(1, (int) Math.ceil(height / side));
        double sideY = shape == DomainShape.STRIP ? height / gy : side;
        fillBuckets(n, gx, gy, side, sideY);
        double step = 0.5 * dt;
        pool.forEach(n, (from, to, worker) -> {
            for (int i = from; i < to; i++) {
                move(population.get(i), i, gx, gy, side, sideY, step);
            }
        });
    }

    /**
     * Moves cell {@code i} by one step of the net force of its neighbours in the snapshot,
     * clamped to the walls. Reads only the snapshot arrays and writes only this cell, so blocks of
     * cells can move in parallel, in any order, with the same result.
     */
    private void move(Cell cell, int i, int gx, int gy, double side, double sideY, double step) {
        double fx = 0;
        double fy = 0;
        int bx = bucketOf(px[i], side, gx);
        int by = bucketOf(py[i], sideY, gy);
        boolean periodic = shape == DomainShape.STRIP;
        int rowFrom = periodic && gy >= 3 ? by - 1 : Math.max(0, by - 1);
        int rowTo = periodic && gy >= 3 ? by + 1 : Math.min(gy - 1, by + 1);
        if (periodic && gy < 3) {
            rowFrom = 0;
            rowTo = gy - 1;
        }
        for (int row = rowFrom; row <= rowTo; row++) {
            int cy = row < 0 ? row + gy : (row >= gy ? row - gy : row);
            for (int cx = Math.max(0, bx - 1); cx <= Math.min(gx - 1, bx + 1); cx++) {
                int b = cy * gx + cx;
                for (int k = bucketStart[b]; k < bucketStart[b + 1]; k++) {
                    int j = bucketCells[k];
                    if (j == i) {
                        continue;
                    }
                    double ex = px[i] - px[j];
                    double ey = py[i] - py[j];
                    if (periodic) {
                        // Nearest image across the periodic edge.
                        ey = ey > 0.5 * height ? ey - height : (ey < -0.5 * height ? ey + height : ey);
                    }
                    double reach = pr[i] + pr[j];
                    double d2 = ex * ex + ey * ey;
                    if (d2 >= reach * reach) {
                        double far = reach * (1 + adhesionRange);
                        if (adhesion > 0 && d2 < far * far) {
                            // Adhesion pulls neighbours within reach back towards contact.
                            double d = Math.sqrt(d2);
                            double pull = adhesion * (d - reach) / d;
                            fx -= ex * pull;
                            fy -= ey * pull;
                        }
                        continue;
                    }
                    double d = Math.sqrt(d2);
                    if (d > 1e-12) {
                        double push = rate * (reach - d) / d;
                        fx += ex * push;
                        fy += ey * push;
                    } else {
                        // Coincident centres: separate along x by index order, deterministically.
                        fx += rate * (i < j ? -reach : reach);
                    }
                }
            }
        }
        double r = Math.min(pr[i], 0.5 * Math.min(width, height));
        double nxp = Math.min(Math.max(px[i] + step * fx, r), width - r);
        double nyp = shape == DomainShape.STRIP ? wrap(py[i] + step * fy, height)
                : Math.min(Math.max(py[i] + step * fy, r), height - r);
        if (shape == DomainShape.DISC) {
            double cx = 0.5 * width;
            double cy = 0.5 * height;
            double limit = 0.5 * Math.min(width, height) - r;
            double ex = nxp - cx;
            double ey = nyp - cy;
            double d = Math.hypot(ex, ey);
            if (d > limit && d > 0) {
                nxp = cx + ex * limit / d;
                nyp = cy + ey * limit / d;
            }
        }
        cell.moveTo(nxp, nyp);
    }

    private void fillBuckets(int n, int gx, int gy, double side, double sideY) {
        int buckets = gx * gy;
        if (bucketStart.length < buckets + 1) {
            bucketStart = new int[buckets + 1];
            bucketFill = new int[buckets];
        } else {
            Arrays.fill(bucketStart, 0, buckets + 1, 0);
        }
        for (int i = 0; i < n; i++) {
            int b = bucketOf(py[i], sideY, gy) * gx + bucketOf(px[i], side, gx);
            bucketOfCell[i] = b;
            bucketStart[b + 1]++;
        }
        for (int b = 0; b < buckets; b++) {
            bucketStart[b + 1] += bucketStart[b];
        }
        System.arraycopy(bucketStart, 0, bucketFill, 0, buckets);
        for (int i = 0; i < n; i++) {
            bucketCells[bucketFill[bucketOfCell[i]]++] = i;
        }
    }

    /** {@code y} brought into [0, period) by whole periods. */
    public static double wrap(double y, double period) {
        double w = y - period * Math.floor(y / period);
        return w >= period ? 0.0 : w;
    }

    private static int bucketOf(double coordinate, double side, int count) {
        int b = (int) (coordinate / side);
        return b < 0 ? 0 : (b >= count ? count - 1 : b);
    }

    private void ensureCapacity(int n) {
        if (px.length < n) {
            int size = Math.max(n, px.length + px.length / 4);
            px = new double[size];
            py = new double[size];
            pr = new double[size];
            bucketCells = new int[size];
            bucketOfCell = new int[size];
        }
    }
}
