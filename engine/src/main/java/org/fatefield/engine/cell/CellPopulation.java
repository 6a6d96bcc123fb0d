package org.fatefield.engine.cell;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

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

    /** Appends a cell. */
    public void add(Cell cell) {
        cells.add(cell);
    }

    /** Puts {@code cell} in slot {@code index}, replacing the cell there. */
    public void replace(int index, Cell cell) {
        cells.set(index, cell);
    }

    /** Cell at slot {@code index}. */
    public Cell get(int index) {
        return cells.get(index);
    }

    /** Number of live cells. */
    public int size() {
        return cells.size();
    }

    /** Read-only view of the live cells, in order. */
    public List<Cell> view() {
        return Collections.unmodifiableList(cells);
    }
}
