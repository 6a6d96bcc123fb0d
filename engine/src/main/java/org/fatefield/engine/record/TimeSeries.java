package org.fatefield.engine.record;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Fate counts over time: one row per recording, in time order.
 */
public final class TimeSeries {

    /**
     * One recorded moment.
     *
     * @param time          simulated time (h)
     * @param fateCounts    cells per fate, in the classifier's fate order
     * @param population    live cells
     * @param meanMorphogen mean morphogen concentration over the domain
     */
    public record Row(double time, int[] fateCounts, int population, double meanMorphogen) {

        /** Copies the counts. */
        public Row {
            fateCounts = fateCounts.clone();
        }

        @Override
        public int[] fateCounts() {
            return fateCounts.clone();
        }

        /** Fraction of cells in fate {@code index}; 0 for an empty tissue. */
        public double fraction(int index) {
            return population == 0 ? 0.0 : (double) fateCounts[index] / population;
        }
    }

    private final List<String> fateNames;
    private final List<Row> rows = new ArrayList<>();

    /** An empty series over the given fates. */
    public TimeSeries(List<String> fateNames) {
        this.fateNames = List.copyOf(fateNames);
    }

    /** Appends a row. */
    public void add(Row row) {
        if (row.fateCounts.length != fateNames.size()) {
            throw new IllegalArgumentException("row has " + row.fateCounts.length + " fate counts, expected "
                    + fateNames.size());
        }
        rows.add(row);
    }

    /** Fate names, in column order. */
    public List<String> fateNames() {
        return fateNames;
    }

    /** Rows in time order (read-only). */
    public List<Row> rows() {
        return Collections.unmodifiableList(rows);
    }

    /** The last row; throws if nothing was recorded. */
    public Row last() {
        if (rows.isEmpty()) {
            throw new IllegalStateException("nothing recorded yet");
        }
        return rows.get(rows.size() - 1);
    }
}
