package org.fatefield.engine.cell;

import org.fatefield.circuits.random.PaddedProvider;
import org.fatefield.circuits.random.XoroshiroStep;

/**
 * A random source over one cell's own stream: the cell's two state words, stepped in place by
 * xoroshiro128++ ({@link XoroshiroStep}), so the draws are the cell's and nobody else's whatever
 * the thread. One object per worker, pointed at each cell in turn with {@link #of}; it allocates
 * nothing per draw. The architecture test lets only the engine's tick and division use it.
 */
public final class CellRandom extends PaddedProvider {

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
