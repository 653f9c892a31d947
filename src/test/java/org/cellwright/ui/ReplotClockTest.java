package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ReplotClockTest {

    private static final long MS = 1_000_000L;

    @Test
    void measuresFromTheChangeToTheLastChartDrawn() {
        ReplotClock c = new ReplotClock();
        assertNull(c.chartDrawn(5 * MS), "nothing expected yet");
        c.expect(100 * MS, 40 * MS, 3);
        assertNull(c.chartDrawn(150 * MS));
        assertNull(c.chartDrawn(160 * MS));
        ReplotClock.Latency l = c.chartDrawn(171 * MS);
        assertEquals(71, l.totalMs(), 1e-9);
        assertEquals(40, l.engineMs(), 1e-9);
        assertNull(c.chartDrawn(180 * MS), "a later repaint is not a replot");
        assertTrue(l.text().contains("71 ms"));
    }

    @Test
    void aNewerResultReplacesTheMeasurementUnderWay() {
        ReplotClock c = new ReplotClock();
        c.expect(0, 10 * MS, 2);
        c.chartDrawn(50 * MS);
        c.expect(60 * MS, 20 * MS, 2);
        assertNull(c.chartDrawn(90 * MS));
        assertEquals(40, c.chartDrawn(100 * MS).totalMs(), 1e-9);
        assertEquals(1, c.history().size());
    }

    @Test
    void medianOfTheMeasurements() {
        ReplotClock c = new ReplotClock();
        assertTrue(Double.isNaN(c.medianMs()));
        long[] totals = {90, 30, 60, 200};
        long t = 0;
        for (long ms : totals) {
            c.expect(t, 0, 1);
            c.chartDrawn(t + ms * MS);
            t += 1000 * MS;
        }
        // sorted 30, 60, 90, 200: the middle two average to 75
        assertEquals(75, c.medianMs(), 1e-9);
    }
}
