package org.fatefield.engine.mechanics;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;

/**
 * The order in which the bucket rows of {@link OverlapRepulsion} add their pair forces: a few
 * passes, each a set of rows that may run in parallel because no two of them write the same row.
 * Row r writes rows r and r + 1 (row 0 after the last on a periodic strip), so even rows and
 * odd rows alternate; on a strip with an odd number of rows the last row, which would meet row 0
 * in the even pass, gets a pass of its own. Each row is summed by one worker in slot order, in a
 * pass fixed by the grid alone, so every cell's force is the same sum in the same order whatever
 * the number of workers.
 */
final class RowPasses {

    private RowPasses() {
    }

    /** The passes over {@code rows} bucket rows, periodic across the last row or not. */
    static List<int[]> of(int rows, boolean periodic) {
        List<int[]> passes = new ArrayList<>();
        boolean lastAlone = periodic && rows >= 3 && rows % 2 == 1;
        int evenEnd = lastAlone ? rows - 1 : rows;
        passes.add(IntStream.range(0, evenEnd).filter(r -> r % 2 == 0).toArray());
        int[] odd = IntStream.range(0, rows).filter(r -> r % 2 == 1).toArray();
        if (odd.length > 0) {
            passes.add(odd);
        }
        if (lastAlone) {
            passes.add(new int[] {rows - 1});
        }
        return passes;
    }

    /**
     * True if row {@code row} pairs its cells with the next row's (row 0 after the last on a
     * strip): always, but for the last row of a bounded grid and, on a strip of two rows, for
     * row 1 (row 0 already met it); a strip of one row pairs only within itself.
     */
    static boolean pairsWithNext(int row, int rows, boolean periodic) {
        return periodic ? rows >= 3 || (rows == 2 && row == 0) : row + 1 < rows;
    }
}
