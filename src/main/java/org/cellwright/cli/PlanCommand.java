package org.cellwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.Dimension;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.Quantity;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioReader;
import org.cellwright.io.ScenarioWriter;
import org.cellwright.io.UnitException;
import org.cellwright.io.UnitParser;
import org.cellwright.sim.RunClock;
import org.cellwright.study.Cancellation;
import org.cellwright.study.ScenarioRunner;
import org.cellwright.study.SchedulePlan;
import org.cellwright.study.SchedulePlanner;
import org.cellwright.study.Sweep;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code plan SCENARIO --deposit MASS [--max-fraction F] --out FILE.toml}: the current schedule that deposits
 * MASS of the target metal in the least time with the target at or below F of its limiting current; prints
 * the steps, the time, and the constant current it beats, and writes the scenario with the schedule.
 */
@Command(name = "plan",
        mixinStandardHelpOptions = true,
        description = "Plans the current schedule (a handful of steps) that deposits a mass of the target metal in"
                + " the least time while the cathode stays at or below a fraction of its limiting current.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success", "1:internal failure",
            "2:bad input (scenario, value or option), or the goal cannot be reached"})
public final class PlanCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Scenario file (TOML).")
    Path file;

    @Option(names = "--deposit", paramLabel = "MASS", required = true,
            description = "Mass of the target metal to deposit, with its unit (e.g. 30 g).")
    String deposit;

    @Option(names = "--max-fraction", paramLabel = "F", defaultValue = "0.5",
            description = "Highest share of the limiting current, 0 to 1 or a percentage (default 0.5: below the "
                    + "dendritic band from about 0.6; 0.3 for a compact deposit).")
    String maxFraction;

    @Option(names = "--steps", paramLabel = "N", defaultValue = "6", description = "Most steps (default 6).")
    int steps;

    @Option(names = "--out", paramLabel = "FILE.toml", required = true,
            description = "Where to write the scenario with the planned supply.schedule.")
    Path out;

    @Option(names = "--set", paramLabel = "KEY=VALUE", description = "Override a scenario value (repeatable).")
    List<String> sets = new ArrayList<>();

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        return CommandRun.of("plan", String.valueOf(out)).call(spec, this::plan);
    }

    private int plan(PrintWriter stdout, PrintWriter err) throws IOException, ScenarioException {
        double massKg;
        try {
            Quantity q = UnitParser.parse(deposit, Dimension.MASS);
            if (q.unit().isEmpty()) {
                err.println("cellwright plan: --deposit " + deposit + ": give the mass with its unit, e.g. 30 g");
                return Main.BAD_INPUT;
            }
            massKg = q.si();
        } catch (UnitException e) {
            err.println("cellwright plan: --deposit " + deposit + ": " + e.getMessage());
            return Main.BAD_INPUT;
        }
        double f = fraction(maxFraction);
        if (!(f > 0 && f < 1)) {
            err.println("cellwright plan: --max-fraction " + maxFraction + ": give a number between 0 and 1 (or 1 % "
                    + "to 99 %)");
            return Main.BAD_INPUT;
        }
        if (steps < 1 || steps > 20) {
            err.println("cellwright plan: --steps must be from 1 to 20, got " + steps);
            return Main.BAD_INPUT;
        }
        ChemLibrary lib = LibraryReader.builtIn();
        ScenarioReader.Result read = CommandRun.scenario(lib, file, sets, err);
        ProgressLine progress = new ProgressLine(err, "plan", ProgressLine.onTerminal());
        SchedulePlan plan;
        try {
            plan = new SchedulePlanner(lib, ScenarioRunner.engine(lib), Sweep.allCores())
                    .plan(read.scenario(), massKg, f, steps, progress, Cancellation.none());
        } catch (IllegalArgumentException e) {
            progress.finish();
            err.println("cellwright plan: " + file + ": " + e.getMessage());
            return Main.BAD_INPUT;
        }
        progress.finish();
        ScenarioWriter.write(plan.scenario(), lib, out);
        print(plan, stdout);
        stdout.println("wrote " + out);
        return 0;
    }

    /** @return the fraction written as "0.5" or "50 %", NaN when it is neither */
    static double fraction(String text) {
        String t = text.strip();
        boolean percent = t.endsWith("%");
        try {
            double v = Double.parseDouble(percent ? t.substring(0, t.length() - 1).strip() : t);
            return percent ? v / 100 : v;
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    /** Prints the plan's steps, time and comparison for people. */
    static void print(SchedulePlan p, PrintWriter out) {
        out.println(String.format(Locale.ROOT, "Plan: %s g of %s with the cathode at or below %.2f of its limiting "
                + "current", grams(p.massKg()), p.metal(), p.maxFraction()));
        out.println(String.format(Locale.ROOT, "  %-5s %-13s %-13s %-9s %-15s %s", "step", "from", "to", "current",
                "share of i_L", p.metal() + " deposited"));
        int k = 1;
        for (SchedulePlan.Step s : p.table()) {
            out.println(String.format(Locale.ROOT, "  %-5d %-13s %-13s %-9s %-15s %s g", k++, clock(s.startS()),
                    clock(s.endS()), amps(s.currentA()), String.format(Locale.ROOT, "%.3f at end", s.ratioAtEnd()),
                    grams(s.depositKgAtEnd())));
        }
        out.println(String.format(Locale.ROOT, "  goal reached after %s (checked by running the schedule; highest "
                + "share of the limiting current %.3f)", RunClock.format(p.durationS()), p.maxRatio()));
        if (Double.isFinite(p.constantCurrentA())) {
            out.println(String.format(Locale.ROOT, "  constant current: at most %s keeps the share at or below %.2f "
                    + "to the goal, which it reaches after %s", amps(p.constantCurrentA()), p.maxFraction(),
                    RunClock.format(p.constantCurrentS())));
            double saved = p.savedS();
            out.println(saved > 0.005 * p.constantCurrentS()
                    ? String.format(Locale.ROOT, "  the plan saves %s (%.0f %% of the constant-current time)",
                    RunClock.format(saved), 100 * saved / p.constantCurrentS())
                    : "  the plan is no faster than that constant current");
        }
        if (Double.isFinite(p.adaptiveS())) {
            out.println(String.format(Locale.ROOT, "  following the falling limit in 40 small steps would take %s",
                    RunClock.format(p.adaptiveS())));
        }
        for (String n : p.notes()) {
            out.println("  note: " + n);
        }
    }

    private static String clock(double s) {
        return s == 0 ? "0" : RunClock.format(s);
    }

    private static String amps(double a) {
        return a >= 10 ? String.format(Locale.ROOT, "%.1f A", a)
                : a >= 1 ? String.format(Locale.ROOT, "%.2f A", a) : String.format(Locale.ROOT, "%.0f mA", a * 1000);
    }

    private static String grams(double kg) {
        double g = kg * 1000;
        return g >= 100 ? String.format(Locale.ROOT, "%.0f", g) : String.format(Locale.ROOT, "%.3g", g);
    }
}
