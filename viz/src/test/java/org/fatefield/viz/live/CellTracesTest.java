package org.fatefield.viz.live;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.awt.Color;
import java.util.List;
import org.fatefield.engine.cell.Cell;
import org.fatefield.viz.palette.FatePalette;
import org.junit.jupiter.api.Test;

/** The clicked cell's trace (ring buffer, inherited by daughters) and the commitment colours. */
class CellTracesTest {

    private static Cell cell(long id, long parent, double a, double b) {
        return new Cell(id, parent, 0, 0, 10, new double[] {a, b}, new long[] {1L, 2L}, 0, 0, 1.0, 1.0);
    }

    @Test
    void keepsTheLastSamplesOldestFirst() {
        CellTraces traces = new CellTraces(3, 2);
        Cell c = cell(1, -1, 0, 0);
        for (int k = 0; k < 5; k++) {
            c.liveState()[0] = k;
            c.liveState()[1] = 10 * k;
            traces.record(k, List.of(c));
        }
        CellTraces.Trace t = traces.of(1);
        assertEquals(3, t.size());
        for (int k = 0; k < 3; k++) {
            assertEquals(k + 2, t.time(k), 0);
            assertEquals(k + 2, t.value(k, 0), 0);
            assertEquals(10 * (k + 2), t.value(k, 1), 0);
        }
    }

    @Test
    void daughtersStartFromTheirMothersHistoryAndTheDeadAreDropped() {
        CellTraces traces = new CellTraces(10, 2);
        Cell mother = cell(1, -1, 1, 2);
        traces.record(0, List.of(mother));
        traces.record(1, List.of(mother));
        Cell a = cell(2, 1, 0.4, 2);
        Cell b = cell(3, 1, 0.6, 2);
        traces.record(2, List.of(a, b));
        assertNull(traces.of(1));
        assertEquals(3, traces.of(2).size());
        assertEquals(1, traces.of(3).value(1, 0), 0);
        assertEquals(0.4, traces.of(2).value(2, 0), 0);
        assertEquals(0.6, traces.of(3).value(2, 0), 0);
        assertThrows(IllegalArgumentException.class, () -> new CellTraces(1, 2));
    }

    @Test
    void commitmentShadeRunsFromPaleToTheFullFateColour() {
        assertEquals(FatePalette.fate(0, 3), FatePalette.held(0, 3, 1.0));
        assertEquals(FatePalette.fate(0, 3), FatePalette.held(0, 3, 7.0));
        assertEquals(FatePalette.fate(2, 3), FatePalette.held(2, 3, 0.5), "the default fate stays grey");
        Color fresh = FatePalette.held(0, 3, 0.0);
        Color half = FatePalette.held(0, 3, 0.5);
        Color full = FatePalette.fate(0, 3);
        // Linear blend from white: 20 % of the fate colour at the switch, 60 % half a cycle later.
        assertEquals(Math.round(255 + (full.getBlue() - 255) * 0.2), fresh.getBlue());
        assertEquals(Math.round(255 + (full.getBlue() - 255) * 0.6), half.getBlue());
    }
}
