package org.fatefield.circuits.random;

import org.apache.commons.rng.UniformRandomProvider;

/**
 * A xoroshiro128++ generator (Blackman &amp; Vigna 2021, Scrambled linear pseudorandom number
 * generators, ACM Trans. Math. Softw. 47(4):36) whose two state words are fields of the
 * subclass's own objects.
 *
 * <p>Why not Commons RNG's {@code XoRoShiRo128PlusPlus}, which gives the same sequence: a tissue
 * holds one stream per cell, and a separate generator object costs each cell about 52 bytes
 * (object header, cached bits, a reference) and a pointer chase on every draw; at a million
 * cells that is a fifth of the heap. A class whose objects must hold their own stream extends
 * this one; where the stream must not be part of the object's public face (a cell), the words
 * are kept as plain fields and stepped by {@link XoroshiroStep}.
 * Only {@link #nextLong()} is implemented here; the other draws are
 * {@link UniformRandomProvider}'s defaults built on it. Tests check the sequence word for word
 * against Commons RNG.
 */
public abstract class EmbeddedStream implements UniformRandomProvider {

    private long state0;
    private long state1;

    /** A stream started from {@code seed}, two state words not both zero (see {@link RandomStreams#seedWords}). */
    protected EmbeddedStream(long[] seed) {
        restoreStream(seed[0], seed[1]);
    }

    @Override
    public final long nextLong() {
        long s0 = state0;
        long s1 = state1;
        state0 = XoroshiroStep.nextWord0(s0, s1);
        state1 = XoroshiroStep.nextWord1(s0, s1);
        return XoroshiroStep.output(s0, s1);
    }

    /** First state word (checkpoints). */
    public final long streamWord0() {
        return state0;
    }

    /** Second state word (checkpoints). */
    public final long streamWord1() {
        return state1;
    }

    /** Sets the state words, as saved by {@link #streamWord0()} and {@link #streamWord1()}. */
    protected final void restoreStream(long word0, long word1) {
        XoroshiroStep.checkState(word0, word1);
        this.state0 = word0;
        this.state1 = word1;
    }

    /** The current state words, to hand the stream on to another object (see {@link Detached}). */
    public final long[] streamWords() {
        return new long[] {state0, state1};
    }

    /**
     * A stream on its own, for draws made before the object that will own the stream exists
     * (a cell's cycle time before the cell): pass {@link #streamWords()} on and the owner
     * continues the same sequence.
     */
    public static final class Detached extends EmbeddedStream {

        /** A stream started from {@code seed} (two words, not both zero). */
        public Detached(long[] seed) {
            super(seed);
        }
    }
}
