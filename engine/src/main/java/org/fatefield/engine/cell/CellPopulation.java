package org.fatefield.engine.cell;

import java.util.AbstractList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Predicate;
import org.fatefield.engine.parallel.BlockParallel;

/**
 * The live cells of a tissue in a deterministic order, and the id counter.
 *
 * <p>Cells are plain objects in an array, stepped by the tissue's single tick, never scheduled
 * one by one. When a cell divides its first daughter takes its slot and the second is appended,
 * so the order depends only on the history, never on threads. The cells' positions and volumes
 * live here, four doubles a slot (x, y, z, volume) in one array, so the stages that need only
 * them (mechanics, above all) stream 32 bytes a cell rather than whole cell objects; a cell
 * object reads and writes its own slot, and takes its values with it when it leaves.
 */
public final class CellPopulation {

    /** Doubles a slot holds in {@link #places}: x, y, z, volume. */
    private static final int STRIDE = 4;

    private Cell[] cells = new Cell[16];
    private double[] places = new double[16 * STRIDE];
    private int size;
    private long nextId;
    private final List<Cell> view = new AbstractList<>() {
        @Override
        public Cell get(int index) {
            return CellPopulation.this.get(index);
        }

        @Override
        public int size() {
            return size;
        }
    };

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
        for (int i = 0; i < size; i++) {
            cells[i].detach();
            cells[i] = null;
        }
        size = 0;
        nextId = next;
    }

    /** Appends a cell; it keeps its position and volume here from now on. */
    public void add(Cell cell) {
        if (size == cells.length) {
            grow(size + Math.max(16, size / 8));
        }
        cells[size] = cell;
        cell.attach(places, size * STRIDE);
        size++;
    }

    /** Makes room for {@code capacity} cells in all, so that adding that many allocates nothing more. */
    public void reserve(int capacity) {
        if (capacity > cells.length) {
            grow(capacity);
        }
    }

    /** Puts {@code cell} in slot {@code index}, replacing the cell there (which takes its values with it). */
    public void replace(int index, Cell cell) {
        checkIndex(index);
        cells[index].detach();
        cells[index] = cell;
        cell.attach(places, index * STRIDE);
    }

    /** Removes every cell {@code test} accepts, keeping the others in order; {@code test} runs once per cell, in order. */
    public void removeIf(Predicate<Cell> test) {
        int kept = 0;
        for (int i = 0; i < size; i++) {
            Cell cell = cells[i];
            if (test.test(cell)) {
                cell.detach();
            } else {
                if (kept != i) {
                    cells[kept] = cell;
                    cell.attach(places, kept * STRIDE);
                }
                kept++;
            }
        }
        Arrays.fill(cells, kept, size, null);
        size = kept;
    }

    /** Cell at slot {@code index}. */
    public Cell get(int index) {
        checkIndex(index);
        return cells[index];
    }

    /** Number of live cells. */
    public int size() {
        return size;
    }

    /** Position along x (µm) of the cell at slot {@code index}, read without touching the cell object. */
    public double x(int index) {
        return places[index * STRIDE];
    }

    /** Position along y (µm) of the cell at slot {@code index}. */
    public double y(int index) {
        return places[index * STRIDE + 1];
    }

    /** Position along z (µm) of the cell at slot {@code index}, 0 in a flat tissue. */
    public double z(int index) {
        return places[index * STRIDE + 2];
    }

    /** Volume of the cell at slot {@code index}, in units of a mean newborn cell. */
    public double volume(int index) {
        return places[index * STRIDE + 3];
    }

    /** Moves the cell at slot {@code index} to (x, y) µm, its z unchanged. */
    public void moveTo(int index, double x, double y) {
        places[index * STRIDE] = x;
        places[index * STRIDE + 1] = y;
    }

    /** Moves the cell at slot {@code index} to (x, y, z) µm. */
    public void moveTo(int index, double x, double y, double z) {
        int at = index * STRIDE;
        places[at] = x;
        places[at + 1] = y;
        places[at + 2] = z;
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
        int n = size;
        int[] keys = new int[n];
        pool.forEach(n, (from, to, worker) -> {
            for (int i = from; i < to; i++) {
                int bx = Math.min(columns - 1, Math.max(0, (int) (x(i) / block)));
                int by = Math.min(rows - 1, Math.max(0, (int) (y(i) / block)));
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
        Cell[] sorted = new Cell[cells.length];
        double[] sortedPlaces = new double[places.length];
        for (int i = 0; i < n; i++) {
            int to = start[keys[i]]++;
            sorted[to] = cells[i];
            System.arraycopy(places, i * STRIDE, sortedPlaces, to * STRIDE, STRIDE);
        }
        cells = sorted;
        places = sortedPlaces;
        pool.forEach(n, (from, to, worker) -> {
            for (int i = from; i < to; i++) {
                cells[i].place = sortedPlaces;
                cells[i].base = i * STRIDE;
            }
        });
    }

    /**
     * Replaces every cell by a {@link Cell#relocated()} copy in the same slot, in order, so that
     * memory order follows stepping order (until the garbage collector moves them, which keeps
     * the order). The replaced objects are dropped, not detached: one held from before reads its
     * copy's slot until the slot changes hands (take values from cells, not cells, across ticks).
     */
    public void relocateInOrder() {
        for (int i = 0; i < size; i++) {
            cells[i] = cells[i].relocated();
        }
    }

    /** Read-only view of the live cells, in order. */
    public List<Cell> view() {
        return view;
    }

    private void grow(int capacity) {
        cells = Arrays.copyOf(cells, capacity);
        places = Arrays.copyOf(places, capacity * STRIDE);
        for (int i = 0; i < size; i++) {
            cells[i].place = places;
        }
    }

    private void checkIndex(int index) {
        if (index < 0 || index >= size) {
            throw new IndexOutOfBoundsException("cell slot " + index + " of a population of " + size);
        }
    }
}
