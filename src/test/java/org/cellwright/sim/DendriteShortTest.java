package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.junit.jupiter.api.Test;

/**
 * A tin dendrite grows from the cathode toward the anode (the tip model of
 * {@link org.cellwright.sim.deposit.TipGrowth}) and shorts the cell when it gets there: the time of the short
 * is root-found, the run stops there when asked, and otherwise goes on with the cell a resistor. A tin-refining
 * cell (tin anode, so the bath keeps its tin) at 25 C gives steady conditions.
 */
class DendriteShortTest {

    private static final double DAY = 86400;

    private static Scenario refining(double gapM, double layerM, double amps, double durationS) {
        return DepositScenarios.cell(DepositScenarios.tinChloride(30, 1.0, Map.of()), 0.002, "stainless", "tin",
                0.01, gapM, layerM, amps, durationS, 600, "Sn");
    }

    private static double shortTime(Scenario sc) {
        RunResult r = DepositScenarios.run(DepositScenarios.stoppingAtShort(sc));
        return r.summary().shortCircuitS() == null ? Double.POSITIVE_INFINITY : r.summary().shortCircuitS();
    }

    @Test
    void timeToShortGrowsWithTheGap() {
        // beyond tin's limiting current in a still bath (300 um): the tip leaves the diffusion layer within
        // minutes, then crosses the gap at the spherical-diffusion speed V_m D c0 / r = 3 um/s
        double t5 = shortTime(refining(0.005, 300e-6, 1.5, DAY));
        double t10 = shortTime(refining(0.010, 300e-6, 1.5, DAY));
        double t20 = shortTime(refining(0.020, 300e-6, 1.5, DAY));
        assertTrue(t5 < t10 && t10 < t20, t5 + " < " + t10 + " < " + t20);
        // source: formula 6 of the physics reference (t_short = t_onset + gap / v_tip): the extra 10 mm take
        // 10 mm / v_tip; v_tip = V_m D c0 / r with the bath's D at 25 C, c0 = 30 g/L, r = 1 um (formula 2 with fast
        // kinetics). Tolerance 5 %: the tip is partly under kinetic control and the curvature term slows it.
        double vTip = (0.11871 / 7287) * 0.75e-9 * (30 / 118.71 * 1000) / 1e-6;
        assertEquals(0.010 / vTip, t20 - t10, 0.05 * 0.010 / vTip);
    }

    @Test
    void timeToShortGrowsWithAgitation() {
        // at 1.5 A/dm2: still (300 um) puts tin beyond its limiting current, natural convection (200 um) at 82 %
        // of it, gentle stirring (100 um) at 41 %; the tip's growth inside the layer scales as rho^2 / delta^2
        // (Despic and Popov's amplification, rho = i/iL), so each step of agitation delays the short a great
        // deal, and the gently stirred cell does not short within three days. (Beyond the limiting current
        // agitation no longer helps: the tip outside the layer grows at the bulk concentration whatever the
        // layer; stirring helps by bringing the current under the limit.)
        double still = shortTime(refining(0.010, 300e-6, 1.5, 3 * DAY));
        double natural = shortTime(refining(0.010, 200e-6, 1.5, 3 * DAY));
        double gentle = shortTime(refining(0.010, 100e-6, 1.5, 3 * DAY));
        assertTrue(still < 2 * 3600, "still: " + still);
        assertTrue(natural > 10 * still && natural < 3 * DAY, "natural: " + natural);
        assertTrue(Double.isInfinite(gentle), "gentle: " + gentle);
    }

    @Test
    void timeToShortFallsWithCurrent() {
        // still bath, 10 mm: at 1 A/dm2 tin works at 82 % of its limit and no short comes within a day; from
        // 1.2 A/dm2 (98 %) on, each step of current brings it sooner
        assertTrue(Double.isInfinite(shortTime(refining(0.010, 300e-6, 1.0, DAY))));
        double previous = DAY;
        for (double amps : new double[] {1.2, 1.5, 2.0, 3.0}) {
            double t = shortTime(refining(0.010, 300e-6, amps, DAY));
            assertTrue(t < previous, amps + " A: " + t + " after " + previous);
            previous = t;
        }
    }

    @Test
    void theShortIsRootFoundAndStopsTheRunWhenAsked() {
        Scenario sc = refining(0.010, 300e-6, 1.5, DAY);
        RunResult stopped = DepositScenarios.run(DepositScenarios.stoppingAtShort(sc));
        RunSummary s = stopped.summary();
        assertEquals("short_circuit", s.stopReason());
        assertNotNull(s.shortCircuitS());
        assertEquals(s.shortCircuitS(), s.durationS(), 1e-9);
        assertNull(s.shortCircuitForecastS());
        assertTrue(stopped.events().stream().anyMatch(e -> e.kind() == RunEvent.Kind.SHORT_CIRCUIT
                && Math.abs(e.timeS() - s.shortCircuitS()) < 1e-9));
        // the tip stands at the anode at the event: located to 1e-6 s (3 pm of tip travel)
        TracePoint last = stopped.trace().get(stopped.trace().size() - 1);
        assertEquals(0.010, last.state().dendriteHeightM(), 1e-9);
        // the same instant whatever the output interval: the event is root-found, not sampled
        Scenario coarse = sc.withRun(new RunSettings(DAY, 1800, List.of(new org.cellwright.cell.StopCondition.ShortCircuit()), "Sn"));
        assertEquals(s.shortCircuitS(), DepositScenarios.run(coarse).summary().shortCircuitS(), 1e-3);
    }

    @Test
    void withoutTheStopTheShortedCellConductsAndTheDepositStopsGrowing() {
        Scenario sc = refining(0.010, 300e-6, 1.5, 3 * 3600);
        RunResult r = DepositScenarios.run(sc);
        Double shortS = r.summary().shortCircuitS();
        assertNotNull(shortS);
        assertEquals("end", r.summary().stopReason());
        assertEquals(3 * 3600, r.summary().durationS(), 1e-6);
        double depositAtShort = Double.NaN;
        for (TracePoint p : r.trace()) {
            if (p.timeS() <= shortS) {
                depositAtShort = p.depositTotalKg();
                continue;
            }
            InstantState s = p.state();
            assertTrue(s.shorted());
            // the short's resistance (50 mohm, the default) and no contact resistance here: U = I R_short
            assertEquals(1.5 * 0.05, s.cellVoltageV(), 1e-12, "collapsed at " + p.timeS());
            assertEquals(0, s.targetEfficiency(), 0);
            assertNull(s.morphology());
            assertEquals(0.010, s.dendriteHeightM(), 1e-9);
        }
        // what deposited until the short stays (nothing redissolves in a refining bath without oxidants)
        assertEquals(r.trace().get(r.trace().size() - 1).depositTotalKg(),
                depositAtShort + (r.trace().stream().filter(p -> p.timeS() > shortS).findFirst().orElseThrow()
                        .depositTotalKg() - depositAtShort), 1e-12);
        assertTrue(r.summary().warnings().stream().anyMatch(w -> w.startsWith("Short circuit: at ")),
                r.summary().warnings().toString());
        assertTrue(r.summary().currentEfficiency() < DepositScenarios.at(r, 3600).cumulativeEfficiency());
    }

    @Test
    void theForecastAtFrozenConditionsMeetsTheShortThatFollows() {
        // halfway to the short, the forecast integrates the tip model at the conditions then; in a refining cell
        // they hardly change (the bath gains 1 % of tin from the anode's full efficiency), so the forecast and
        // the short agree to 2 %
        double shortS = shortTime(refining(0.010, 300e-6, 1.5, DAY));
        RunResult half = DepositScenarios.run(refining(0.010, 300e-6, 1.5, 1800));
        assertNull(half.summary().shortCircuitS());
        Double forecast = half.summary().shortCircuitForecastS();
        assertNotNull(forecast);
        assertEquals(shortS, forecast, 0.02 * shortS);
        assertTrue(half.summary().warnings().stream().anyMatch(w -> w.startsWith("Dendrites: ")));
        // far below the limit no short is foreseen
        RunResult calm = DepositScenarios.run(refining(0.010, 30e-6, 0.5, 1800));
        assertNull(calm.summary().shortCircuitForecastS());
    }
}
