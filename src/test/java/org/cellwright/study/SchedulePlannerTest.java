package org.cellwright.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.CancellationException;

import org.cellwright.cell.Scenario;
import org.cellwright.cell.SetPoint;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;
import org.cellwright.sim.TracePoint;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The planner on a silver winning batch that follows the textbook batch law, so that its times can be checked
 * against the closed forms: at constant current {@code (R - 1) tau}, in N equal-ratio steps
 * {@code N (R^(1/N) - 1) tau}, following the limit {@code ln(R) tau}, with {@code tau = V / (F k_m A)} and R
 * the ratio of start to end concentration.
 */
class SchedulePlannerTest {

    /** 1 L, 1 dm2, 100 um, 100 mol/m3 Ag+ (10.8 g/L). */
    private static final double V = 1e-3;
    private static final double A = 0.01;
    private static final double DELTA = 100e-6;
    private static final double C0 = 100;
    /** Winning 80 % of the silver: R = 5. */
    private static final double MASS = 0.8 * C0 * V * StudyScenarios.AG_KG_PER_MOL;
    private static final double F = 0.5;
    /** source: CRC Handbook 92nd ed., ionic diffusion at infinite dilution, Ag+ 1.648e-9 m2/s (physics-data 4). */
    private static final double D_AG = 1.648e-9;
    private static final double TAU = V / (F * D_AG / DELTA * A);

    private static SchedulePlan plan;

    @BeforeAll
    static void planOnce() {
        Scenario sc = StudyScenarios.silverWinning(V, A, DELTA, C0, 3600);
        plan = new SchedulePlanner(StudyScenarios.library(), ScenarioRunner.engine(StudyScenarios.library()), 2)
                .plan(sc, MASS, F, 6, StudyProgress.NONE, Cancellation.none());
    }

    @Test
    void theConstantCurrentAlternativeTakesWhatTheBatchLawGives() {
        // source: batch cell under mass-transport control, Walsh (1993) / physics-data section 6: the highest
        // constant current keeping i <= F i_L to the end is F n F k_m A c_f, so t = (R - 1) V / (F k_m A).
        // Tolerance 3 %: the current is rounded down to three digits (up to 1 %), the search stops within
        // 0.3 % of F, and the bath's slight warming is held off by the fixture's heat loss.
        assertEquals(4 * TAU, plan.constantCurrentS(), 0.03 * 4 * TAU);
        // source: same law, I = F n F (D / delta) c_f A with c_f = C0 / 5
        double iCc = F * 96485.33212 * D_AG / DELTA * (C0 / 5) * A;
        assertEquals(iCc, plan.constantCurrentA(), 0.02 * iCc);
    }

    @Test
    void theStepsComeCloseToTheIdealStaircaseAndTheAdaptiveScheduleToTheLimit() {
        // source: equal-ratio staircase (class comment of SchedulePlanner): 6 (5^(1/6) - 1) tau = 1.846 tau;
        // following the limit exactly: ln(5) tau = 1.609 tau. The engine's staircase may lose a little to
        // rounding step times down to the planning resolution and currents to three digits: within 10 %.
        double sixSteps = 6 * (Math.pow(5, 1.0 / 6) - 1) * TAU;
        assertTrue(plan.durationS() < 1.10 * sixSteps, plan.durationS() + " s against " + sixSteps);
        assertTrue(plan.durationS() > Math.log(5) * TAU, "no schedule beats following the limit exactly");
        // 40 steps: 40 (5^(1/40) - 1) tau = 1.642 tau, within 5 %
        double fortySteps = 40 * (Math.pow(5, 1.0 / 40) - 1) * TAU;
        assertEquals(fortySteps, plan.adaptiveS(), 0.05 * fortySteps);
        assertTrue(plan.steps().size() <= 6 && plan.steps().size() >= 3, plan.steps().toString());
        // the plan beats constant current by about half: 1.846 / 4
        assertTrue(plan.durationS() < 0.55 * plan.constantCurrentS());
    }

    @Test
    void theVerifiedRunReachesTheGoalWithinTheFraction() {
        RunResult v = plan.verification();
        assertTrue(v.summary().depositKg().get("Ag") >= MASS * (1 - 1e-6));
        for (TracePoint p : v.trace()) {
            assertTrue(p.state().targetLimitRatio() <= F, "share " + p.state().targetLimitRatio() + " at " + p.timeS());
        }
        assertTrue(plan.maxRatio() > 0.97 * F, "the last step runs close to F: " + plan.maxRatio());
        List<SetPoint> steps = plan.steps();
        for (int k = 1; k < steps.size(); k++) {
            assertTrue(steps.get(k).value() < steps.get(k - 1).value(), "currents fall step by step");
            assertTrue(steps.get(k).atS() > steps.get(k - 1).atS());
            // step times are whole multiples of the planning resolution (a bench operator sets them by clock)
            double res = SchedulePlanner.resolution(1);
            assertEquals(0, steps.get(k).atS() % res, 1e-9);
        }
        // every current has three significant digits at most
        for (SetPoint p : steps) {
            assertEquals(PlanRuns.floor3(p.value()), p.value(), 0.0);
        }
        assertEquals(plan.scenario().supply().schedule(), steps);
    }

    @Test
    void aGoalBeyondWhatTheBathHoldsIsRefused() {
        Scenario sc = StudyScenarios.silverWinning(V, A, DELTA, C0, 3600);
        SchedulePlanner planner = new SchedulePlanner(StudyScenarios.library(),
                ScenarioRunner.engine(StudyScenarios.library()), 1);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> planner.plan(sc,
                0.99 * C0 * V * StudyScenarios.AG_KG_PER_MOL, F, 6, StudyProgress.NONE, Cancellation.none()));
        // source: 100 mol/m3 x 1 L x 107.8682 g/mol = 10.79 g
        assertTrue(e.getMessage().contains("holds 10.79 g of Ag"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> planner.plan(sc, MASS, 1.2, 6, StudyProgress.NONE,
                Cancellation.none()));
        Cancellation cancel = Cancellation.none();
        cancel.cancel();
        assertThrows(CancellationException.class, () -> planner.plan(sc, MASS / 10, F, 6, StudyProgress.NONE, cancel));
    }

    @Test
    void aForecastShortLowersTheFractionUntilThePlanAvoidsIt() {
        ScenarioRunner engine = ScenarioRunner.engine(StudyScenarios.library());
        // a stand-in for the dendrite model: any set current above 0.6 A forecasts a short after 10 s (the
        // plan at F = 0.5 starts near 0.77 A: 0.5 n F k_m c A = 0.80 A, less the first step-down)
        ScenarioRunner shorting = sc -> {
            RunResult r = engine.run(sc);
            double top = sc.supply().schedule().stream().mapToDouble(SetPoint::value).max().orElse(0);
            if (top <= 0.6) {
                return r;
            }
            RunSummary s = r.summary();
            RunSummary shorted = new RunSummary(s.stopReason(), s.durationS(), s.chargeC(), s.depositKg(),
                    s.purity(), s.targetMetal(), s.currentEfficiency(), s.energyJ(), s.specificEnergyJPerKg(),
                    s.cellVoltageStartV(), s.cellVoltageEndV(), s.cellVoltageMeanV(), s.cellVoltageMaxV(),
                    s.finalConcentrationMolPerM3(), s.gasMol(), null, 10.0, s.morphologyFinal(),
                    s.temperatureStartK(), s.temperatureEndK(), s.temperatureMaxK(), s.reactionChargeC(), s.warnings(),
                    s.corrodedKg(), s.finalAnolyteConcentrationMolPerM3());
            return new RunResult(r.scenario(), r.speciesNames(), r.metalSymbols(), r.cathodeReactions(),
                    r.anodeReactions(), r.trace(), r.events(), shorted, r.finalState(), r.rhsEvaluations());
        };
        Scenario sc = StudyScenarios.silverWinning(V, A, DELTA, C0, 3600);
        SchedulePlan p = new SchedulePlanner(StudyScenarios.library(), shorting, 2).plan(sc, MASS / 8, F, 3,
                StudyProgress.NONE, Cancellation.none());
        assertTrue(p.maxFraction() < F, "fraction lowered: " + p.maxFraction());
        assertTrue(p.steps().stream().allMatch(s -> s.value() <= 0.6), p.steps().toString());
        assertTrue(p.notes().stream().anyMatch(n -> n.contains("short")), p.notes().toString());
        // the dendrite model may still forecast a short, but not within the plan
        Double forecast = p.verification().summary().shortCircuitForecastS();
        assertTrue(forecast == null || forecast > p.verification().summary().durationS(), "forecast " + forecast);
        assertTrue(p.verification().summary().shortCircuitS() == null);
    }

    @Test
    void currentsAreRoundedDownToThreeDigitsAndResolutionsAreClockFriendly() {
        assertEquals(4.67, PlanRuns.floor3(4.6799), 0.0);
        assertEquals(4.67, PlanRuns.floor3(4.67), 0.0);
        assertEquals(0.0123, PlanRuns.floor3(0.012345), 0.0);
        assertEquals(123000, PlanRuns.floor3(123456), 0.0);
        // the largest of 1 s ... 1 h that is at most 1/40 of the expected time: 3 h / 40 = 270 s -> 2 min
        assertEquals(120, SchedulePlanner.resolution(3 * 3600));
        assertEquals(900, SchedulePlanner.resolution(10 * 3600));
        assertEquals(1, SchedulePlanner.resolution(10));
    }
}
