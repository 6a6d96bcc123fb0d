package org.fatefield.circuits.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.junit.jupiter.api.Test;

class BasinMapTest {

    @Test
    void symmetricSwitchBasinsAreSplitByTheDiagonal() {
        // A symmetric switch is invariant under swapping the genes, so the separatrix is the
        // diagonal A = B (symmetry; common practice).
        SelfActivatingSwitch sw = SelfActivatingSwitch.symmetric("A", "B",
                new GeneKinetics(0.05, 0.2, 0.5, 4, 1.0, 0.5, 4, 1.0));
        double[] p = sw.defaultParameters();
        List<SteadyState> stable = SteadyStateFinder.of(sw).find(p, new double[] {0, 0}, new double[] {3, 3})
                .stream().filter(SteadyState::isStable).toList();
        assertEquals(2, stable.size());
        BasinMap map = BasinMap.compute(sw, p, new double[] {0, 0}, stable, 0, 1, new double[] {0, 0},
                new double[] {2, 2}, 21);
        int highA = stable.get(0).state()[0] > stable.get(0).state()[1] ? 0 : 1;
        for (int j = 0; j < map.ys().length; j++) {
            for (int i = 0; i < map.xs().length; i++) {
                double diff = map.xs()[i] - map.ys()[j];
                if (Math.abs(diff) > 0.05) {
                    assertEquals(diff > 0 ? highA : 1 - highA, map.attractor()[j][i], "at " + map.xs()[i] + "," + map.ys()[j]);
                }
            }
        }
    }
}
