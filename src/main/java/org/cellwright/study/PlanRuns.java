package org.cellwright.study;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;

import org.cellwright.cell.ControlMode;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.SetPoint;
import org.cellwright.cell.StopCondition;
import org.cellwright.sim.RunEvent;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.TracePoint;

/**
 * The planner's engine runs: the scenario under current control with a given schedule, stopped when the
 * target metal's deposit reaches the goal, over a horizon that doubles until the goal is reached; and what
 * the planner reads from a run's trace (where the target's share of its limiting current crosses a value,
 * its highest value after a time). One instance per planning task (the horizon is its state).
 */
final class PlanRuns {

    /** Longest horizon tried before the goal is declared out of reach (s): 100 days, our own limit. */
    static final double MAX_HORIZON_S = 100 * 86400.0;
    /** Most output points of one planning run. */
    static final int MAX_POINTS = 20_000;

    private final Scenario planning;
    private final ScenarioRunner runner;
    private final String metal;
    private final double massKg;
    private final Cancellation cancel;
    private final Runnable onRun;
    private final double outputS;
    private double horizonS;

    /**
     * @param scenario the user's scenario
     * @param runner the engine
     * @param metal the target metal
     * @param massKg the deposit goal (kg)
     * @param outputS output interval of planning runs (s)
     * @param horizonS first horizon (s)
     * @param cancel the study's cancellation flag, checked before every run
     * @param onRun told after every run (progress)
     */
    PlanRuns(Scenario scenario, ScenarioRunner runner, String metal, double massKg, double outputS, double horizonS,
             Cancellation cancel, Runnable onRun) {
        this.planning = planningForm(scenario, metal, massKg);
        this.runner = runner;
        this.metal = metal;
        this.massKg = massKg;
        this.outputS = outputS;
        this.horizonS = horizonS;
        this.cancel = cancel;
        this.onRun = onRun;
    }

    /**
     * The scenario as the planner runs it: current control (limits kept), the goal as a deposit stop (replacing
     * a deposit stop of the target the user had), the target named.
     */
    static Scenario planningForm(Scenario sc, String metal, double massKg) {
        PowerSupply s = sc.supply();
        PowerSupply current = new PowerSupply(ControlMode.CURRENT, 1.0, 0, s.voltageLimitV(), s.currentLimitA(),
                List.of());
        List<StopCondition> stops = new ArrayList<>();
        for (StopCondition c : sc.run().stops()) {
            if (!(c instanceof StopCondition.DepositAbove d && d.metal().equalsIgnoreCase(metal))) {
                stops.add(c);
            }
        }
        stops.add(new StopCondition.DepositAbove(metal, massKg));
        return sc.withSupply(current).withRun(new RunSettings(sc.run().durationS(), sc.run().outputIntervalS(),
                stops, metal));
    }

    /** @return the planning scenario with a schedule, duration and output interval */
    Scenario scenario(List<SetPoint> schedule, double durationS, double output) {
        return planning.withSupply(planning.supply().withSchedule(schedule)).withRun(new RunSettings(durationS,
                output, planning.run().stops(), metal));
    }

    /** Runs a schedule for a fixed time (a probe). */
    RunResult run(List<SetPoint> schedule, double durationS, double output) {
        cancel.check();
        RunResult r = runner.run(scenario(schedule, durationS, output));
        onRun.run();
        return r;
    }

    /** Runs a scenario as it is (the verification of a plan). */
    RunResult runScenario(Scenario sc) {
        cancel.check();
        RunResult r = runner.run(sc);
        onRun.run();
        return r;
    }

    /**
     * Runs a schedule until the deposit goal, doubling the horizon while the run ends by time first.
     *
     * @throws IllegalArgumentException when another stop condition ends the run first, or the goal is out of
     *     reach within {@link #MAX_HORIZON_S}
     */
    RunResult toMass(List<SetPoint> schedule) {
        while (true) {
            double out = Math.max(outputS, horizonS / MAX_POINTS);
            RunResult r = run(schedule, horizonS, out);
            if (reached(r)) {
                return r;
            }
            if (!r.summary().stopReason().equals("end")) {
                throw new IllegalArgumentException(stoppedBefore(r));
            }
            if (horizonS >= MAX_HORIZON_S) {
                throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                        "%.4g g of %s cannot be deposited within 100 days at this fraction of the limiting current",
                        massKg * 1000, metal));
            }
            horizonS = Math.min(2 * horizonS, MAX_HORIZON_S);
        }
    }

    /** @return true when the run deposited the goal (to the event solver's precision) */
    boolean reached(RunResult r) {
        return r.summary().depositKg().getOrDefault(metal, 0.0) >= massKg * (1 - 1e-6);
    }

    private String stoppedBefore(RunResult r) {
        String why = r.events().stream().filter(e -> e.kind() != RunEvent.Kind.END)
                .filter(e -> Math.abs(e.timeS() - r.summary().durationS()) < 1e-3 * Math.max(1, e.timeS()))
                .map(RunEvent::message).reduce((a, b) -> b).orElse("a stop condition ended the run ("
                        + r.summary().stopReason() + ")");
        return String.format(java.util.Locale.ROOT, "%.4g g of %s cannot be deposited: the run stops before that. %s",
                massKg * 1000, metal, why);
    }

    /**
     * @param trace a run's trace
     * @param afterS a time (s)
     * @param limit a share of the limiting current
     * @return the first time after {@code afterS} at which the target's share reaches {@code limit},
     *     interpolated between output points; {@code afterS} when it is already there at the first point
     *     after it; NaN when it never does
     */
    static double crossing(List<TracePoint> trace, double afterS, double limit) {
        TracePoint prev = null;
        for (TracePoint p : trace) {
            if (p.timeS() <= afterS) {
                prev = p;
                continue;
            }
            double r = p.state().targetLimitRatio();
            if (r >= limit) {
                if (prev == null || prev.timeS() < afterS || prev.state().targetLimitRatio() >= limit) {
                    return afterS;
                }
                double r0 = prev.state().targetLimitRatio();
                return prev.timeS() + (limit - r0) / (r - r0) * (p.timeS() - prev.timeS());
            }
            prev = p;
        }
        return Double.NaN;
    }

    /** @return the target's share of its limiting current at time {@code tS}, interpolated */
    static double ratioAt(List<TracePoint> trace, double tS) {
        TracePoint prev = trace.get(0);
        for (TracePoint p : trace) {
            if (p.timeS() >= tS) {
                if (p.timeS() == prev.timeS()) {
                    return p.state().targetLimitRatio();
                }
                double f = (tS - prev.timeS()) / (p.timeS() - prev.timeS());
                return prev.state().targetLimitRatio() + f * (p.state().targetLimitRatio()
                        - prev.state().targetLimitRatio());
            }
            prev = p;
        }
        return prev.state().targetLimitRatio();
    }

    /** @return the highest share of the limiting current at output points after {@code fromS} (0 if none) */
    static double maxRatio(List<TracePoint> trace, double fromS) {
        double max = 0;
        for (TracePoint p : trace) {
            if (p.timeS() > fromS) {
                max = Math.max(max, p.state().targetLimitRatio());
            }
        }
        return max;
    }

    /** @return the current at the first output point, the supply's actual current (A) */
    static double currentAt(List<TracePoint> trace, double tS) {
        for (TracePoint p : trace) {
            if (p.timeS() >= tS) {
                return p.state().currentA();
            }
        }
        return trace.get(trace.size() - 1).state().currentA();
    }

    /** @return {@code amps} rounded down to three significant digits (what a bench supply is set to) */
    static double floor3(double amps) {
        if (!(amps > 0)) {
            return 0;
        }
        return BigDecimal.valueOf(amps).round(new MathContext(3, RoundingMode.FLOOR)).doubleValue();
    }
}
