package org.fatefield.viz.live;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.fatefield.engine.cell.Cell;

/**
 * Recent circuit history of every live cell, for the live view's trace of a clicked cell. Each
 * cell keeps the last {@link #capacity()} samples of (time, every species); a newborn cell starts
 * from a copy of its mother's history, so a trace runs back through the cell's ancestors and shows
 * the division where molecules were shared out. Histories of cells no longer alive are dropped.
 * Memory is capacity × (species + 1) doubles per cell, meant for tissues small enough to watch.
 */
final class CellTraces {

    /** One cell's samples, oldest first once unrolled. */
    static final class Trace {
        private final double[] times;
        private final double[][] values;
        private int start;
        private int size;

        Trace(int capacity, int species) {
            times = new double[capacity];
            values = new double[capacity][species];
        }

        Trace copy() {
            Trace t = new Trace(times.length, values[0].length);
            System.arraycopy(times, 0, t.times, 0, times.length);
            for (int i = 0; i < values.length; i++) {
                System.arraycopy(values[i], 0, t.values[i], 0, values[i].length);
            }
            t.start = start;
            t.size = size;
            return t;
        }

        void add(double time, Cell cell) {
            int slot = (start + size) % times.length;
            if (size == times.length) {
                start = (start + 1) % times.length;
            } else {
                size++;
            }
            times[slot] = time;
            for (int s = 0; s < values[slot].length; s++) {
                values[slot][s] = cell.concentration(s);
            }
        }

        /** Number of samples held. */
        int size() {
            return size;
        }

        /** Time of the {@code k}-th oldest sample. */
        double time(int k) {
            return times[(start + k) % times.length];
        }

        /** Species {@code s} of the {@code k}-th oldest sample. */
        double value(int k, int s) {
            return values[(start + k) % times.length][s];
        }
    }

    private final int capacity;
    private final int species;
    private Map<Long, Trace> traces = new HashMap<>();

    CellTraces(int capacity, int species) {
        if (capacity < 2 || species < 1) {
            throw new IllegalArgumentException("trace capacity must be >= 2 and species >= 1, got " + capacity
                    + " and " + species);
        }
        this.capacity = capacity;
        this.species = species;
    }

    /** Samples every live cell at {@code time}; daughters inherit their mother's history first. */
    void record(double time, List<Cell> cells) {
        Map<Long, Trace> next = new HashMap<>(cells.size() * 2);
        for (Cell cell : cells) {
            Trace t = traces.get(cell.id());
            if (t == null) {
                Trace mother = traces.get(cell.parentId());
                t = mother != null ? mother.copy() : new Trace(capacity, species);
            }
            t.add(time, cell);
            next.put(cell.id(), t);
        }
        traces = next;
    }

    /** The history of the live cell {@code id}, or null if it has none yet. */
    Trace of(long id) {
        return traces.get(id);
    }

    /** Samples kept per cell. */
    int capacity() {
        return capacity;
    }
}
