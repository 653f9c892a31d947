package org.cellwright.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Percentiles by Hyndman and Fan's definition 7, against hand computation. */
class PercentilesTest {

    @Test
    void oneToTenByHand() {
        Percentiles p = Percentiles.of(new double[] {7, 1, 10, 3, 2, 9, 4, 6, 5, 8});
        // source: Hyndman & Fan (1996) definition 7, h = (n - 1) p: p5 -> h = 0.45, x = 1 + 0.45 (2 - 1) = 1.45;
        // p50 -> h = 4.5, x = 5.5; p95 -> h = 8.55, x = 9.55 (NumPy's default percentile gives the same)
        assertEquals(1.45, p.p5(), 1e-12);
        assertEquals(5.5, p.p50(), 1e-12);
        assertEquals(9.55, p.p95(), 1e-12);
        assertEquals(10, p.count());
    }

    @Test
    void missingValuesAreLeftOutAndTooFewGiveNothing() {
        Percentiles p = Percentiles.of(new double[] {Double.NaN, 2, 4, Double.POSITIVE_INFINITY, 6});
        assertEquals(3, p.count());
        // source: definition 7 on {2, 4, 6}: p50 -> h = 1, x = 4; p5 -> h = 0.1, x = 2.2
        assertEquals(4, p.p50(), 1e-12);
        assertEquals(2.2, p.p5(), 1e-12);
        assertTrue(Double.isNaN(Percentiles.of(new double[] {1, Double.NaN, 2}).p50()));
    }
}
