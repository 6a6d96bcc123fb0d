package org.fatefield.engine.cell;

import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.random.XoroshiroStep;

/**
 * A random source over one cell's own stream: the cell's two state words, stepped in place by
 * xoroshiro128++ ({@link XoroshiroStep}), so the draws are the cell's and nobody else's whatever
 * the thread. One object per worker, pointed at each cell in turn with {@link #of}; it allocates
 * nothing per draw. The architecture test lets only the engine's tick and division use it.
 */
public final class CellRandom implements UniformRandomProvider {

    /*
     * Unused padding: each worker writes its source's cell reference once per cell, and two
     * workers' sources allocated one after the other would otherwise share a cache line (false
     * sharing halved the two-thread cell loop). HotSpot lays out long fields before references,
     * so these put 128 bytes between one source's reference and the next one's.
     */
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
    private Cell cell;

    /** Points this source at {@code target}'s stream and returns it; later draws advance that stream. */
    public CellRandom of(Cell target) {
        this.cell = target;
        return this;
    }

    @Override
    public long nextLong() {
        Cell c = cell;
        long s0 = c.stream0;
        long s1 = c.stream1;
        c.stream0 = XoroshiroStep.nextWord0(s0, s1);
        c.stream1 = XoroshiroStep.nextWord1(s0, s1);
        return XoroshiroStep.output(s0, s1);
    }
}
