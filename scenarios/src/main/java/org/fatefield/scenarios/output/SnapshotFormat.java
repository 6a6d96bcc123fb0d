package org.fatefield.scenarios.output;

/** What a run writes into {@code snapshots/} at every record time. */
public enum SnapshotFormat {
    /** Nothing. */
    NONE,
    /** The long-format cell and field tables (CSV). */
    TABLES,
    /** The tables, and each field as VTK image data ({@code .vti}) for 3-D viewers. */
    TABLES_AND_VTK;

    /** True when anything is written. */
    public boolean any() {
        return this != NONE;
    }
}
