package org.cellwright.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.concurrent.atomic.AtomicInteger;

import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.SetPoint;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.PhysicalConstants;
import org.cellwright.sim.RunClock;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.TracePoint;

/**
 * Plans the current schedule that deposits a mass of the target metal in the least time while the target's
 * partial current stays at or below a fraction F of its limiting current {@code i_L = n F k_m c A}, and no
 * dendrite shorts the cell.
 *
 * <p>Why steps. As the bath depletes, i_L falls with the concentration; a constant current must be low
 * enough for the end of the run, a schedule can start high and step down. In a well-mixed batch cell held at
 * F i_L throughout, c falls as {@code exp(-F k_m A t / V)} (Walsh, <i>A First Course in Electrochemical
 * Engineering</i>, 1993: the batch law under mass-transport control); a staircase of N constant steps, each
 * ending when the share reaches F, takes least time when every step lowers the concentration by the same
 * ratio {@code r = (c0/cf)^(1/N)} (minimise {@code sum (r_k - 1)} with {@code prod r_k = c0/cf}: equal r_k by
 * the inequality of arithmetic and geometric means), so each step's current is {@code 1/r} of the one before
 * and all steps last equally long: {@code N (r - 1) V / (F k_m A)} against {@code ln(c0/cf) V / (F k_m A)}
 * when the current follows the limit exactly and {@code (c0/cf - 1) V / (F k_m A)} at constant current.
 *
 * <p>How. The engine, not that idealisation, decides: (1) probe runs find the current whose share is F at the
 * start; (2) for a few step-down factors around {@code 1/r} (in parallel) a staircase is built step by step,
 * each step held until the run's share reaches F (to the planning time resolution, rounded down) and the
 * next one set to the factor times the current that would just reach F there; the last allowed step takes the
 * highest current whose share stays at or below F until the goal; (3) the fastest staircase is written into
 * the scenario and run again to check it; a short circuit (or one forecast before the goal) lowers F by 15 %
 * and plans again. The highest constant current that respects F and a fine adaptive schedule (40 steps)
 * are planned the same way for comparison.
 *
 * <p>Default F = {@link #DEFAULT_MAX_FRACTION}: deposits turn nodular at about 0.35-0.6 of i_L and dendritic
 * from about 0.6 (Winand, Hydrometallurgy 29 (1992) 567; the bands in docs/studies.md), so 0.5 keeps a
 * recovery cell's deposit coherent with a margin below the dendritic band; for a compact, fine deposit use
 * 0.3 (industrial copper electrowinning runs at 0.3-0.35 of i_L).
 */
public final class SchedulePlanner {

    /** Default highest share of the limiting current (see the class comment). */
    public static final double DEFAULT_MAX_FRACTION = 0.5;
    /** Default most steps of a plan: few enough to set by hand on a bench supply (our own choice). */
    public static final int DEFAULT_MAX_STEPS = 6;
    /** Steps of the fine adaptive schedule used for comparison. */
    static final int ADAPTIVE_STEPS = 40;
    /** Steps end this far below F, so that interpolation between output points never overshoots. */
    static final double MARGIN = 1e-3;
    /** Planning time resolutions (s): step times are multiples of one of them. */
    private static final double[] RESOLUTIONS = {1, 5, 10, 30, 60, 120, 300, 600, 900, 1800, 3600};
    private static final double[] FACTOR_EXPONENTS = {0.6, 0.8, 1.0, 1.25, 1.5};

    private final ChemLibrary library;
    private final ScenarioRunner runner;
    private final int threads;

    /**
     * @param library the chemistry
     * @param runner the engine (thread-safe)
     * @param threads runs in parallel
     */
    public SchedulePlanner(ChemLibrary library, ScenarioRunner runner, int threads) {
        this.library = Objects.requireNonNull(library, "library");
        this.runner = Objects.requireNonNull(runner, "runner");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, got " + threads);
        }
        this.threads = threads;
    }

    /**
     * @param sc the scenario (its supply settings are replaced by the plan; its limits and stops are kept)
     * @param massKg the deposit goal (kg)
     * @param maxFraction the highest share of the limiting current, in (0, 1)
     * @param maxSteps most steps, at least 1
     * @param progress told after each run (from worker threads)
     * @param cancel set it to stop; the planner then throws {@link java.util.concurrent.CancellationException}
     * @return the plan, verified
     * @throws IllegalArgumentException when the goal cannot be reached (too much metal for the bath, a stop
     *     condition first, no target metal)
     */
    public SchedulePlan plan(Scenario sc, double massKg, double maxFraction, int maxSteps, StudyProgress progress,
                             Cancellation cancel) {
        if (!(massKg > 0)) {
            throw new IllegalArgumentException("the deposit goal must be above zero, got " + massKg + " kg");
        }
        if (!(maxFraction > 0 && maxFraction < 1)) {
            throw new IllegalArgumentException("the fraction of the limiting current must be between 0 and 1, got "
                    + maxFraction);
        }
        if (maxSteps < 1) {
            throw new IllegalArgumentException("a plan needs at least one step, got " + maxSteps);
        }
        TargetIon target = TargetIon.of(sc, library);
        double available = target.dissolvedKg(sc.electrolyte().volumeM3());
        if (!target.replenished() && massKg > 0.98 * available) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "the bath holds %.4g g of %s as %s; a "
                    + "plan can win at most 98 %% of it (%.4g g), the last per cent takes ever longer",
                    available * 1000, target.metal().symbol(), target.ion(), 0.98 * available * 1000));
        }
        AtomicInteger runs = new AtomicInteger();
        List<String> notes = new ArrayList<>();
        double f = maxFraction;
        for (int attempt = 0; attempt < 5; attempt++) {
            SchedulePlan plan = planOnce(sc, target, massKg, f, maxSteps, runs, progress, cancel, notes);
            RunResult v = plan.verification();
            Double shortS = v.summary().shortCircuitS() != null ? v.summary().shortCircuitS()
                    : v.summary().shortCircuitForecastS();
            if (shortS == null || shortS > plan.durationS()) {
                return plan;
            }
            notes.add(String.format(Locale.ROOT, "at %.2f of the limiting current a dendrite would short the cell at "
                    + "%s, before the goal: planned again at %.2f", f, RunClock.format(shortS), f * 0.85));
            f *= 0.85;
        }
        throw new IllegalArgumentException("no plan avoids a dendrite short, even at " + String.format(Locale.ROOT,
                "%.2f", f) + " of the limiting current");
    }

    private SchedulePlan planOnce(Scenario sc, TargetIon target, double massKg, double f, int maxSteps,
                                  AtomicInteger runs, StudyProgress progress, Cancellation cancel, List<String> notes) {
        String metal = target.metal().symbol();
        int expected = runs.get() + 8 + FACTOR_EXPONENTS.length * (maxSteps + 4) + 8 + ADAPTIVE_STEPS + 6;
        Runnable counted = () -> {
            int done = runs.incrementAndGet();
            progress.progress(done, Math.max(expected, done));
        };
        PlanRuns probe = new PlanRuns(sc, runner, metal, massKg, 1, 1, cancel, counted);
        double startAmps = startCurrent(probe, sc, target, f);
        // time to the goal at the start current, all of it depositing the target (s)
        double t0 = massKg * target.electrons() * PhysicalConstants.FARADAY
                / (target.metal().molarMassKgPerMol() * startAmps);
        double depletion = target.replenished() ? 1
                : target.startMolPerM3() / (target.startMolPerM3() - massKg / target.metal().molarMassKgPerMol()
                / sc.electrolyte().volumeM3());
        double res = resolution(t0 * Math.max(1, 1 + Math.log(depletion)));
        // planning runs sample as densely as the written scenario will, so that both see the same highest share
        double out = Math.min(res, sc.run().outputIntervalS());
        double horizon = 4 * t0 * Math.max(1, depletion);
        double q = Math.min(0.97, Math.pow(depletion, -1.0 / maxSteps));

        List<Staircase> candidates = ParallelRuns.run(FACTOR_EXPONENTS.length + 2, threads, i -> {
            PlanRuns pr = new PlanRuns(sc, runner, metal, massKg, i == FACTOR_EXPONENTS.length + 1 ? out / 10 : out,
                    horizon, cancel, counted);
            try {
                if (i < FACTOR_EXPONENTS.length) {
                    double qi = Math.min(0.97, Math.pow(q, FACTOR_EXPONENTS[i]));
                    return staircase(pr, startAmps * qi, qi, maxSteps, res, f);
                } else if (i == FACTOR_EXPONENTS.length) {
                    // at constant current the share is highest at the goal, where c is c0 / depletion
                    return staircase(pr, startAmps / depletion, 1, 1, res, f);
                }
                double fine = Math.min(0.995, Math.pow(depletion, -1.0 / ADAPTIVE_STEPS));
                return staircase(pr, startAmps * fine, fine, ADAPTIVE_STEPS, res / 10, f);
            } catch (IllegalArgumentException e) {
                return new Staircase(List.of(), Double.NaN, e);
            }
        }, i -> new Staircase(List.of(), Double.NaN, null), StudyProgress.NONE, cancel);
        cancel.check();
        Staircase best = null;
        IllegalArgumentException failure = null;
        // the constant current is a plan of one step too: a staircase never has to do worse
        for (int i = 0; i <= FACTOR_EXPONENTS.length; i++) {
            Staircase s = candidates.get(i);
            if (s.failure() != null) {
                failure = failure == null ? s.failure() : failure;
            } else if (best == null || s.durationS() < best.durationS()) {
                best = s;
            }
        }
        if (best == null) {
            throw failure != null ? failure : new IllegalArgumentException("no schedule reaches the goal");
        }
        Staircase constant = candidates.get(FACTOR_EXPONENTS.length);
        Staircase adaptive = candidates.get(FACTOR_EXPONENTS.length + 1);
        return verify(sc, probe, best, res, out, f, massKg, metal, constant, adaptive, runs.get(), notes, target);
    }

    /** The current whose share of the limiting current is F shortly after switch-on, by probe runs (A). */
    private static double startCurrent(PlanRuns probe, Scenario sc, TargetIon target, double f) {
        double delta = sc.cell().agitation().diffusionLayerM();
        double area = sc.cathode().areaM2();
        // source: i_L = n F D c / delta (Nernst layer, physics-data section 6); a first guess only
        double amps = f * target.electrons() * PhysicalConstants.FARADAY * target.diffusionM2PerS() / delta
                * target.startMolPerM3() * area;
        // the diffusion layer grows as 2 sqrt(D t / pi) to its steady thickness: probe well after that
        double probeS = Math.max(120, 5 * Math.PI * delta * delta / (4 * target.diffusionM2PerS()));
        for (int k = 0; k < 8; k++) {
            RunResult r = probe.run(List.of(new SetPoint(0, amps, false)), probeS, probeS / 10);
            TracePoint last = r.trace().get(r.trace().size() - 1);
            double ratio = last.state().targetLimitRatio();
            if (!(ratio > 1e-9)) {
                amps *= 10;
                continue;
            }
            double next = last.state().currentA() * f / ratio;
            if (Math.abs(next - amps) < 0.005 * amps) {
                return next;
            }
            amps = next;
        }
        if (!(amps > 0) || !Double.isFinite(amps)) {
            throw new IllegalArgumentException("the target metal " + target.metal().symbol()
                    + " does not deposit in this cell at any current tried");
        }
        return amps;
    }

    /** A staircase: its steps and the time it takes to the goal, or why it cannot reach it. */
    record Staircase(List<SetPoint> steps, double durationS, IllegalArgumentException failure) {
    }

    /**
     * Builds a staircase from a first current: each step held until the share reaches F, the next set to
     * {@code q} times the current that would just reach F there; the last allowed step takes the highest current
     * that stays within F until the goal (with one step: the highest constant current).
     */
    static Staircase staircase(PlanRuns runs, double firstAmps, double q, int maxSteps, double res, double f) {
        List<SetPoint> steps = new ArrayList<>();
        double t = 0;
        double amps = PlanRuns.floor3(firstAmps);
        double limit = f * (1 - MARGIN);
        while (true) {
            if (steps.size() == maxSteps - 1) {
                return lastStep(runs, steps, t, amps, f);
            }
            List<SetPoint> trial = with(steps, new SetPoint(t, amps, false));
            RunResult r = runs.toMass(trial);
            double cross = PlanRuns.crossing(r.trace(), t, limit);
            if (Double.isNaN(cross)) {
                // the goal comes before the share reaches F: this is the last step, as high as F allows
                return lastStep(runs, steps, t, amps, f);
            }
            double end = Math.floor(cross / res) * res;
            if (end <= t) {
                amps = PlanRuns.floor3(amps * 0.9);
                if (!(amps > 0)) {
                    throw new IllegalArgumentException("no current keeps the target within the fraction");
                }
                continue;
            }
            double ratio = PlanRuns.ratioAt(r.trace(), end);
            double justF = PlanRuns.currentAt(r.trace(), end) * f / Math.max(ratio, 1e-9);
            double next = PlanRuns.floor3(Math.min(q * justF, amps * q));
            steps = trial;
            t = end;
            amps = next;
        }
    }

    /** The highest current from {@code t} that keeps the share within F until the goal (a few secant steps). */
    private static Staircase lastStep(PlanRuns runs, List<SetPoint> steps, double t, double guess, double f) {
        double amps = guess;
        List<SetPoint> best = null;
        double bestS = Double.NaN;
        for (int k = 0; k < 10; k++) {
            List<SetPoint> trial = with(steps, new SetPoint(t, amps, false));
            RunResult r = runs.toMass(trial);
            double max = PlanRuns.maxRatio(r.trace(), t);
            if (max <= f && (best == null || amps > best.get(best.size() - 1).value())) {
                best = trial;
                bestS = r.summary().durationS();
            }
            if (max <= f && max >= f * (1 - 3 * MARGIN)) {
                break;
            }
            double next = PlanRuns.floor3(amps * f * (1 - MARGIN) / Math.max(max, 1e-9));
            if (next == amps) {
                next = PlanRuns.floor3(amps * (max > f ? 0.99 : 1.01));
            }
            amps = next;
        }
        if (best == null) {
            throw new IllegalArgumentException("no current keeps the target within the fraction to the goal");
        }
        return new Staircase(best, bestS, null);
    }

    private static List<SetPoint> with(List<SetPoint> steps, SetPoint p) {
        List<SetPoint> out = new ArrayList<>(steps);
        out.add(p);
        return out;
    }

    /** @return the planning time resolution: the largest listed value up to 1/40 of the expected time (s) */
    static double resolution(double expectedS) {
        double res = RESOLUTIONS[0];
        for (double r : RESOLUTIONS) {
            if (r <= expectedS / 40) {
                res = r;
            }
        }
        return res;
    }

    private SchedulePlan verify(Scenario sc, PlanRuns probe, Staircase best, double res, double out, double f,
                                double massKg,
                                String metal, Staircase constant, Staircase adaptive, int runsSoFar,
                                List<String> notes, TargetIon target) {
        List<SetPoint> steps = best.steps();
        double expectedS = best.durationS();
        int checks = 0;
        while (true) {
            Scenario planned = written(sc, steps, metal, massKg, (Math.ceil(expectedS / res) + 1) * res, out);
            RunResult v = probe.runScenario(planned);
            checks++;
            if (!probe.reached(v)) {
                if (!v.summary().stopReason().equals("end") || checks > 8) {
                    throw new IllegalArgumentException("the planned schedule does not reach the goal when run: "
                            + v.summary().stopReason());
                }
                expectedS *= 1.5;
                continue;
            }
            double max = PlanRuns.maxRatio(v.trace(), -1);
            if (max <= f || checks > 8) {
                List<String> all = new ArrayList<>(notes);
                long limited = v.trace().stream().filter(p -> p.state().supplyLimited()).count();
                if (limited > 0) {
                    all.add(String.format(Locale.ROOT, "the supply holds its voltage limit for %.0f %% of the run: "
                            + "there the voltage limit, not the bath, sets the current",
                            100.0 * limited / v.trace().size()));
                }
                if (target.replenished()) {
                    all.add("the anode dissolves " + metal + " as fast as the cathode takes it: the bath does not "
                            + "deplete, so one constant current is the plan");
                }
                double cc = constant.failure() == null ? constant.steps().get(0).value() : Double.NaN;
                return new SchedulePlan(metal, massKg, f, steps, v.summary().durationS(), planned, v, max, cc,
                        constant.durationS(), adaptive.durationS(), all, runsSoFar + checks);
            }
            // an overshoot between planning output points: lower every step in proportion, check again
            double scale = f / max * (1 - MARGIN);
            List<SetPoint> lower = new ArrayList<>();
            for (SetPoint p : steps) {
                lower.add(new SetPoint(p.atS(), PlanRuns.floor3(p.value() * scale), false));
            }
            steps = lower;
            expectedS = v.summary().durationS() / scale;
        }
    }

    /**
     * The scenario to write: the user's, under current control with the schedule, the goal as a deposit stop,
     * a duration one resolution step beyond the expected goal (the stop ends the run there) and the planning
     * output interval (the user's, or the planning time resolution when that is finer).
     */
    static Scenario written(Scenario sc, List<SetPoint> steps, String metal, double massKg, double durationS,
                            double outputS) {
        Scenario planned = PlanRuns.planningForm(sc, metal, massKg);
        return planned.withSupply(planned.supply().withSchedule(steps)).withRun(new RunSettings(durationS,
                outputS, planned.run().stops(), metal));
    }
}
