package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class KnobScaleTest {

    @Test
    void logScaleHasTheGeometricMeanInTheMiddle() {
        KnobScale s = new KnobScale(2, 200, true, false);
        assertEquals(2, s.valueAt(0), 1e-12);
        assertEquals(200, s.valueAt(KnobScale.STEPS), 1e-12);
        // geometric mean of 2 and 200 is 20
        assertEquals(20, s.valueAt(KnobScale.STEPS / 2), 1e-12);
    }

    @Test
    void linearScaleHasTheMeanInTheMiddle() {
        KnobScale s = new KnobScale(5, 95, false, false);
        assertEquals(50, s.valueAt(KnobScale.STEPS / 2), 1e-12);
    }

    @Test
    void reversedScaleRunsFromMaxToMin() {
        KnobScale s = new KnobScale(5, 600, true, true);
        assertEquals(600, s.valueAt(0), 1e-9);
        assertEquals(5, s.valueAt(KnobScale.STEPS), 1e-12);
        assertTrue(s.valueAt(100) > s.valueAt(200), "moving right thins the layer");
    }

    @Test
    void positionsRoundTripAndClamp() {
        for (KnobScale s : new KnobScale[] {new KnobScale(0.05, 30, true, false), new KnobScale(5, 95, false, false),
                new KnobScale(5, 600, true, true)}) {
            for (int pos = 0; pos <= KnobScale.STEPS; pos++) {
                assertEquals(pos, s.positionOf(s.valueAt(pos)), s + " at " + pos);
            }
            assertEquals(s.positionOf(s.min()), s.positionOf(s.min() / 10), "below the scale clamps to its end");
            assertEquals(s.positionOf(s.max()), s.positionOf(s.max() * 10));
            assertEquals(s.valueAt(0), s.valueAt(-5), 0);
        }
    }

    @Test
    void rejectsEmptyOrNonPositiveLogScales() {
        assertThrows(IllegalArgumentException.class, () -> new KnobScale(5, 5, false, false));
        assertThrows(IllegalArgumentException.class, () -> new KnobScale(0, 5, true, false));
    }
}
