package org.cellwright.study;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import org.cellwright.cell.Scenario;
import org.junit.jupiter.api.Test;

/** The sweep's grid, its parallel runs against Faraday's law, failed points, progress and cancellation. */
class SweepTest {

    private static SweepAxis amps(double... values) {
        List<AxisValue> v = new ArrayList<>();
        for (double a : values) {
            v.add(new AxisValue(a + " A", a, a));
        }
        return new SweepAxis("supply.current", "A", v, false);
    }

    private static SweepAxis hours(double... values) {
        List<AxisValue> v = new ArrayList<>();
        for (double h : values) {
            v.add(new AxisValue(h + " h", h, h * 3600));
        }
        return new SweepAxis("run.duration", "h", v, false);
    }

    /** Silver refining at the point's current (A) for the point's duration. */
    private static final PointScenarios SILVER = p -> StudyScenarios.silverRefining(p.values().get(0).si(),
            p.values().size() > 1 ? p.values().get(1).si() : 3600);

    @Test
    void theGridIsRowMajorWithTheFirstKeySlowest() {
        Sweep sweep = new Sweep(List.of(amps(1, 2, 3), hours(1, 2)), SILVER, ScenarioRunner.engine(StudyScenarios.library()));
        List<GridPoint> grid = sweep.grid();
        assertEquals(6, grid.size());
        assertArrayEquals(new int[] {0, 1}, grid.get(1).indices());
        assertArrayEquals(new int[] {1, 0}, grid.get(2).indices());
        assertArrayEquals(new int[] {2, 1}, grid.get(5).indices());
        assertEquals("3.0 A", grid.get(5).values().get(0).text());
        assertEquals(7200.0, grid.get(5).values().get(1).si());
    }

    @Test
    void everyPointDepositsWhatFaradaysLawGivesInParallel() {
        Sweep sweep = new Sweep(List.of(amps(1, 2.5, 4), hours(0.5, 2)), SILVER,
                ScenarioRunner.engine(StudyScenarios.library()));
        SweepResult r = sweep.run(2, StudyProgress.NONE, Cancellation.none());
        assertEquals(6, r.okCount());
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 2; j++) {
                SweepPoint p = r.at(i, j);
                double amps = p.point().values().get(0).si();
                double seconds = p.point().values().get(1).si();
                // source: Faraday's law m = I t M / (z F), z = 1 for Ag+ (physics-data section 1); a soluble
                // silver anode keeps the bath level and the current efficiency at 1. Tolerance 0.5 %: the
                // engine's charge balance is exact to 1e-9, the rest is the integrator's relative tolerance.
                double expected = amps * seconds * StudyScenarios.AG_KG_PER_MOL / StudyScenarios.F;
                assertEquals(expected, p.summary().depositKg().get("Ag"), 5e-3 * expected, "point " + i + "," + j);
                assertEquals(expected, SummaryFigure.DEPOSIT.si(p.summary()), 5e-3 * expected);
            }
        }
    }

    @Test
    void parallelRunsGiveTheSameFiguresAsOneThread() {
        Sweep sweep = new Sweep(List.of(amps(1, 2, 3, 4, 5)), SILVER, ScenarioRunner.engine(StudyScenarios.library()));
        SweepResult one = sweep.run(1, StudyProgress.NONE, Cancellation.none());
        SweepResult two = sweep.run(2, StudyProgress.NONE, Cancellation.none());
        for (int i = 0; i < 5; i++) {
            // the engine is deterministic: the thread a run lands on must not change a single bit
            assertEquals(one.points().get(i).summary().energyJ(), two.points().get(i).summary().energyJ(), 0.0);
        }
        assertEquals(2, two.threads());
    }

    @Test
    void invalidAndFailingPointsAreKeptWithTheirReasonAndTheOthersRun() {
        PointScenarios some = p -> {
            double a = p.values().get(0).si();
            if (a == 2) {
                throw new IllegalArgumentException("supply.current: must be > 0 A");
            }
            return StudyScenarios.silverRefining(a, 3600);
        };
        ScenarioRunner engine = ScenarioRunner.engine(StudyScenarios.library());
        ScenarioRunner breaksAtThree = sc -> {
            if (sc.supply().currentA() == 3) {
                throw new IllegalStateException("integrator diverged");
            }
            return engine.run(sc);
        };
        SweepResult r = new Sweep(List.of(amps(1, 2, 3, 4)), some, breaksAtThree)
                .run(2, StudyProgress.NONE, Cancellation.none());
        assertEquals(2, r.okCount());
        assertEquals(SweepPoint.Status.INVALID, r.points().get(1).status());
        assertEquals("supply.current: must be > 0 A", r.points().get(1).message());
        assertNull(r.points().get(1).scenario());
        assertEquals(SweepPoint.Status.FAILED, r.points().get(2).status());
        assertTrue(r.points().get(2).message().contains("integrator diverged"), r.points().get(2).message());
        assertNotNull(r.points().get(2).scenario());
        assertTrue(Double.isNaN(r.points().get(1).si(SummaryFigure.EFFICIENCY)));
        assertEquals(2, r.failures().size());
    }

    @Test
    void progressCountsEveryRunAndCancellationLeavesTheRestOut() {
        AtomicInteger calls = new AtomicInteger();
        AtomicInteger lastTotal = new AtomicInteger();
        Sweep sweep = new Sweep(List.of(amps(1, 2, 3, 4, 5, 6)), SILVER, ScenarioRunner.engine(StudyScenarios.library()));
        sweep.run(2, (done, total) -> {
            calls.incrementAndGet();
            lastTotal.set(total);
        }, Cancellation.none());
        assertEquals(6, calls.get());
        assertEquals(6, lastTotal.get());

        Cancellation cancel = Cancellation.none();
        SweepResult r = sweep.run(1, (done, total) -> {
            if (done == 2) {
                cancel.cancel();
            }
        }, cancel);
        assertTrue(r.cancelled());
        assertEquals(2, r.okCount());
        assertEquals(SweepPoint.Status.NOT_RUN, r.points().get(5).status());
    }

    @Test
    void aSweepTakesOneOrTwoDistinctKeys() {
        PointScenarios any = p -> {
            throw new IllegalArgumentException("unused");
        };
        ScenarioRunner none = sc -> {
            throw new IllegalStateException("unused");
        };
        assertThrows(IllegalArgumentException.class, () -> new Sweep(List.of(), any, none));
        assertThrows(IllegalArgumentException.class, () -> new Sweep(List.of(amps(1), amps(2)), any, none));
        assertThrows(IllegalArgumentException.class, () -> new Sweep(List.of(amps(1), hours(1), hours(2)), any, none));
    }

    @Test
    void theFiguresReadTheSummaryInSiAndDisplayUnits() {
        Scenario sc = StudyScenarios.silverRefining(3, 3600);
        var s = ScenarioRunner.engine(StudyScenarios.library()).run(sc).summary();
        // source: 1 kWh = 3.6e6 J, 1 W h = 3600 J (SI Brochure, 9th ed., table 8)
        assertEquals(s.specificEnergyJPerKg() / 3.6e6, SummaryFigure.SPECIFIC_ENERGY.display(s), 1e-12);
        assertEquals(s.energyJ() / 3600, SummaryFigure.ENERGY.display(s), 1e-12);
        // source: 0 C = 273.15 K (SI Brochure, 2.3.1)
        assertEquals(s.temperatureMaxK() - 273.15, SummaryFigure.TEMPERATURE_MAX.display(s), 1e-12);
        assertEquals(100 * s.currentEfficiency(), SummaryFigure.EFFICIENCY.display(s), 1e-12);
        assertEquals(SummaryFigure.VOLTAGE_MEAN, SummaryFigure.find("Voltage_Mean").orElseThrow());
        assertTrue(SummaryFigure.find("speed").isEmpty());
    }
}
