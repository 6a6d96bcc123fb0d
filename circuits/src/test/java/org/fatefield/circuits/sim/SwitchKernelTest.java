package org.fatefield.circuits.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.fatefield.circuits.random.RandomStreams;
import org.junit.jupiter.api.Test;

/**
 * The Langevin stepper's written-out step for the built-in switch must be the general step to
 * the last bit: the general step (propensities, one normal per reaction, the reaction table) is
 * the one checked against the exact stationary laws in LangevinStepperTest and against the
 * stochastic simulation algorithm in ExactStochasticTest. Both are driven by the same normals
 * (a Ziggurat sampler on a second copy of each stream), over 200 trajectories of 500 steps,
 * from states on both branches and at zero, with a system size small enough that the
 * truncation at zero acts.
 */
class SwitchKernelTest {

    private static final GeneKinetics GENE = new GeneKinetics(0.05, 0.2, 0.5, 4, 0.8, 0.5, 4, 1.0);

    @Test
    void theWrittenOutSwitchStepIsTheGeneralStepBitForBit() {
        SelfActivatingSwitch network = SelfActivatingSwitch.symmetric("A", "B", GENE);
        double[] p = network.defaultParameters();
        double omega = 5.0;
        double dt = 0.05;
        LangevinStepper fused = LangevinStepper.of(network, omega);
        LangevinStepper general = LangevinStepper.of(network, omega);
        RandomStreams streams = RandomStreams.of(20261204L);
        double[][] starts = {{0.0, 0.0}, {1.0, 0.05}, {0.05, 1.0}, {0.3, 0.3}};
        int zeros = 0;
        for (int t = 0; t < 200; t++) {
            UniformRandomProvider drawn = streams.stream(t);
            ZigguratSampler.NormalizedGaussian normals = ZigguratSampler.NormalizedGaussian.of(streams.stream(t));
            double[] x = starts[t % starts.length].clone();
            double[] y = x.clone();
            double[] xi = new double[4];
            for (int s = 0; s < 500; s++) {
                fused.advance(x, p, dt, drawn);
                for (int j = 0; j < 4; j++) {
                    xi[j] = normals.sample();
                }
                general.advance(y, p, dt, xi);
                assertEquals(Double.doubleToRawLongBits(y[0]), Double.doubleToRawLongBits(x[0]),
                        "trajectory " + t + ", step " + s + ": " + y[0] + " against " + x[0]);
                assertEquals(Double.doubleToRawLongBits(y[1]), Double.doubleToRawLongBits(x[1]));
                if (x[0] == 0.0 || x[1] == 0.0) {
                    zeros++;
                }
            }
        }
        // The truncation at zero must have been exercised for the comparison to cover it.
        assertEquals(true, zeros > 100, "steps that hit zero: " + zeros);
    }
}
