package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.cellwright.cell.ControlMode;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.SetPoint;
import org.cellwright.cell.StopCondition;
import org.junit.jupiter.api.Test;

/** The bench supply's limits and schedules, and events located at their times by root finding. */
class SupplyAndEventsTest {

    private static final double F = 96485.33212331001;

    @Test
    void speciesTargetStopsTheRunAtTheAnalyticTime() {
        // 1 A for copper at 50 mol/m3 in 1 L, well below the limiting current: linear depletion
        Scenario base = TestScenarios.copperBatch(0.001, 0.01, 20e-6, 50.0, 1.0, 6 * 3600, 60);
        Scenario sc = base.withRun(new RunSettings(6 * 3600, 60, List.of(new StopCondition.SpeciesBelow("Cu2+", 30.0)), "Cu"));
        RunResult r = CellSimulation.withDefaults().run(sc, TestChemistry.library(10), null);
        // source: Faraday's law, c(t) = c0 - I t/(n F V): 30 mol/m3 is reached at n F V (c0 - c)/I
        double expected = 2 * F * 0.001 * 20.0 / 1.0;
        assertEquals("target", r.summary().stopReason());
        // the efficiency is 1 - 3e-6 here (hydrogen at +0.3 V), so allow 1e-5 relative
        assertEquals(expected, r.summary().durationS(), expected * 1e-5);
        assertTrue(r.events().stream().anyMatch(e -> e.kind() == RunEvent.Kind.SPECIES_TARGET));
    }

    @Test
    void benchSupplySwitchesToItsVoltageLimitAndRecordsIt() {
        Scenario base = TestScenarios.copperBatch(0.001, 0.01, 50e-6, 50.0, 1.0, 3 * 3600, 60);
        double limit = 2.3;
        Scenario sc = base.withSupply(new PowerSupply(ControlMode.CURRENT, 1.0, 0, limit, Double.POSITIVE_INFINITY, List.of()));
        RunResult r = CellSimulation.withDefaults().run(sc, TestChemistry.library(10), null);
        RunEvent entered = r.events().stream().filter(e -> e.kind() == RunEvent.Kind.VOLTAGE_LIMIT_ENTERED)
                .findFirst().orElseThrow(() -> new AssertionError("no voltage-limit event: " + r.events()));
        int limited = 0;
        for (TracePoint p : r.trace()) {
            InstantState s = p.state();
            if (p.timeS() > entered.timeS() + 1) {
                assertTrue(s.supplyLimited(), "limited after the event at " + p.timeS());
                assertEquals(limit, s.cellVoltageV(), 1e-6, "held at the limit at " + p.timeS());
                assertTrue(s.currentA() < 1.0, "current below its set value at " + p.timeS());
                limited++;
            } else if (p.timeS() < entered.timeS() - 1) {
                assertEquals(1.0, s.currentA(), 1e-12, "set current before the event at " + p.timeS());
                assertTrue(s.cellVoltageV() < limit);
            }
        }
        assertTrue(limited > 10, "the run must spend time at the limit");
    }

    @Test
    void benchSupplyReturnsToItsSetCurrentWhenTheCellNeedsLessVoltage() {
        Scenario base = TestScenarios.copperBatch(0.001, 0.01, 50e-6, 50.0, 1.0, 4 * 3600, 60);
        List<SetPoint> schedule = List.of(new SetPoint(0, 1.0, false), new SetPoint(3 * 3600, 0.05, false));
        Scenario sc = base.withSupply(new PowerSupply(ControlMode.CURRENT, 0, 0, 2.3, Double.POSITIVE_INFINITY, schedule));
        RunResult r = CellSimulation.withDefaults().run(sc, TestChemistry.library(10), null);
        List<RunEvent.Kind> kinds = r.events().stream().map(RunEvent::kind).toList();
        int in = kinds.indexOf(RunEvent.Kind.VOLTAGE_LIMIT_ENTERED);
        int out = kinds.indexOf(RunEvent.Kind.VOLTAGE_LIMIT_LEFT);
        assertTrue(in >= 0 && out > in, "enters, then leaves the voltage limit: " + kinds);
        assertEquals(3 * 3600, r.events().get(out).timeS(), 1.0, "leaves it when the set current steps down");
        assertEquals(0.05, currentAt(r, 3.5 * 3600), 1e-12);
    }

    @Test
    void scheduleStepsAndRampsPassTheirCharge() {
        Scenario base = TestScenarios.copperBatch(0.002, 0.01, 20e-6, 200.0, 1.0, 3 * 3600, 60);
        List<SetPoint> schedule = List.of(new SetPoint(0, 2.0, false), new SetPoint(3600, 1.0, false),
                new SetPoint(7200, 0.5, true), new SetPoint(9000, 0.5, false));
        Scenario sc = base.withSupply(new PowerSupply(ControlMode.CURRENT, 0, 0, Double.POSITIVE_INFINITY,
                Double.POSITIVE_INFINITY, schedule));
        RunResult r = CellSimulation.withDefaults().run(sc, TestChemistry.library(10), null);
        // source: integral of the schedule (a ramp point ramps from the previous point): 2 A x 1 h, then
        // 1 A -> 0.5 A linearly over the second hour (mean 0.75 A), then 0.5 A for the last hour
        double expected = 2 * 3600 + 0.75 * 3600 + 0.5 * 3600;
        assertEquals(expected, r.summary().chargeC(), expected * 1e-9);
        assertEquals(2.0, currentAt(r, 1800), 1e-12);
        assertEquals(0.75, currentAt(r, 5400), 1e-12);
        assertEquals(0.5, currentAt(r, 8100), 1e-12);
        assertEquals(0.5, currentAt(r, 9600), 1e-12);
    }

    @Test
    void temperatureLimitStopsWhenTheBathReachesIt() {
        Scenario base = TestScenarios.copperBatch(0.0005, 0.01, 20e-6, 500.0, 3.0, 8 * 3600, 60);
        Scenario sc = base.withCell(new org.cellwright.cell.CellSetup(0.05, base.cell().agitation(), 298.15, 0.0, 0.05))
                .withRun(new RunSettings(8 * 3600, 60, List.of(new StopCondition.TemperatureAbove(303.15)), "Cu"));
        RunResult r = CellSimulation.withDefaults().run(sc, TestChemistry.library(10), null);
        assertEquals("temperature_limit", r.summary().stopReason());
        assertEquals(303.15, r.summary().temperatureEndK(), 1e-4);
    }

    private static double currentAt(RunResult r, double t) {
        return r.trace().stream().filter(p -> Math.abs(p.timeS() - t) < 1e-6).findFirst().orElseThrow()
                .state().currentA();
    }
}
