package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import org.cellwright.sim.RunEvent;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.TracePoint;
import org.jfree.data.general.AbstractDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

class RunChartModelTest {

    private static RunResult steady;
    private static RunResult limited;

    @BeforeAll
    static void runs() {
        steady = ChartFixtures.run(2.0, 3 * 3600);
        // 2.45 V is reached while the copper runs short (the steady run climbs from 2.2 V to 2.9 V)
        limited = ChartFixtures.runWithVoltageLimit(2.0, 2.45, 3 * 3600);
    }

    @Test
    void stackedBreakdownTopsOutAtTheCellVoltage() {
        for (RunResult r : List.of(steady, limited)) {
            RunChartModel m = RunChartModel.of(r);
            YIntervalSeriesCollection bands = m.voltageParts();
            XYSeries cell = m.cellVoltage().getSeries(0);
            int top = bands.getSeriesCount() - 1;
            assertEquals(RunChartModel.VOLTAGE_PARTS.size(), bands.getSeriesCount());
            assertEquals(r.trace().size(), cell.getItemCount());
            for (int i = 0; i < cell.getItemCount(); i++) {
                // source: the engine's definition U = E_a - E_c + I (R_gap + R_contacts); the parts sum to it
                // exactly, so only floating-point rounding of a few volts is allowed (1e-9 V)
                assertEquals(cell.getY(i).doubleValue(), bands.getEndYValue(top, i), 1e-9,
                        "stack top at item " + i + " of " + r.scenario().supply());
                assertEquals(0.0, bands.getStartYValue(0, i), 0.0);
                for (int k = 1; k <= top; k++) {
                    assertEquals(bands.getEndYValue(k - 1, i), bands.getStartYValue(k, i), 0.0, "bands touch");
                }
            }
        }
        assertTrue(limited.events().stream().anyMatch(e -> e.kind() == RunEvent.Kind.VOLTAGE_LIMIT_ENTERED),
                "the limited run must actually reach its limit, otherwise it tests nothing new");
    }

    @Test
    void aBatchFiresOneChangePerDataset() {
        RunChartModel m = RunChartModel.emptyFor(steady);
        List<AtomicInteger> counts = new ArrayList<>();
        for (AbstractDataset d : m.datasets()) {
            AtomicInteger n = new AtomicInteger();
            d.addChangeListener(e -> n.incrementAndGet());
            counts.add(n);
        }
        m.append(steady.trace().subList(0, 120));
        counts.forEach(n -> assertEquals(1, n.get(), "one event per dataset for 120 points"));
        m.append(steady.trace().subList(120, 121));
        counts.forEach(n -> assertEquals(2, n.get()));
        m.replaceWith(steady.trace().subList(0, 10));
        counts.forEach(n -> assertEquals(3, n.get(), "scrubbing back is one event per dataset too"));
        assertEquals(10, m.pointCount());
        assertEquals(10, m.cellVoltage().getSeries(0).getItemCount());
        m.append(List.of());
        counts.forEach(n -> assertEquals(3, n.get(), "an empty batch fires nothing"));
    }

    @Test
    void resentPointsAreSkipped() {
        RunChartModel m = RunChartModel.emptyFor(steady);
        List<TracePoint> t = steady.trace();
        m.append(t.subList(0, 50));
        m.append(t.subList(40, 60));
        assertEquals(60, m.pointCount());
        assertEquals(60, m.current().getSeries(0).getItemCount());
        assertEquals(t.get(59).timeS(), m.lastTimeS());
    }

    @Test
    void valuesAreInDisplayUnits() {
        RunChartModel m = RunChartModel.of(steady);
        assertEquals(TimeScale.MINUTES, m.timeScale());
        XYSeries cu = m.concentrations().getSeries(m.speciesNames().indexOf("Cu2+"));
        // source: fixture input 200 mol/m3 = 0.200 mol/L (1 L = 1e-3 m3); exact conversion
        assertEquals(0.200, cu.getY(0).doubleValue(), 1e-12);
        // source: fixture input 298.15 K = 25.00 C (SI Brochure 9th ed., 2.3.1); exact conversion
        assertEquals(25.0, m.temperature().getSeries(0).getY(0).doubleValue(), 1e-9);
        // a 3 h run ends at 180 min
        XYSeries v = m.cellVoltage().getSeries(0);
        assertEquals(180.0, v.getX(v.getItemCount() - 1).doubleValue(), 1e-9);

        int i30 = 60; // 30 s output interval: item 60 is at 30 min
        assertEquals(30.0, v.getX(i30).doubleValue(), 1e-9);
        TracePoint p = steady.trace().get(i30);
        // source: Faraday's law m = Q M eta / (n F), F = 96485.33212 C/mol (CODATA 2018),
        // M(Cu) = 63.546 g/mol (IUPAC standard atomic weight); Q = 2 A x 1800 s
        double faradayG = 2.0 * 1800 * 63.546 * p.cumulativeEfficiency() / (2 * 96485.33212);
        // tolerance: the charge is integrated by the engine to its relative tolerance (1e-7); 1e-6 relative
        assertEquals(faradayG, m.deposit().getSeries(0).getY(i30).doubleValue(), faradayG * 1e-6);
        assertTrue(p.cumulativeEfficiency() > 0.95, "copper still carries the current at 30 min");
        // efficiency in %: the cumulative efficiency is a share of 0..1 in the engine
        XYSeries cum = m.efficiency().getSeries(1);
        assertEquals(100 * steady.trace().get(steady.trace().size() - 1).cumulativeEfficiency(),
                cum.getY(cum.getItemCount() - 1).doubleValue(), 1e-9);
    }

    @Test
    void efficiencyHasNoPointBeforeChargeHasPassed() {
        RunChartModel m = RunChartModel.of(steady);
        // the first trace point is at t = 0 with no charge passed: no cumulative efficiency there
        assertEquals(steady.trace().size() - 1, m.efficiency().getSeries(1).getItemCount());
        assertTrue(m.efficiency().getSeries(1).getX(0).doubleValue() > 0);
    }

    @Test
    void timeUnitFollowsTheSpan() {
        assertEquals(TimeScale.MINUTES, TimeScale.forSpan(3 * 3600));
        assertEquals(TimeScale.HOURS, TimeScale.forSpan(3 * 3600 + 1));
        RunResult longRun = ChartFixtures.run(1.0, 4 * 3600);
        RunChartModel m = RunChartModel.of(longRun);
        assertEquals(TimeScale.HOURS, m.timeScale());
        XYSeries i = m.current().getSeries(0);
        assertEquals(4.0, i.getX(i.getItemCount() - 1).doubleValue(), 1e-9);
        assertEquals("time (h)", m.timeScale().axisLabel());
    }
}
