package org.cellwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;

import org.cellwright.chart.ChartExport;
import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.SweepCharts;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.AtomicFile;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioVariants;
import org.cellwright.io.SweepAxisParser;
import org.cellwright.io.SweepCsvWriter;
import org.cellwright.study.AxisValue;
import org.cellwright.study.Cancellation;
import org.cellwright.study.ScenarioRunner;
import org.cellwright.study.SummaryFigure;
import org.cellwright.study.Sweep;
import org.cellwright.study.SweepAxis;
import org.cellwright.study.SweepPoint;
import org.cellwright.study.SweepResult;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code sweep SCENARIO --vary key=FROM:TO:N [--vary ...] --out FILE.csv [--chart FILE.png]}: runs the
 * scenario over a grid of one or two varied keys on every core, writes one CSV row per run and a heat map
 * (two keys) or line chart (one key) of a summary figure, and prints where that figure is lowest and highest.
 */
@Command(name = "sweep",
        mixinStandardHelpOptions = true,
        description = "Runs a scenario over a grid of one or two varied keys (in parallel) and writes a CSV table"
                + " and a chart of one summary figure.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success (points made invalid by the grid are reported, not fatal)", "1:internal failure",
            "2:bad input (scenario, value or option), or no point could run"})
public final class SweepCommand implements Callable<Integer> {

    /** Chart size (px). */
    static final int CHART_WIDTH = 1000;
    static final int CHART_HEIGHT = 700;
    /** Failed points listed one by one on standard error before the rest are only counted. */
    static final int MAX_LISTED_FAILURES = 20;

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Base scenario file (TOML).")
    Path file;

    @Option(names = "--vary", paramLabel = "KEY=FROM:TO:N", required = true,
            description = "A varied key: FROM:TO:N evenly spaced (units allowed, e.g. cell.gap=20mm:60mm:9), "
                    + "FROM:TO:N:log, or a list A,B,C. Once or twice.")
    List<String> vary = new ArrayList<>();

    @Option(names = "--figure", paramLabel = "NAME", defaultValue = "specific-energy",
            description = "Figure to chart: specific-energy (default), efficiency, deposit, purity, voltage-mean, "
                    + "voltage-max, energy, duration, temperature-max.")
    String figure;

    @Option(names = "--out", paramLabel = "FILE.csv", required = true, description = "The CSV table, one row per run.")
    Path out;

    @Option(names = "--chart", paramLabel = "FILE", description = "Chart of the figure; .png or .svg.")
    Path chart;

    @Option(names = "--set", paramLabel = "KEY=VALUE", description = "Override a base scenario value (repeatable).")
    List<String> sets = new ArrayList<>();

    @Option(names = "--threads", paramLabel = "N", description = "Runs in parallel (default: every core).")
    Integer threads;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        CommandRun command = CommandRun.of("sweep", "output");
        return command.call(spec, (stdout, err) -> sweep(command, stdout, err));
    }

    private int sweep(CommandRun command, PrintWriter stdout, PrintWriter err) throws IOException, ScenarioException {
        SummaryFigure fig = SummaryFigure.find(figure).orElse(null);
        if (fig == null) {
            err.println("cellwright sweep: --figure " + figure + ": unknown figure; use one of "
                    + java.util.Arrays.stream(SummaryFigure.values()).map(SummaryFigure::key)
                    .collect(Collectors.joining(", ")));
            return Main.BAD_INPUT;
        }
        if (!command.chartNameOk(chart, err)) {
            return Main.BAD_INPUT;
        }
        if (threads != null && threads < 1) {
            err.println("cellwright sweep: --threads must be at least 1");
            return Main.BAD_INPUT;
        }
        if (vary.size() > 2) {
            err.println("cellwright sweep: --vary may be given once or twice, got " + vary.size());
            return Main.BAD_INPUT;
        }
        List<SweepAxis> axes = new ArrayList<>();
        try {
            for (String v : vary) {
                axes.add(SweepAxisParser.parse(v));
            }
        } catch (IllegalArgumentException e) {
            err.println("cellwright sweep: " + e.getMessage());
            return Main.BAD_INPUT;
        }
        ChemLibrary lib = LibraryReader.builtIn();
        ScenarioVariants variants = ScenarioVariants.of(lib, file, sets, axes);
        variants.base().warnings().forEach(p -> err.println(p.format()));
        Sweep sweep;
        try {
            sweep = new Sweep(axes, variants, ScenarioRunner.engine(lib));
        } catch (IllegalArgumentException e) {
            err.println("cellwright sweep: " + e.getMessage());
            return Main.BAD_INPUT;
        }
        ProgressLine progress = new ProgressLine(err, "sweep", ProgressLine.onTerminal());
        SweepResult result = sweep.run(threads != null ? threads : Sweep.allCores(), progress, Cancellation.none());
        progress.finish();
        reportFailures(result, err);
        AtomicFile.write(out, o -> SweepCsvWriter.write(result, o));
        if (chart != null) {
            ChartExport.write(SweepCharts.of(result, fig, variants.base().scenario().title(), ChartStyle.light()),
                    CHART_WIDTH, CHART_HEIGHT, chart);
        }
        printSummary(result, fig, stdout);
        if (result.okCount() == 0) {
            err.println("cellwright sweep: no point of the grid could run");
            return result.points().stream().anyMatch(p -> p.status() == SweepPoint.Status.INVALID)
                    ? Main.BAD_INPUT : Main.INTERNAL_FAILURE;
        }
        return 0;
    }

    private static void reportFailures(SweepResult result, PrintWriter err) {
        List<SweepPoint> failed = result.failures();
        for (int i = 0; i < Math.min(failed.size(), MAX_LISTED_FAILURES); i++) {
            SweepPoint p = failed.get(i);
            err.println("cellwright sweep: run " + (p.point().index() + 1) + " (" + where(result, p) + ") "
                    + (p.status() == SweepPoint.Status.INVALID ? "is invalid: " : "failed: ") + p.message());
        }
        if (failed.size() > MAX_LISTED_FAILURES) {
            err.println("cellwright sweep: ... and " + (failed.size() - MAX_LISTED_FAILURES)
                    + " more points without a result (see the status and message columns of the CSV)");
        }
    }

    private static void printSummary(SweepResult r, SummaryFigure fig, PrintWriter out) {
        long invalid = r.points().stream().filter(p -> p.status() == SweepPoint.Status.INVALID).count();
        long failed = r.points().stream().filter(p -> p.status() == SweepPoint.Status.FAILED).count();
        out.println(String.format(Locale.ROOT, "%d runs in %.1f s on %d threads: %d ran, %d invalid, %d failed",
                r.points().size(), r.elapsedS(), r.threads(), r.okCount(), invalid, failed));
        SweepPoint lo = null;
        SweepPoint hi = null;
        for (SweepPoint p : r.points()) {
            double v = p.si(fig);
            if (Double.isFinite(v)) {
                lo = lo == null || v < lo.si(fig) ? p : lo;
                hi = hi == null || v > hi.si(fig) ? p : hi;
            }
        }
        if (lo == null) {
            out.println("  no run has a value of " + fig.description());
            return;
        }
        out.println(String.format(Locale.ROOT, "  lowest %s  %.4g %s at %s", fig.description(),
                fig.toDisplay(lo.si(fig)), fig.displayUnit(), where(r, lo)));
        out.println(String.format(Locale.ROOT, "  highest %s %.4g %s at %s", fig.description(),
                fig.toDisplay(hi.si(fig)), fig.displayUnit(), where(r, hi)));
    }

    private static String where(SweepResult r, SweepPoint p) {
        List<String> parts = new ArrayList<>();
        for (int a = 0; a < r.axes().size(); a++) {
            AxisValue v = p.point().values().get(a);
            parts.add(r.axes().get(a).key() + "=" + v.text());
        }
        return String.join(", ", parts);
    }
}
