package org.cellwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.cellwright.chart.ChartSheet;
import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.SpreadBands;
import org.cellwright.chart.SpreadText;
import org.cellwright.chart.SummaryText;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.AtomicFile;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.RunCsvWriter;
import org.cellwright.io.RunJsonWriter;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioReader;
import org.cellwright.io.SpreadJsonWriter;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunResult;
import org.cellwright.study.Cancellation;
import org.cellwright.study.SpreadResult;
import org.cellwright.study.SpreadStudy;
import org.cellwright.study.Sweep;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code run SCENARIO}: runs a scenario and prints its summary; optionally writes the summary JSON, the time
 * series CSV and a chart sheet (PNG or SVG). Output files are written whole or not at all.
 */
@Command(name = "run",
        mixinStandardHelpOptions = true,
        description = "Runs a scenario through time and prints what comes out: deposit, efficiency, energy,"
                + " cell voltage, gases, events and cautions.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success", "1:internal failure", "2:bad input (scenario, value or option)"})
public final class RunCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Scenario file (TOML).")
    Path file;

    @Option(names = "--json", paramLabel = "FILE",
            description = "Write the summary as JSON to FILE, or to standard output with '-' (then nothing else goes there).")
    String json;

    @Option(names = "--csv", paramLabel = "FILE", description = "Write the time series as CSV.")
    Path csv;

    @Option(names = "--chart", paramLabel = "FILE", description = "Write a chart sheet; the extension (.png or .svg) picks the format.")
    Path chart;

    @Option(names = "--spread", paramLabel = "N",
            description = "Also run N samples of the uncertain inputs (diffusion layer, exchange current densities,"
                    + " conductivity, diffusion coefficients; docs/studies.md) in parallel: 5-95 %% ranges in the"
                    + " summary and the JSON, bands on the chart sheet.")
    Integer spread;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1",
            description = "Random seed of --spread (default 1: the same samples every time).")
    long seed;

    @Option(names = "--set", paramLabel = "KEY=VALUE",
            description = "Override a scenario value, e.g. --set supply.current=\"3 A\" --set cell.gap=\"20 mm\" (repeatable).")
    List<String> sets = new ArrayList<>();

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        CommandRun command = CommandRun.of("run", "output");
        return command.call(spec, (out, err) -> command.chartNameOk(chart, err) ? run(out, err) : Main.BAD_INPUT);
    }

    private int run(PrintWriter out, PrintWriter err) throws IOException, ScenarioException {
        ChemLibrary lib = LibraryReader.builtIn();
        ScenarioReader.Result read = CommandRun.scenario(lib, file, sets, err);
        if (spread != null && (spread < 1 || spread > SpreadStudy.MAX_SAMPLES)) {
            err.println("cellwright run: --spread must be from 1 to " + SpreadStudy.MAX_SAMPLES + ", got " + spread);
            return Main.BAD_INPUT;
        }
        RunResult result;
        SpreadResult study = null;
        try {
            if (spread == null) {
                result = CellSimulation.withDefaults().run(read.scenario(), lib, null);
            } else {
                ProgressLine progress = new ProgressLine(err, "spread", ProgressLine.onTerminal());
                study = new SpreadStudy(lib, Sweep.allCores()).run(read.scenario(), spread, seed, progress,
                        Cancellation.none());
                progress.finish();
                result = study.nominal();
            }
        } catch (IllegalArgumentException e) {
            err.println(file + ": " + e.getMessage());
            return Main.BAD_INPUT;
        }
        SpreadResult spreadResult = study;
        String label = file.getFileName().toString();
        boolean jsonToStdout = "-".equals(json);
        if (json != null && !jsonToStdout) {
            AtomicFile.write(Path.of(json), o -> writeJson(label, result, spreadResult, o));
        }
        if (csv != null) {
            AtomicFile.write(csv, o -> RunCsvWriter.write(result, o));
        }
        if (chart != null) {
            ChartSheet sheet = ChartSheet.of(result, ChartStyle.light());
            if (spreadResult != null) {
                SpreadBands.apply(sheet.charts(), spreadResult.bands(), spreadResult.ran());
            }
            sheet.export(chart);
        }
        if (jsonToStdout) {
            java.io.ByteArrayOutputStream buffer = new java.io.ByteArrayOutputStream();
            writeJson(label, result, spreadResult, buffer);
            out.print(buffer.toString(java.nio.charset.StandardCharsets.UTF_8));
        } else {
            SummaryText.lines(label, result).forEach(out::println);
            if (spreadResult != null) {
                SpreadText.lines(spreadResult).forEach(out::println);
            }
        }
        return 0;
    }

    private static void writeJson(String label, RunResult result, SpreadResult spread, java.io.OutputStream o)
            throws IOException {
        if (spread == null) {
            RunJsonWriter.write(label, result, o);
        } else {
            SpreadJsonWriter.write(label, spread, o);
        }
    }
}
