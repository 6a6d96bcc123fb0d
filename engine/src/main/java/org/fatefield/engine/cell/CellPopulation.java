package org.fatefield.engine.cell;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.function.Predicate;
import org.fatefield.engine.parallel.BlockParallel;

/**
 * The live cells of a tissue in a deterministic order, and the id counter.
 *
 * <p>Cells are plain objects in an array-backed list, stepped by the tissue's single tick, never
 * scheduled one by one. When a cell divides its first daughter takes its slot and the second is
 * appended, so the order depends only on the history, never on threads.
 */
public final class CellPopulation {

    private final ArrayList<Cell> cells = new ArrayList<>();
    private long nextId;

    /** A new unique id. */
    public long newId() {
        return nextId++;
    }

    /** The next id {@link #newId()} will give. */
    public long peekNextId() {
        return nextId;
    }

    /** Empties the population and sets the id counter (restoring a checkpoint). */
    public void reset(long next) {
        cells.clear();
        nextId = next;
    }

    /** Appends a cell. */
    public void add(Cell cell) {
        cells.add(cell);
    }

    /** Puts {@code cell} in slot {@code index}, replacing the cell there. */
    public void replace(int index, Cell cell) {
        cells.set(index, cell);
    }

    /** Removes every cell {@code test} accepts, keeping the others in order; {@code test} runs once per cell, in order. */
    public void removeIf(Predicate<Cell> test) {
        cells.removeIf(test);
    }

    /** Cell at slot {@code index}. */
    public Cell get(int index) {
        return cells.get(index);
    }

    /** Number of live cells. */
    public int size() {
        return cells.size();
    }

    /**
     * Reorders the cells block by block (square blocks of side {@code block} µm, in row-major
     * order; the order inside a block is kept), so that cells stepped one after the other are
     * neighbours in space and read neighbouring parts of the morphogen grid. A counting sort:
     * linear in the number of cells, and deterministic; the cells' blocks are found on {@code pool}.
     */
    public void sortByBlock(double block, double width, double height, BlockParallel pool) {
        int columns = Math.max(1, (int) Math.ceil(width / block));
        int rows = Math.max(1, (int) Math.ceil(height / block));
        int n = cells.size();
        int[] keys = new int[n];
        pool.forEach(n, (from, to, worker) -> {
            for (int i = from; i < to; i++) {
                Cell c = cells.get(i);
                int bx = Math.min(columns - 1, Math.max(0, (int) (c.x() / block)));
                int by = Math.min(rows - 1, Math.max(0, (int) (c.y() / block)));
                keys[i] = by * columns + bx;
            }
        });
        int[] start = new int[columns * rows + 1];
        for (int i = 0; i < n; i++) {
            start[keys[i] + 1]++;
        }
        for (int b = 0; b < columns * rows; b++) {
            start[b + 1] += start[b];
        }
        Cell[] sorted = new Cell[n];
        for (int i = 0; i < n; i++) {
            sorted[start[keys[i]]++] = cells.get(i);
        }
        for (int i = 0; i < n; i++) {
            cells.set(i, sorted[i]);
        }
    }

    /**
     * Replaces every cell by a {@link Cell#relocated()} copy, in order, so that memory order
     * follows stepping order (until the garbage collector moves them, which keeps the order).
     */
    public void relocateInOrder() {
        for (int i = 0; i < cells.size(); i++) {
            cells.set(i, cells.get(i).relocated());
        }
    }

    /** Read-only view of the live cells, in order. */
    public List<Cell> view() {
        return Collections.unmodifiableList(cells);
    }
}
