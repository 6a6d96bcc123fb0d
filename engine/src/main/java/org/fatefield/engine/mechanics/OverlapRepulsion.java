package org.fatefield.engine.mechanics;

import java.util.Arrays;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellPopulation;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.parallel.BlockParallel;

/**
 * Overdamped relaxation of overlapping discs inside a {@link Domain} (its walls keep every disc
 * inside; across a periodic seam, distances go by the nearest image).
 *
 * <p>Each overlapping pair pushes apart along the line of centres with speed
 * {@code rate * overlap} shared equally; with adhesion, neighbours a little beyond contact pull
 * together with speed {@code adhesion * gap}; walls hold every disc inside the domain. Forces come
 * from a snapshot of positions in bucket and id order (so the result does not depend on the
 * order cells are visited or stored)
 * and neighbours from a uniform bucket grid of side one largest diameter, so a step costs time
 * linear in the number of cells.
 */
public final class OverlapRepulsion {

    private final Domain domain;
    private final double width;
    private final double height;
    private final double rate;
    private final double newbornRadius;
    private final double adhesion;
    private final double adhesionRange;
    /** Positions and radii in bucket order (slot order), so that a bucket row is read contiguously. */
    private double[] sx = new double[0];
    private double[] sy = new double[0];
    private double[] sr = new double[0];
    private int[] slotOfCell = new int[0];
    private int[] bucketOfCell = new int[0];
    private int[] bucketStart = new int[0];
    private int[] bucketFill = new int[0];
    private double[] largestVolumeOfWorker = new double[0];
    private double[][] placeOfWorker = new double[0][];

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

    /**
     * Moves every cell by one overdamped step of {@code dt} hours; the forces on disjoint blocks
     * of cells are computed in parallel from the same snapshot, so the result does not depend on
     * the number of workers.
     */
    public void relax(CellPopulation population, double dt, BlockParallel pool) {
        int n = population.size();
        ensureCapacity(n, pool.workers());
        Arrays.fill(largestVolumeOfWorker, 2.0);
        pool.forEach(n, (from, to, worker) -> {
            double volume = largestVolumeOfWorker[worker];
            for (int i = from; i < to; i++) {
                volume = Math.max(volume, population.get(i).volume());
            }
            largestVolumeOfWorker[worker] = volume;
        });
        double largestVolume = 0;
        for (double value : largestVolumeOfWorker) {
            largestVolume = Math.max(largestVolume, value);
        }
        // Radius grows as the square root of volume (Cell.radius), so this is the largest radius.
        double largest = newbornRadius * Math.sqrt(largestVolume);
        // Buckets at least one interaction range wide, so every neighbour is in the 3 x 3 block around a cell.
        double side = 2.0 * largest * (1 + (adhesion > 0 ? adhesionRange : 0));
        int gx = Math.max(1, (int) Math.ceil(width / side));
        // Periodic rows must all be at least one range tall, the row across the seam included.
        boolean periodic = domain.periodicY();
        int gy = periodic ? Math.max(1, (int) Math.floor(height / side)) : Math.max(1, (int) Math.ceil(height / side));
        double sideY = periodic ? height / gy : side;
        pool.forEach(n, (from, to, worker) -> {
            for (int i = from; i < to; i++) {
                Cell c = population.get(i);
                bucketOfCell[i] = bucketOf(c.y(), sideY, gy) * gx + bucketOf(c.x(), side, gx);
            }
        });
        assignSlots(population, gx * gy);
        pool.forEach(n, (from, to, worker) -> {
            for (int i = from; i < to; i++) {
                Cell c = population.get(i);
                int slot = slotOfCell[i];
                sx[slot] = c.x();
                sy[slot] = c.y();
                sr[slot] = c.radius(newbornRadius);
            }
        });
        double step = 0.5 * dt;
        pool.forEach(n, (from, to, worker) -> {
            double[] place = placeOfWorker[worker];
            for (int i = from; i < to; i++) {
                move(population.get(i), slotOfCell[i], gx, gy, side, sideY, step, place);
            }
        });
    }

    /**
     * Moves the cell in slot {@code self} by one step of the net force of its neighbours in the
     * snapshot, clamped to the walls. Reads only the snapshot arrays and writes only this cell, so
     * blocks of cells can move in parallel, in any order, with the same result. {@code place} is
     * the worker's scratch for the confined position.
     */
    private void move(Cell cell, int self, int gx, int gy, double side, double sideY, double step,
            double[] place) {
        double x = sx[self];
        double y = sy[self];
        double radius = sr[self];
        double fx = 0;
        double fy = 0;
        int bx = bucketOf(x, side, gx);
        int by = bucketOf(y, sideY, gy);
        boolean periodic = domain.periodicY();
        // Rows by - 1 .. by + 1, wrapped on a strip (where fewer than three rows means all of them).
        int rowFrom = Math.max(0, by - 1);
        int rowTo = Math.min(gy - 1, by + 1);
        if (periodic) {
            rowFrom = gy >= 3 ? by - 1 : 0;
            rowTo = gy >= 3 ? by + 1 : gy - 1;
        }
        int columnFrom = Math.max(0, bx - 1);
        int columnTo = Math.min(gx - 1, bx + 1);
        for (int row = rowFrom; row <= rowTo; row++) {
            int cy = row < 0 ? row + gy : (row >= gy ? row - gy : row);
            // The three buckets of a row are consecutive slots.
            int end = bucketStart[cy * gx + columnTo + 1];
            for (int k = bucketStart[cy * gx + columnFrom]; k < end; k++) {
                if (k == self) {
                    continue;
                }
                double ex = x - sx[k];
                double ey = y - sy[k];
                if (periodic) {
                    ey = domain.nearestImageDy(ey);
                }
                double reach = radius + sr[k];
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
                    // Coincident centres: separate along x by slot order, deterministically.
                    fx += rate * (self < k ? -reach : reach);
                }
            }
        }
        domain.confine(x + step * fx, y + step * fy, radius, place);
        cell.moveTo(place[0], place[1]);
    }

    /**
     * Counts the cells per bucket and gives each cell a slot, buckets in row-major order and
     * cells in order of id within a bucket (a counting sort, then an insertion sort of each
     * bucket's few cells). The force on a cell is then summed in an order fixed by positions
     * and ids, never by the population's memory order, so floating-point results do not depend
     * on when the population was last reordered.
     */
    private void assignSlots(CellPopulation population, int buckets) {
        int n = population.size();
        if (bucketStart.length < buckets + 1) {
            bucketStart = new int[buckets + 1];
            bucketFill = new int[buckets];
        } else {
            Arrays.fill(bucketStart, 0, buckets + 1, 0);
        }
        for (int i = 0; i < n; i++) {
            bucketStart[bucketOfCell[i] + 1]++;
        }
        for (int b = 0; b < buckets; b++) {
            bucketStart[b + 1] += bucketStart[b];
        }
        System.arraycopy(bucketStart, 0, bucketFill, 0, buckets);
        for (int i = 0; i < n; i++) {
            slotOfCell[i] = bucketFill[bucketOfCell[i]]++;
        }
        // The buckets are known now, so their array is reused for the inverse map, slot to cell.
        int[] cellOfSlot = bucketOfCell;
        for (int i = 0; i < n; i++) {
            cellOfSlot[slotOfCell[i]] = i;
        }
        for (int b = 0; b < buckets; b++) {
            sortBucketById(population, cellOfSlot, bucketStart[b], bucketStart[b + 1]);
        }
    }

    /**
     * Insertion sort of slots {@code [from, to)} (one bucket, a few cells) by cell id, keeping
     * {@link #slotOfCell} in step.
     */
    private void sortBucketById(CellPopulation population, int[] cellOfSlot, int from, int to) {
        for (int k = from + 1; k < to; k++) {
            int cell = cellOfSlot[k];
            long id = population.get(cell).id();
            int j = k - 1;
            while (j >= from && population.get(cellOfSlot[j]).id() > id) {
                cellOfSlot[j + 1] = cellOfSlot[j];
                slotOfCell[cellOfSlot[j + 1]] = j + 1;
                j--;
            }
            cellOfSlot[j + 1] = cell;
            slotOfCell[cell] = j + 1;
        }
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
            sr = new double[size];
            slotOfCell = new int[size];
            bucketOfCell = new int[size];
        }
        if (largestVolumeOfWorker.length != workers) {
            largestVolumeOfWorker = new double[workers];
            // Padded past a cache line so that two workers' scratch never shares one.
            placeOfWorker = new double[workers][2 + 16];
        }
    }
}
