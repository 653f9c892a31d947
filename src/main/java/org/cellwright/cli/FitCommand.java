package org.cellwright.cli;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.FitSheet;
import org.cellwright.chart.FitText;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.AtomicFile;
import org.cellwright.io.FitJsonWriter;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.RunLogException;
import org.cellwright.io.RunLogReader;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioTemplate;
import org.cellwright.study.FitMonitor;
import org.cellwright.study.FitProgress;
import org.cellwright.study.InsensitiveParameterException;
import org.cellwright.study.LeastSquaresFit;
import org.cellwright.study.LogFit;
import org.cellwright.study.LogFitResult;
import org.cellwright.study.MeasuredLog;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code fit SCENARIO --log FILE.csv --free key,...}: fits free scenario values to a measured run log by
 * Levenberg-Marquardt, prints each value with its 95 % interval, the residual per column and where the charge
 * went in the fitted run; optionally writes the JSON form and a chart of measured against fitted.
 */
@Command(name = "fit",
        mixinStandardHelpOptions = true,
        description = "Fits scenario values (e.g. cell.diffusion_layer, reaction.H+/H2.i0, cell.contact_resistance)"
                + " to a measured run log, with 95 %% confidence intervals, and says where the charge went.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success", "1:internal failure", "2:bad input (scenario, log, value or option)"})
public final class FitCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Scenario file (TOML).")
    Path file;

    @Option(names = "--log", required = true, paramLabel = "FILE.csv",
            description = "Measured run log: CSV with time_s, time_min or time_h and any of current_A,"
                    + " cell_voltage_V, deposit_g, c_<species>_g_per_L; blank cells allowed.")
    Path logFile;

    @Option(names = "--free", required = true, split = ",", paramLabel = "KEY",
            description = "Scenario keys to fit, comma-separated (dotted paths, e.g. cell.diffusion_layer).")
    List<String> free = new ArrayList<>();

    @Option(names = "--weights", split = ",", paramLabel = "COLUMN=W",
            description = "Weight per log column (default 1), e.g. cell_voltage_V=2,deposit_g=0.5.")
    List<String> weights = new ArrayList<>();

    @Option(names = "--json", paramLabel = "FILE",
            description = "Write the fit as JSON to FILE, or to standard output with '-' (then nothing else goes there).")
    String json;

    @Option(names = "--chart", paramLabel = "FILE",
            description = "Write measured against fitted; the extension (.png or .svg) picks the format.")
    Path chart;

    @Option(names = "--set", paramLabel = "KEY=VALUE",
            description = "Override a scenario value before fitting (repeatable); a free key's value is its start.")
    List<String> sets = new ArrayList<>();

    @Option(names = "--max-iterations", paramLabel = "N", defaultValue = "60",
            description = "Iteration limit of the optimiser (default: ${DEFAULT-VALUE}).")
    int maxIterations;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        CommandRun command = CommandRun.of("fit", "output");
        return command.call(spec, (out, err) -> command.chartNameOk(chart, err) ? fit(out, err) : Main.BAD_INPUT);
    }

    private int fit(PrintWriter out, PrintWriter err) throws IOException, ScenarioException, RunLogException {
        if (maxIterations < 1) {
            err.println("cellwright fit: --max-iterations must be at least 1, got " + maxIterations);
            return Main.BAD_INPUT;
        }
        Map<String, Double> weightMap = new LinkedHashMap<>();
        for (String w : weights) {
            int eq = w.indexOf('=');
            Double v = null;
            try {
                v = eq > 0 ? Double.valueOf(w.substring(eq + 1).strip()) : null;
            } catch (NumberFormatException e) {
                v = null;
            }
            if (v == null || !(v > 0) || v.isInfinite()) {
                err.println("cellwright fit: --weights: expected column=weight with a weight > 0, e.g."
                        + " cell_voltage_V=2, got '" + w + "'");
                return Main.BAD_INPUT;
            }
            weightMap.put(w.substring(0, eq).strip(), v);
        }
        ChemLibrary lib = LibraryReader.builtIn();
        ScenarioTemplate template = ScenarioTemplate.load(file, sets, free, lib);
        RunLogReader.Result read = new RunLogReader(lib).read(logFile);
        read.warnings().forEach(p -> err.println(p.format()));
        MeasuredLog log = read.log();
        template.warnings().forEach(p -> err.println(p.format()));
        LogFitResult result;
        try {
            LogFit fit = new LogFit(template, lib, log, weightMap);
            LeastSquaresFit.Options base = LeastSquaresFit.Options.forEngine();
            result = fit.fit(new LeastSquaresFit.Options(base.relativeStep(), maxIterations, base.costTolerance(),
                    base.parameterTolerance(), base.threads()), progress(err));
        } catch (InsensitiveParameterException e) {
            err.println("cellwright fit: " + e.getMessage() + hint(e.keys()));
            return Main.BAD_INPUT;
        } catch (IllegalArgumentException e) {
            err.println(file + ": " + e.getMessage());
            return Main.BAD_INPUT;
        }
        String label = file.getFileName().toString();
        boolean jsonToStdout = "-".equals(json);
        if (json != null && !jsonToStdout) {
            AtomicFile.write(Path.of(json), o -> FitJsonWriter.write(label, result, template.parameters(), o));
        }
        if (chart != null) {
            new FitSheet(result, "Fit of " + label + " to " + logFile.getFileName(), ChartStyle.light()).export(chart);
        }
        if (jsonToStdout) {
            ByteArrayOutputStream buffer = new ByteArrayOutputStream();
            FitJsonWriter.write(label, result, template.parameters(), buffer);
            out.print(buffer.toString(StandardCharsets.UTF_8));
        } else {
            FitText.lines(label, result, template.parameters()).forEach(out::println);
        }
        return 0;
    }

    /** Progress on standard error, only when it is a terminal (stdout stays clean for data). */
    private static FitMonitor progress(PrintWriter err) {
        if (System.console() == null) {
            return FitMonitor.NONE;
        }
        return new FitMonitor() {
            @Override
            public void progress(FitProgress p) {
                StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "fit: iteration %d, %d engine runs,"
                        + " sum of squares %.4g;", p.iteration(), p.evaluations(), p.sumOfSquares()));
                for (int j = 0; j < p.keys().size(); j++) {
                    sb.append(String.format(Locale.ROOT, " %s = %.4g", p.keys().get(j), p.values()[j]));
                }
                synchronized (err) {
                    err.println(sb);
                    err.flush();
                }
            }
        };
    }

    private static String hint(List<String> keys) {
        if (keys.stream().anyMatch(k -> k.startsWith("reaction."))) {
            return ". The library keeps separate kinetics per electrode material; a reaction table without"
                    + " material changes only the default set. Name the material the reaction runs on, e.g."
                    + " [reaction.\"H+/H2\"] material = \"copper\" for hydrogen on a copper deposit"
                    + " (or --set reaction.H+/H2.material=copper).";
        }
        return ". Check that the key acts within the log's span and on a logged quantity.";
    }
}
