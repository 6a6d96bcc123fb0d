package org.fatefield.circuits.random;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.core.source64.XoRoShiRo128PlusPlus;

/**
 * Independent random streams keyed by a master seed and a stream number (a cell id, say).
 *
 * <p>Each stream is a xoroshiro128++ generator (Blackman &amp; Vigna 2021, Scrambled linear
 * pseudorandom number generators, ACM Trans. Math. Softw. 47(4):36) whose two state words come
 * from the SplitMix64 finaliser applied to the master seed and the stream number (Steele, Lea
 * &amp; Flood 2014, Fast splittable pseudorandom number generators, OOPSLA). A stream therefore
 * depends only on (seed, key), never on which thread or in which order it was created, which
 * is what makes a tissue bit-identical for any thread count.
 */
public final class RandomStreams {

    /**
     * The largest seed Fatefield takes or writes, 2^53 - 1: every seed from 0 to it is an
     * integer a double holds exactly, so tables read by tools that parse numbers as doubles keep it.
     */
    public static final long MAX_SEED = (1L << 53) - 1;

    private static final long GOLDEN_GAMMA = 0x9e3779b97f4a7c15L;

    private final long masterSeed;

    private RandomStreams(long masterSeed) {
        this.masterSeed = masterSeed;
    }

    /** Streams derived from {@code masterSeed}. */
    public static RandomStreams of(long masterSeed) {
        return new RandomStreams(masterSeed);
    }

    /** The master seed. */
    public long masterSeed() {
        return masterSeed;
    }

    /** The stream for {@code key}; the same (seed, key) always gives the same sequence. */
    public UniformRandomProvider stream(long key) {
        long[] words = seedWords(key);
        return new XoRoShiRo128PlusPlus(words[0], words[1]);
    }

    /**
     * The two xoroshiro128++ state words of the stream for {@code key} (never both zero), for
     * generators that embed their state (see {@link EmbeddedStream}); such a generator gives
     * exactly the sequence of {@link #stream(long)}.
     */
    public long[] seedWords(long key) {
        long base = mix(masterSeed ^ mix(key + GOLDEN_GAMMA));
        long s0 = mix(base + GOLDEN_GAMMA);
        long s1 = mix(base + 2 * GOLDEN_GAMMA);
        if (s0 == 0 && s1 == 0) {
            s1 = GOLDEN_GAMMA;
        }
        return new long[] {s0, s1};
    }

    /** The SplitMix64 output function (a bijection on 64-bit words). */
    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }
}
