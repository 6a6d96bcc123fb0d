package org.fatefield.circuits.random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.core.source64.XoRoShiRo128PlusPlus;
import org.junit.jupiter.api.Test;

/**
 * The embedded xoroshiro128++ against the reference implementation in Apache Commons RNG
 * ({@code XoRoShiRo128PlusPlus}, itself tested against Blackman &amp; Vigna's C code): the same
 * seed words must give the same words, exactly.
 */
class EmbeddedStreamTest {

    @Test
    void givesTheReferenceSequenceWordForWord() {
        RandomStreams streams = RandomStreams.of(20261202L);
        for (long key = 0; key < 50; key++) {
            UniformRandomProvider reference = streams.stream(key);
            EmbeddedStream.Detached embedded = new EmbeddedStream.Detached(streams.seedWords(key));
            for (int i = 0; i < 1000; i++) {
                assertEquals(reference.nextLong(), embedded.nextLong(), "key " + key + ", draw " + i);
            }
            // Commons RNG builds doubles from the top 53 bits, as the interface's default does.
            for (int i = 0; i < 100; i++) {
                assertEquals(reference.nextDouble(), embedded.nextDouble(), 0.0);
            }
        }
    }

    @Test
    void savedWordsResumeTheSequence() {
        EmbeddedStream.Detached a = new EmbeddedStream.Detached(new long[] {1L, 2L});
        for (int i = 0; i < 10; i++) {
            a.nextLong();
        }
        EmbeddedStream.Detached b = new EmbeddedStream.Detached(a.streamWords());
        XoRoShiRo128PlusPlus c = new XoRoShiRo128PlusPlus(a.streamWord0(), a.streamWord1());
        for (int i = 0; i < 100; i++) {
            long expected = c.nextLong();
            assertEquals(expected, a.nextLong());
            assertEquals(expected, b.nextLong());
        }
        assertThrows(IllegalArgumentException.class, () -> new EmbeddedStream.Detached(new long[] {0L, 0L}));
    }
}
