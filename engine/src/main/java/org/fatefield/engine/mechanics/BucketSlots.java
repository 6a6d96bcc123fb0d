package org.fatefield.engine.mechanics;

import java.util.Arrays;
import java.util.function.IntToLongFunction;
import org.fatefield.engine.parallel.BlockParallel;

/**
 * The slot order of {@link OverlapRepulsion}: cells sorted into buckets (a counting sort), and
 * by x, then id, within a bucket (an insertion sort of each bucket's few cells, buckets in
 * parallel). As a bucket's column is a non-decreasing function of x, every row of buckets is then
 * sorted by x, which lets the pair search sweep an x window instead of whole buckets. The force
 * on a cell is summed in an order fixed by positions and ids, never by the population's memory
 * order, so floating-point results do not depend on when the population was last reordered. The
 * arrays are kept from step to step.
 */
final class BucketSlots {

    private int[] bucketStart = new int[0];
    private int[] bucketFill = new int[0];

    /**
     * Gives each of the {@code n} cells a slot. On entry {@code slotOfCell[i]} holds cell i's
     * bucket and {@code xs[i]} its x; {@code idOf} gives cell i's id (read only for cells of equal
     * x). On return {@code slotOfCell[i]} holds its slot, and the returned array its bucket starts
     * (bucket b holds slots {@code start[b]} to {@code start[b + 1]}). {@code cellOfSlot} is
     * scratch of at least n values.
     */
    int[] assign(int n, int buckets, int[] slotOfCell, double[] xs, IntToLongFunction idOf, double[] cellOfSlot,
            BlockParallel pool) {
        if (bucketStart.length < buckets + 1) {
            bucketStart = new int[buckets + 1];
            bucketFill = new int[buckets];
        } else {
            Arrays.fill(bucketStart, 0, buckets + 1, 0);
        }
        int[] start = bucketStart;
        for (int i = 0; i < n; i++) {
            start[slotOfCell[i] + 1]++;
        }
        for (int b = 0; b < buckets; b++) {
            start[b + 1] += start[b];
        }
        System.arraycopy(start, 0, bucketFill, 0, buckets);
        // Each cell's slot and the inverse map, slot to cell (exact as doubles), in one pass.
        for (int i = 0; i < n; i++) {
            int slot = bucketFill[slotOfCell[i]]++;
            slotOfCell[i] = slot;
            cellOfSlot[slot] = i;
        }
        pool.forEach(buckets, (from, to, worker) -> {
            for (int b = from; b < to; b++) {
                sortBucket(xs, idOf, cellOfSlot, start[b], start[b + 1]);
            }
        });
        pool.forEach(n, (from, to, worker) -> {
            for (int k = from; k < to; k++) {
                slotOfCell[(int) cellOfSlot[k]] = k;
            }
        });
        return start;
    }

    /**
     * Insertion sort of slots {@code [from, to)} (one bucket, a few cells) by x, then by id: the
     * cells of the slots are in {@code cellOfSlot}, their x in {@code xs}, by cell.
     */
    private static void sortBucket(double[] xs, IntToLongFunction idOf, double[] cellOfSlot, int from, int to) {
        for (int k = from + 1; k < to; k++) {
            double cell = cellOfSlot[k];
            double x = xs[(int) cell];
            int j = k - 1;
            while (j >= from && after((int) cellOfSlot[j], (int) cell, x, xs, idOf)) {
                cellOfSlot[j + 1] = cellOfSlot[j];
                j--;
            }
            cellOfSlot[j + 1] = cell;
        }
    }

    /** True if cell {@code a} sorts after cell {@code b}, whose x is {@code xb}. */
    private static boolean after(int a, int b, double xb, double[] xs, IntToLongFunction idOf) {
        double xa = xs[a];
        return xa > xb || xa == xb && idOf.applyAsLong(a) > idOf.applyAsLong(b);
    }
}
