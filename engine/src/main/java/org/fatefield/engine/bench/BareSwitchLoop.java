package org.fatefield.engine.bench;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.fatefield.circuits.kinetics.HillFunctions;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.circuits.random.SwitchableSource;

/**
 * The baseline of the tissue benchmark: the two-gene switch's Langevin step written as one flat
 * loop over primitive arrays, with the same arithmetic per cell (read the local signal, set the
 * coupled parameter by a Hill function, four Hill terms, four Gaussian increments, truncation at
 * zero) and no objects, interfaces or parameter copies.
 */
public final class BareSwitchLoop {

    private final double[] a;
    private final double[] b;
    private final double[] signal;
    private final double[] p;
    private final UniformRandomProvider[] rng;
    private final double omega;
    private final double couplingBase;
    private final double couplingGain;
    private final double couplingHalfMax;
    private final double couplingHill;
    private final SwitchableSource source = new SwitchableSource();
    private final ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(source);

    /**
     * @param cells    number of cells
     * @param params   the switch's 16 parameters
     * @param omega    system size
     * @param coupling base, gain, half-max and Hill coefficient of the repression coupling
     * @param seed     seed of the per-cell streams
     */
    public BareSwitchLoop(int cells, double[] params, double omega, double[] coupling, long seed) {
        a = new double[cells];
        b = new double[cells];
        signal = new double[cells];
        rng = new UniformRandomProvider[cells];
        RandomStreams streams = RandomStreams.of(seed);
        for (int i = 0; i < cells; i++) {
            a[i] = 0.3;
            b[i] = 0.3;
            signal[i] = 2.0 * i / cells;
            rng[i] = streams.stream(i);
        }
        this.p = params.clone();
        this.omega = omega;
        this.couplingBase = coupling[0];
        this.couplingGain = coupling[1];
        this.couplingHalfMax = coupling[2];
        this.couplingHill = coupling[3];
    }

    /** One Langevin step of every cell. */
    public void step(double dt) {
        double noise = dt / omega;
        for (int i = 0; i < a.length; i++) {
            source.use(rng[i]);
            double r = couplingBase + couplingGain * HillFunctions.activation(signal[i], couplingHalfMax, couplingHill);
            double x = a[i];
            double y = b[i];
            double prodA = p[0] + p[1] * HillFunctions.activation(x, p[2], p[3]) + r * HillFunctions.repression(y, p[5],
                    p[6]);
            double lossA = p[7] * x;
            double prodB = p[8] + p[9] * HillFunctions.activation(y, p[10], p[11]) + r * HillFunctions.repression(x,
                    p[13], p[14]);
            double lossB = p[15] * y;
            x += prodA * dt + Math.sqrt(prodA * noise) * g.sample() - lossA * dt - Math.sqrt(lossA * noise) * g.sample();
            y += prodB * dt + Math.sqrt(prodB * noise) * g.sample() - lossB * dt - Math.sqrt(lossB * noise) * g.sample();
            a[i] = x > 0 ? x : 0;
            b[i] = y > 0 ? y : 0;
        }
    }

    /** A checksum of the state, so the work cannot be optimised away. */
    public double checksum() {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] - b[i];
        }
        return s;
    }
}
