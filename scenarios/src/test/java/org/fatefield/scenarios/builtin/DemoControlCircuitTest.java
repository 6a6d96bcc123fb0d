package org.fatefield.scenarios.builtin;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.util.List;
import org.fatefield.circuits.analysis.QuasiPotential;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.MultistableRanges;
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
    void bistableFromThePitchforkToTheTopAndEqualWellsAtTheMiddleOfTheRange() throws Exception {
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
        // The bistable range read off the diagram runs from the located pitchfork to the range's top.
        List<MultistableRanges.Range> bistable = MultistableRanges.of(circuit.branches());
        assertEquals(1, bistable.size(), bistable.toString());
        assertEquals(pitchfork, bistable.get(0).from(), 1e-9, "starts at the located pitchfork");
        assertEquals(hi, bistable.get(0).to(), 1e-12);
        assertEquals(0.5 * (0.2 + hi), circuit.middle(), 1e-12);
        // Mirror symmetry of the toggle (swap the two species): the two wells of the stationary
        // distribution are equally deep; on the mirror-symmetric grid the solved minima of U agree
        // to round-off (1e-9 allows for the error accumulated by the elimination).
        QuasiPotential u = circuit.landscape().apply(circuit.middle());
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
