package org.fatefield.circuits.random;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.junit.jupiter.api.Test;

/**
 * One Ziggurat sampler on a switchable source, pointed at two streams in turn, against Commons
 * RNG's sampler built on each stream (the reference): the same Gaussians, bit for bit.
 */
class SwitchableSourceTest {

    @Test
    void interleavedStreamsGiveEachStreamsOwnGaussians() {
        RandomStreams streams = RandomStreams.of(99);
        ZigguratSampler.NormalizedGaussian a = ZigguratSampler.NormalizedGaussian.of(streams.stream(1));
        ZigguratSampler.NormalizedGaussian b = ZigguratSampler.NormalizedGaussian.of(streams.stream(2));
        UniformRandomProvider first = streams.stream(1);
        UniformRandomProvider second = streams.stream(2);
        SwitchableSource source = new SwitchableSource();
        ZigguratSampler.NormalizedGaussian shared = ZigguratSampler.NormalizedGaussian.of(source);
        for (int i = 0; i < 100_000; i++) {
            source.use(first);
            assertEquals(a.sample(), shared.sample(), 0.0, "draw " + i);
            source.use(second);
            assertEquals(b.sample(), shared.sample(), 0.0, "draw " + i);
        }
    }
}
