package org.fatefield.engine.mechanics;

import java.util.Arrays;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellPopulation;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.parallel.BlockParallel;

/**
 * Overdamped relaxation of overlapping discs (spheres in a three-dimensional {@link Domain})
 * inside a domain (its walls keep every cell inside; across a periodic seam, distances go by the
 * nearest image).
 *
 * <p>Each overlapping pair pushes apart along the line of centres with speed
 * {@code rate * overlap} shared equally; with adhesion, neighbours a little beyond contact pull
 * together with speed {@code adhesion * gap}; walls hold every disc inside the domain. Forces come
 * from a snapshot of positions in bucket and id order (so the result does not depend on the
 * order cells are visited or stored) and neighbours from a uniform bucket grid of side one
 * largest diameter, so a step costs time linear in the number of cells. Each pair is computed
 * once, from its first cell in that order, and added to both cells; rows of buckets are summed
 * in the fixed passes of {@link RowPasses}, so the sums, and the result, do not depend on the
 * number of threads. In 3-D the buckets are cubes, ordered by y, then z, then x, so that a
 * bucket row (one y) still writes only itself and the next row: the half stencil is the rest of
 * its x row, the three buckets of the next z layer in its y row, and the nine of the next y row.
 */
public final class OverlapRepulsion {

    private final Domain domain;
    private final double width;
    private final double height;
    private final double rate;
    private final double newbornRadius;
    private final double adhesion;
    private final double adhesionRange;
    /**
     * Positions and radii in bucket order (slot order), so that a bucket row is read contiguously.
     * Radii and forces are floats (relative rounding 6e-8, far below the Euler step's error) to
     * keep a live cell within 256 bytes of heap; positions are doubles.
     */
    private double[] sx = new double[0];
    private double[] sy = new double[0];
    /**
     * z positions and forces, allocated only in a 3-D domain; floats, as the positions serve
     * only the forces (a cell moves from its own double z), to keep a 3-D cell within 256 bytes.
     */
    private float[] sz = new float[0];
    private float[] fz = new float[0];
    private final boolean threeD;
    private float[] sr = new float[0];
    /** Net force on each slot, summed pair by pair. */
    private float[] fx = new float[0];
    private float[] fy = new float[0];
    /** Each cell's slot (its bucket, while the slots are being assigned). */
    private int[] slotOfCell = new int[0];
    /** Where each bucket's slots start (a bucket's cells are slots bucketStart[b] to bucketStart[b + 1]). */
    private int[] bucketStart = new int[0];
    private final BucketSlots slots = new BucketSlots();
    private double[] largestVolumeOfWorker = new double[0];
    private double[][] placeOfWorker = new double[0][];
    /** Per worker: the 3-D force on the cell whose pairs are being summed (x, y, z), padded. */
    private double[][] accOfWorker = new double[0][];

    /**
     * @param domain        where the cells live (its walls, or its periodic seam)
     * @param rate          relaxation rate (1 / h): speed per µm of overlap, at least 0
     * @param newbornRadius radius of a cell of volume 1 in µm (a cell of volume V has radius sqrt(V) times it)
     * @param adhesion      attraction rate (1 / h): speed per µm of gap between neighbours closer than
     *                      contact distance times {@code 1 + adhesionRange}, at least 0
     * @param adhesionRange reach of adhesion beyond contact, as a fraction of the contact distance
     */
    public OverlapRepulsion(Domain domain, double rate, double newbornRadius, double adhesion, double adhesionRange) {
        if (!(rate >= 0) || Double.isInfinite(rate)) {
            throw new IllegalArgumentException("repulsion rate must be finite and at least 0, got " + rate);
        }
        if (!(adhesion >= 0) || !(adhesionRange >= 0) || Double.isInfinite(adhesion) || adhesionRange > 1) {
            throw new IllegalArgumentException("adhesion must be at least 0 and its range in [0, 1], got " + adhesion
                    + ", " + adhesionRange);
        }
        this.domain = domain;
        this.width = domain.width();
        this.height = domain.height();
        this.rate = rate;
        this.newbornRadius = newbornRadius;
        this.adhesion = adhesion;
        this.adhesionRange = adhesionRange;
        this.threeD = domain.threeD();
    }

    /** Repulsion only, no adhesion. */
    public static OverlapRepulsion withoutAdhesion(Domain domain, double rate, double newbornRadius) {
        return new OverlapRepulsion(domain, rate, newbornRadius, 0, 0.2);
    }

    /** Moves every cell by one overdamped step of {@code dt} hours, on the caller's thread. */
    public void relax(CellPopulation population, double dt) {
        try (BlockParallel serial = new BlockParallel(1)) {
            relax(population, dt, serial);
        }
    }

    /** One overdamped step of {@code dt} hours on {@code pool}; the result does not depend on its number of workers. */
    public void relax(CellPopulation population, double dt, BlockParallel pool) {
        relax(population, dt, pool, Double.NaN);
    }

    /**
     * As {@link #relax(CellPopulation, double, BlockParallel)}, given an upper bound on every
     * cell's volume (the tick's cell loop knows it, which saves a pass over the cells), or NaN to
     * find it. The buckets are sized for the larger of the bound and a volume of 2.
     */
    public void relax(CellPopulation population, double dt, BlockParallel pool, double volumeBound) {
        int n = population.size();
        ensureCapacity(n, pool.workers());
        double largestVolume = volumeBound >= 0 ? Math.max(2.0, volumeBound) : largestVolume(population, pool);
        // Radius grows as the square (cube) root of volume (Cell.radius, sphereRadius): the largest radius.
        double largest = newbornRadius * (threeD ? Math.cbrt(largestVolume) : Math.sqrt(largestVolume));
        // Buckets at least one interaction range wide, so every neighbour is in the 3 x 3 block around a cell.
        double side = 2.0 * largest * (1 + (adhesion > 0 ? adhesionRange : 0));
        int gx = Math.max(1, (int) Math.ceil(width / side));
        // Periodic rows must all be at least one range tall, the row across the seam included.
        boolean periodic = domain.periodicY();
        int gy = periodic ? Math.max(1, (int) Math.floor(height / side)) : Math.max(1, (int) Math.ceil(height / side));
        double sideY = periodic ? height / gy : side;
        int gz = threeD ? Math.max(1, (int) Math.ceil(domain.depth() / side)) : 1;
        pool.forEach(n, (from, to, worker) -> {
            for (int i = from; i < to; i++) {
                double x = population.x(i);
                int layer = threeD ? bucketOf(population.z(i), side, gz) : 0;
                slotOfCell[i] = (bucketOf(population.y(i), sideY, gy) * gz + layer) * gx + bucketOf(x, side, gx);
                // sx is free until the snapshot: it holds each cell's x, by cell, for the sort.
                sx[i] = x;
            }
        });
        bucketStart = slots.assign(n, gx * gy * gz, slotOfCell, sx, i -> population.get(i).id(), sy, pool);
        pool.forEach(n, (from, to, worker) -> {
            for (int i = from; i < to; i++) {
                int slot = slotOfCell[i];
                sx[slot] = population.x(i);
                sy[slot] = population.y(i);
                if (threeD) {
                    sz[slot] = (float) population.z(i);
                    sr[slot] = (float) Cell.sphereRadius(newbornRadius, population.volume(i));
                } else {
                    sr[slot] = (float) Cell.discRadius(newbornRadius, population.volume(i));
                }
            }
        });
        pool.forEach(n, (from, to, worker) -> {
            Arrays.fill(fx, from, to, 0.0f);
            Arrays.fill(fy, from, to, 0.0f);
            if (threeD) {
                Arrays.fill(fz, from, to, 0.0f);
            }
        });
        for (int[] rows : RowPasses.of(gy, periodic)) {
            pool.forEach(rows.length, (from, to, worker) -> {
                for (int r = from; r < to; r++) {
                    if (threeD) {
                        pairsOfRow3d(rows[r], gx, gy, gz, accOfWorker[worker]);
                    } else {
                        pairsOfRow(rows[r], gx, gy, side);
                    }
                }
            });
        }
        move(population, n, 0.5 * dt, pool);
    }

    /** The largest volume of any cell, at least 2. */
    private double largestVolume(CellPopulation population, BlockParallel pool) {
        Arrays.fill(largestVolumeOfWorker, 2.0);
        pool.forEach(population.size(), (from, to, worker) -> {
            double volume = largestVolumeOfWorker[worker];
            for (int i = from; i < to; i++) {
                volume = Math.max(volume, population.volume(i));
            }
            largestVolumeOfWorker[worker] = volume;
        });
        double largest = 0;
        for (double value : largestVolumeOfWorker) {
            largest = Math.max(largest, value);
        }
        return largest;
    }

    /** Moves each cell by {@code step} times its net force, kept inside the domain. */
    private void move(CellPopulation population, int n, double step, BlockParallel pool) {
        pool.forEach(n, (from, to, worker) -> {
            double[] place = placeOfWorker[worker];
            for (int i = from; i < to; i++) {
                int slot = slotOfCell[i];
                if (threeD) {
                    domain.confine(sx[slot] + step * fx[slot], sy[slot] + step * fy[slot],
                            population.z(i) + step * fz[slot], sr[slot], place);
                    population.moveTo(i, place[0], place[1], place[2]);
                } else {
                    domain.confine(sx[slot] + step * fx[slot], sy[slot] + step * fy[slot], sr[slot], place);
                    population.moveTo(i, place[0], place[1]);
                }
            }
        });
    }

    /**
     * Adds the force of every pair whose first cell is in bucket row {@code row}: with a later
     * cell of that row, or with any cell of the next row (across the seam on a strip), less than
     * {@code range} apart in x. A row's slots are sorted by x ({@link BucketSlots}), so the
     * partners of a cell are a window of each row: the same row's up to x + range, and the next
     * row's from x - range (a cursor that only moves forward) to x + range; a third fewer
     * candidates than whole buckets. Each neighbouring pair is met once, from its first cell, and
     * both cells get their share, equal and opposite. Writes only rows {@code row} and the next,
     * so the rows of one {@link RowPasses} pass run in parallel.
     */
    private void pairsOfRow(int row, int gx, int gy, double range) {
        boolean periodic = domain.periodicY();
        boolean nextRow = RowPasses.pairsWithNext(row, gy, periodic);
        int next = row + 1 == gy ? 0 : row + 1;
        int end = bucketStart[(row + 1) * gx];
        int below = bucketStart[next * gx];
        int belowEnd = bucketStart[(next + 1) * gx];
        for (int i = bucketStart[row * gx]; i < end; i++) {
            double right = sx[i] + range;
            for (int k = i + 1; k < end && sx[k] <= right; k++) {
                pair(i, k, periodic);
            }
            if (nextRow) {
                double left = sx[i] - range;
                while (below < belowEnd && sx[below] < left) {
                    below++;
                }
                for (int k = below; k < belowEnd && sx[k] <= right; k++) {
                    pair(i, k, periodic);
                }
            }
        }
    }

    /**
     * The force between slots {@code i} and {@code k}: overlap pushes them apart along the line of
     * centres at {@code rate * overlap}, adhesion pulls near neighbours back to contact. Pairs
     * out of reach are rejected on squared distances, without a square root.
     */
    private void pair(int i, int k, boolean periodic) {
        double ex = sx[i] - sx[k];
        double ey = sy[i] - sy[k];
        if (periodic) {
            ey = domain.nearestImageDy(ey);
        }
        double reach = (double) sr[i] + sr[k];
        double d2 = ex * ex + ey * ey;
        double px;
        double py;
        if (d2 >= reach * reach) {
            double far = reach * (1 + adhesionRange);
            if (adhesion <= 0 || d2 >= far * far) {
                return;
            }
            double d = Math.sqrt(d2);
            double pull = adhesion * (d - reach) / d;
            px = -ex * pull;
            py = -ey * pull;
        } else {
            double d = Math.sqrt(d2);
            if (d > 1e-12) {
                double push = rate * (reach - d) / d;
                px = ex * push;
                py = ey * push;
            } else {
                // Coincident centres: separate along x by slot order, deterministically.
                px = -rate * reach;
                py = 0;
            }
        }
        fx[i] += (float) px;
        fy[i] += (float) py;
        fx[k] -= (float) px;
        fy[k] -= (float) py;
    }

    /**
     * The 3-D counterpart of {@link #pairsOfRow}: the first cell of each pair lies in bucket row
     * {@code row} (one y); its partners are the later cells of its own x row of buckets (same
     * and next x), of the three buckets at x - 1 to x + 1 in the next z layer of the same y row,
     * and of the nine buckets around it in the next y row (across the seam on a slab). Whole
     * buckets, not x windows as in 2-D: a sphere's partners lie in five short lines of buckets,
     * and ten window ends per cell (each a mispredicted loop exit) cost more than the third of
     * the candidates they save (measured back to back at 10^5 spheres: 4.2-4.4e6 cell-steps/s
     * with windows against 4.9-5.2e6 without).
     */
    private void pairsOfRow3d(int row, int gx, int gy, int gz, double[] acc) {
        boolean periodic = domain.periodicY();
        boolean nextRow = RowPasses.pairsWithNext(row, gy, periodic);
        int next = row + 1 == gy ? 0 : row + 1;
        for (int layer = 0; layer < gz; layer++) {
            int line = (row * gz + layer) * gx;
            for (int column = 0; column < gx; column++) {
                int lo = Math.max(0, column - 1);
                int hi = Math.min(gx - 1, column + 1) + 1;
                int sameEnd = bucketStart[line + hi];
                boolean above = layer + 1 < gz;
                for (int i = bucketStart[line + column]; i < bucketStart[line + column + 1]; i++) {
                    acc[0] = 0;
                    acc[1] = 0;
                    acc[2] = 0;
                    sweep3d(i, i + 1, sameEnd, periodic, acc);
                    if (above) {
                        sweep3d(i, bucketStart[line + gx + lo], bucketStart[line + gx + hi], periodic, acc);
                    }
                    for (int z = Math.max(0, layer - 1); nextRow && z <= Math.min(gz - 1, layer + 1); z++) {
                        int base = (next * gz + z) * gx;
                        sweep3d(i, bucketStart[base + lo], bucketStart[base + hi], periodic, acc);
                    }
                    fx[i] += (float) acc[0];
                    fy[i] += (float) acc[1];
                    fz[i] += (float) acc[2];
                }
            }
        }
    }

    /**
     * The forces in 3-D between slot {@code i} and each of the slots {@code [from, to)}, by the
     * law of {@link #pair}. Each partner gets its share at once; slot i's shares are summed in
     * {@code acc} (x, y, z), which the caller adds to slot i once, so slot i is written once per
     * cell rather than once per pair (measured 40% faster than pair by pair in 3-D; in 2-D, with
     * fewer candidates per cell, it was not faster, so 2-D keeps {@link #pair}).
     */
    private void sweep3d(int i, int from, int to, boolean periodic, double[] acc) {
        double xi = sx[i];
        double yi = sy[i];
        double zi = sz[i];
        double ri = sr[i];
        double ax = 0;
        double ay = 0;
        double az = 0;
        for (int k = from; k < to; k++) {
            double ex = xi - sx[k];
            double ey = periodic ? domain.nearestImageDy(yi - sy[k]) : yi - sy[k];
            double ez = zi - sz[k];
            double reach = ri + sr[k];
            double d2 = ex * ex + ey * ey + ez * ez;
            double scale;
            if (d2 >= reach * reach) {
                double far = reach * (1 + adhesionRange);
                if (adhesion <= 0 || d2 >= far * far) {
                    continue;
                }
                double d = Math.sqrt(d2);
                scale = -adhesion * (d - reach) / d;
            } else {
                double d = Math.sqrt(d2);
                if (d <= 1e-12) {
                    // Coincident centres: separate along x by slot order, deterministically.
                    ax -= rate * reach;
                    fx[k] += (float) (rate * reach);
                    continue;
                }
                scale = rate * (reach - d) / d;
            }
            ax += ex * scale;
            ay += ey * scale;
            az += ez * scale;
            fx[k] -= (float) (ex * scale);
            fy[k] -= (float) (ey * scale);
            fz[k] -= (float) (ez * scale);
        }
        acc[0] += ax;
        acc[1] += ay;
        acc[2] += az;
    }

    private static int bucketOf(double coordinate, double side, int count) {
        int b = (int) (coordinate / side);
        return b < 0 ? 0 : (b >= count ? count - 1 : b);
    }

    private void ensureCapacity(int n, int workers) {
        if (sx.length < n) {
            int size = Math.max(n, sx.length + sx.length / 4);
            sx = new double[size];
            sy = new double[size];
            sr = new float[size];
            fx = new float[size];
            fy = new float[size];
            slotOfCell = new int[size];
            if (threeD) {
                sz = new float[size];
                fz = new float[size];
            }
        }
        if (largestVolumeOfWorker.length != workers) {
            largestVolumeOfWorker = new double[workers];
            // Padded past a cache line so that two workers' scratch never shares one.
            placeOfWorker = new double[workers][3 + 16];
            accOfWorker = new double[workers][3 + 16];
        }
    }
}
