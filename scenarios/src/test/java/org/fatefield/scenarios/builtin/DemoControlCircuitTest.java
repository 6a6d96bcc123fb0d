package org.fatefield.scenarios.builtin;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import org.fatefield.circuits.analysis.QuasiPotential;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.SpecialPoint;
import org.fatefield.engine.control.ControlCircuit;
import org.fatefield.scenarios.format.ScenarioReader;
import org.junit.jupiter.api.Test;

/**
 * The demo circuit along its control parameter: a symmetric toggle whose symmetric state loses
 * stability at a pitchfork, bistable from there to the top of the coupling's range.
 */
class DemoControlCircuitTest {

    @Test
    void mostMultistableValueIsTheMiddleOfTheBistableStretchAndItsWellsAreEquallyDeep() throws Exception {
        var scenario = ScenarioReader.parse("demo", "demo", BuiltinScenarios.bytes("demo").orElseThrow());
        ControlCircuit circuit = ControlCircuit.of(scenario.tissue(), 60);
        assertNotNull(circuit);
        double pitchfork = Double.NaN;
        for (Branch b : circuit.branches()) {
            for (SpecialPoint p : b.specials()) {
                pitchfork = p.parameter();
            }
        }
        double hi = 2.0;
        // The bistable stretch runs from the pitchfork to the range's top; the scan of 81 values
        // places its middle to within one scan spacing.
        double spacing = (hi - 0.2) / 80;
        assertEquals(0.5 * (pitchfork + hi), circuit.mostMultistable(), spacing);
        // Mirror symmetry of the toggle (swap the two species): the two wells of the stationary
        // distribution are equally deep; on the mirror-symmetric grid the solved minima of U agree
        // to round-off (1e-9 allows for the error accumulated by the elimination).
        QuasiPotential u = circuit.landscape().apply(circuit.mostMultistable());
        double lowerLeft = Double.POSITIVE_INFINITY;
        double upperRight = Double.POSITIVE_INFINITY;
        for (int j = 0; j < u.ys().length; j++) {
            for (int i = 0; i < u.xs().length; i++) {
                if (u.ys()[j] > u.xs()[i]) {
                    lowerLeft = Math.min(lowerLeft, u.u()[j][i]);
                } else if (u.ys()[j] < u.xs()[i]) {
                    upperRight = Math.min(upperRight, u.u()[j][i]);
                }
            }
        }
        assertEquals(lowerLeft, upperRight, 1e-9);
    }
}
