package org.fatefield.engine.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.fatefield.engine.coupling.CouplingLaw;
import org.fatefield.engine.coupling.SignalCoupling;
import org.junit.jupiter.api.Test;

class TimeAndTableTest {

    @Test
    void piecewiseLinearInterpolatesAndHoldsItsEnds() {
        PiecewiseLinear f = PiecewiseLinear.of(new double[] {0, 2, 4}, new double[] {1, 3, -1});
        assertEquals(1.0, f.at(-5), 0.0);
        assertEquals(2.0, f.at(1), 1e-15);
        assertEquals(1.0, f.at(3), 1e-15);
        assertEquals(-1.0, f.at(10), 0.0);
        assertThrows(IllegalArgumentException.class, () -> PiecewiseLinear.of(new double[] {0, 0}, new double[] {1,
                2}));
    }

    @Test
    void aSourceSwitchedOnLaterLeavesTheFieldEmptyUntilThen() {
        // Synthesis off until 2 h, on from 2.5 h: the field stays exactly zero for the first 2 h,
        // and afterwards follows a constant source started at 2.5 h to within the ramp's effect.
        PiecewiseLinear pulse = PiecewiseLinear.of(new double[] {2.0, 2.5}, new double[] {0.0, 1.0});
        MorphogenField delayed = new MorphogenField(MorphogenSpec.of(100, 1, 5, 0, List.of(new SourceRegion(0, 0, 10,
                50, 2.0, pulse))), 100, 50, false);
        for (int i = 0; i < 200; i++) {
            delayed.advance(0.01);
        }
        assertEquals(0.0, delayed.max(), 0.0);
        for (int i = 0; i < 800; i++) {
            delayed.advance(0.01);
        }
        MorphogenField constant = new MorphogenField(MorphogenSpec.of(100, 1, 5, 0, List.of(new SourceRegion(0, 0, 10,
                50, 2.0))), 100, 50, false);
        for (int i = 0; i < 775; i++) {
            constant.advance(0.01);
        }
        // A linear ramp over 0.5 h delivers the same synthesis as a step at its midpoint, to first order.
        assertEquals(constant.max(), delayed.max(), 0.01 * constant.max());
        assertTrue(delayed.max() > 0.1);
    }

    @Test
    void tableCouplingReadsTheTable() {
        SignalCoupling c = SignalCoupling.of("r", new int[] {0},
                new CouplingLaw.Table(PiecewiseLinear.of(new double[] {0, 1}, new double[] {0.2, 2.0})));
        assertEquals(1.1, c.valueAt(0.5), 1e-15);
        assertEquals(2.0, c.valueAt(7), 0.0);
    }
}
