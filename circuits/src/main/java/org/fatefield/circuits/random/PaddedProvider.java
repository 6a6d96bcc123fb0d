package org.fatefield.circuits.random;

import org.apache.commons.rng.UniformRandomProvider;

/**
 * A random source at least 128 bytes long, all but its subclass's few fields unused padding.
 * Per-worker sources that are repointed at a new stream once per cell (each worker writes a
 * reference field of its source for every cell) would otherwise share a cache line when two of
 * them sit side by side in memory, as allocation or a collection can leave them, and every write
 * would stall the other worker (false sharing halved the two-thread cell loop once). Two objects
 * of one class have their fields at the same offsets, so two padded sources side by side keep
 * their written fields at least 128 bytes apart (on Java 17 with compressed pointers the
 * reference sits at offset 12 and the object is 144 bytes long).
 */
public abstract class PaddedProvider implements UniformRandomProvider {

    private long pad0;
    private long pad1;
    private long pad2;
    private long pad3;
    private long pad4;
    private long pad5;
    private long pad6;
    private long pad7;
    private long pad8;
    private long pad9;
    private long pad10;
    private long pad11;
    private long pad12;
    private long pad13;
    private long pad14;
    private long pad15;
}
