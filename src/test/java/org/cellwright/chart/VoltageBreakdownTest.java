package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.cellwright.sim.RunResult;
import org.junit.jupiter.api.Test;

/** The voltage breakdown's parts add up to the cell voltage; its average matches the summary's. */
class VoltageBreakdownTest {

    @Test
    void partsAddUpToTheCellVoltage() {
        RunResult r = ReportFixture.tin();
        VoltageBreakdown b = VoltageBreakdown.of(r);
        for (int k = 0; k < 3; k++) {
            double sum = 0;
            for (VoltageBreakdown.Part p : b.parts()) {
                sum += k == 0 ? p.start() : k == 1 ? p.mean() : p.end();
            }
            // source: Kirchhoff's voltage law over the cell: U = (Ea - Ec) + |eta_a| + |eta_c| + I R; the engine
            // forms the parts from the same operating point, so only rounding separates them
            assertEquals(b.cellVoltage()[k], sum, 1e-9, "column " + k);
        }
        // source: the summary's start and end voltages are the first and last trace points
        assertEquals(r.summary().cellVoltageStartV(), b.cellVoltage()[0], 0.0);
        assertEquals(r.summary().cellVoltageEndV(), b.cellVoltage()[2], 0.0);
        // the summary integrates U dt exactly, the breakdown by trapezoids over 1 min points; the voltage
        // rises within the first minute, so 1 % allows that first interval's share (1/360 of the run)
        assertEquals(r.summary().cellVoltageMeanV(), b.cellVoltage()[1], 0.01 * r.summary().cellVoltageMeanV());
    }
}
