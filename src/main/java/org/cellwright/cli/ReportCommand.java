package org.cellwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.cellwright.chart.HtmlReport;
import org.cellwright.chart.PdfReport;
import org.cellwright.chart.RunReport;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.AtomicFile;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioReader;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunResult;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code report SCENARIO --out FILE.html|.pdf}: runs a scenario and writes a report of it: the inputs with their
 * units, the plots, the key figures, the voltage breakdown, where the charge went, the forecast of a short and
 * of the deposit's form, the events, and the safety cautions the run raises. The file is written whole or not
 * at all.
 */
@Command(name = "report",
        mixinStandardHelpOptions = true,
        description = "Runs a scenario and writes a self-contained report (HTML with the charts inside, or PDF):"
                + " inputs, plots, figures, voltage breakdown, where the charge went, forecast, events and"
                + " safety cautions.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success", "1:internal failure", "2:bad input (scenario, value or option)"})
public final class ReportCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Scenario file (TOML).")
    Path file;

    @Option(names = "--out", required = true, paramLabel = "FILE",
            description = "The report; the extension (.html or .pdf) picks the format.")
    Path out;

    @Option(names = "--set", paramLabel = "KEY=VALUE",
            description = "Override a scenario value, e.g. --set supply.current=\"3 A\" (repeatable).")
    List<String> sets = new ArrayList<>();

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        return CommandRun.of("report", String.valueOf(out)).call(spec, this::report);
    }

    private int report(PrintWriter stdout, PrintWriter err) throws IOException, ScenarioException {
        String name = out.getFileName() == null ? "" : out.getFileName().toString().toLowerCase(Locale.ROOT);
        boolean html = name.endsWith(".html") || name.endsWith(".htm");
        boolean pdf = name.endsWith(".pdf");
        if (!html && !pdf) {
            err.println("cellwright report: --out " + out + ": the file must end in .html or .pdf");
            return Main.BAD_INPUT;
        }
        ChemLibrary lib = LibraryReader.builtIn();
        ScenarioReader.Result read = CommandRun.scenario(lib, file, sets, err);
        RunResult result;
        try {
            result = CellSimulation.withDefaults().run(read.scenario(), lib, null);
        } catch (IllegalArgumentException e) {
            err.println(file + ": " + e.getMessage());
            return Main.BAD_INPUT;
        }
        RunReport report = RunReport.of(file.getFileName().toString(), result, lib);
        AtomicFile.write(out, o -> {
            if (html) {
                HtmlReport.write(report, o);
            } else {
                PdfReport.write(report, o);
            }
        });
        stdout.println("wrote " + out + " (" + report.cautions().size() + " safety caution"
                + (report.cautions().size() == 1 ? "" : "s") + ")");
        return 0;
    }
}
