package org.fatefield.engine.lineage;

/** Receives lineage records as cells divide and when the run ends (for streaming to disk). */
@FunctionalInterface
public interface LineageSink {

    /** Discards everything. */
    LineageSink NONE = record -> { };

    /** Takes one record. */
    void accept(LineageRecord record);
}
