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
public final class SwitchableSource extends PaddedProvider {

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
