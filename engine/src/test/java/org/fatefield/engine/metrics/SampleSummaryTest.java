package org.fatefield.engine.metrics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The replicate summary against hand-computed values and a printed t table. */
class SampleSummaryTest {

    @Test
    void meanSdAndStudentTIntervalOfOneToFive() {
        // Mean 3 and sample SD sqrt(2.5) by hand; t(4, 0.975) = 2.776 (Abramowitz & Stegun 1964,
        // Handbook of Mathematical Functions, table 26.10), so the half-width is 2.776 * sqrt(2.5 / 5).
        SampleSummary s = SampleSummary.of(new double[] {1, 2, Double.NaN, 3, 4, 5});
        assertEquals(5, s.count());
        assertEquals(3.0, s.mean(), 1e-12);
        assertEquals(Math.sqrt(2.5), s.sd(), 1e-12);
        double half = 2.776 * Math.sqrt(2.5 / 5);
        assertEquals(3.0 - half, s.low(), 1e-3);
        assertEquals(3.0 + half, s.high(), 1e-3);
    }

    @Test
    void oneOrNoValuesHaveNoSpread() {
        SampleSummary one = SampleSummary.of(new double[] {7.5, Double.POSITIVE_INFINITY});
        assertEquals(1, one.count());
        assertEquals(7.5, one.mean(), 0.0);
        assertTrue(Double.isNaN(one.sd()) && Double.isNaN(one.low()) && Double.isNaN(one.high()));
        SampleSummary none = SampleSummary.of(new double[] {Double.NaN});
        assertEquals(0, none.count());
        assertTrue(Double.isNaN(none.mean()));
    }
}
