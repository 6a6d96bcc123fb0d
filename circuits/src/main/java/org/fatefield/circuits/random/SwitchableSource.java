package org.fatefield.circuits.random;

import org.apache.commons.rng.UniformRandomProvider;

/**
 * A random source that draws from whichever stream it was last pointed at.
 *
 * <p>Commons RNG samplers are bound to one source when built, and building a Ziggurat Gaussian
 * sampler allocates (it builds its exponential tail sampler too). A stepper that serves a million
 * cells, each with its own stream, builds its sampler once on a switchable source and points the
 * source at each cell's stream in turn: the draws are exactly those of a sampler built on that
 * stream, because the Ziggurat samplers keep no state but their source. Not thread-safe: one
 * per thread.
 */
public final class SwitchableSource implements UniformRandomProvider {

    /*
     * Unused padding: the stepper of each worker points its source at a stream once per cell,
     * and two workers' sources next to each other in memory (as a collection can leave them)
     * would share a cache line, each write stalling the other worker (false sharing). HotSpot
     * lays out long fields before references, so these put 128 bytes between one source's
     * reference and the next one's.
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
    private UniformRandomProvider target;

    /** Points this source at {@code stream}; later draws come from it. */
    public void use(UniformRandomProvider stream) {
        this.target = stream;
    }

    @Override
    public long nextLong() {
        return target.nextLong();
    }

    @Override
    public double nextDouble() {
        return target.nextDouble();
    }

    @Override
    public int nextInt() {
        return target.nextInt();
    }
}
