package org.fatefield.circuits.random;

/**
 * One step of the xoroshiro128++ generator (Blackman &amp; Vigna 2021, Scrambled linear
 * pseudorandom number generators, ACM Trans. Math. Softw. 47(4):36) on two state words held
 * wherever the caller keeps them: the output of the current state, then the next state's words.
 * The one copy of the algorithm, shared by {@link EmbeddedStream} and by streams whose words are
 * fields of another object (a cell).
 */
public final class XoroshiroStep {

    private XoroshiroStep() {
    }

    /** The ++ scrambler: the 64-bit output of state {@code (s0, s1)}. */
    public static long output(long s0, long s1) {
        return Long.rotateLeft(s0 + s1, 17) + s0;
    }

    /** First word of the state after {@code (s0, s1)}. */
    public static long nextWord0(long s0, long s1) {
        long t = s1 ^ s0;
        return Long.rotateLeft(s0, 49) ^ t ^ (t << 21);
    }

    /** Second word of the state after {@code (s0, s1)}. */
    public static long nextWord1(long s0, long s1) {
        return Long.rotateLeft(s1 ^ s0, 28);
    }

    /** Checks that a state is usable (xoroshiro128++ must never be all zero). */
    public static void checkState(long s0, long s1) {
        if (s0 == 0 && s1 == 0) {
            throw new IllegalArgumentException("xoroshiro128++ state must not be all zero");
        }
    }
}
