package org.cellwright.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;

import org.cellwright.cell.Scenario;
import org.cellwright.chart.HtmlReport;
import org.cellwright.chart.PdfReport;
import org.cellwright.chart.RunReport;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.AtomicFile;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunResult;

/**
 * Writes the report of the scenario shown in the window, the way {@code cellwright report} does: runs the
 * scenario whole (with its stop conditions), builds the {@link RunReport} (cautions first, figures, charts,
 * voltage breakdown, where the charge went, forecast, events, data notes, inputs) and writes it as HTML or
 * PDF through {@link AtomicFile}, so a failure leaves no file behind. No Swing here: it runs on a worker
 * thread.
 */
final class ReportExport {

    /** The report formats. */
    enum Format {
        /** One self-contained XHTML file. */
        HTML("html", "Report (HTML)"),
        /** A4 pages with vector charts. */
        PDF("pdf", "Report (PDF)");

        private final String extension;
        private final String label;

        Format(String extension, String label) {
            this.extension = extension;
            this.label = label;
        }

        /** @return the file extension, without the dot */
        String extension() {
            return extension;
        }

        @Override
        public String toString() {
            return label;
        }
    }

    private ReportExport() {
    }

    /**
     * @param file a file name, with or without an extension
     * @param format the format chosen
     * @return the name with the format's extension (added when missing)
     */
    static Path withExtension(Path file, Format format) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        boolean has = name.endsWith("." + format.extension) || (format == Format.HTML && name.endsWith(".htm"));
        return has ? file : file.resolveSibling(file.getFileName() + "." + format.extension);
    }

    /**
     * Runs the scenario and writes its report.
     *
     * @param scenario the scenario as the window holds it
     * @param source the scenario's name (file name), printed in the report
     * @param library the chemistry library
     * @param format HTML or PDF
     * @param file the target
     * @return the report written (for the number of cautions in the status line)
     * @throws IOException when the file cannot be written (nothing is left behind)
     * @throws IllegalArgumentException when the engine cannot run the scenario (nothing is written)
     */
    static RunReport write(Scenario scenario, String source, ChemLibrary library, Format format, Path file)
            throws IOException {
        RunResult run = CellSimulation.withDefaults().run(scenario, library, null);
        RunReport report = RunReport.of(source, run, library);
        AtomicFile.write(file, out -> {
            if (format == Format.HTML) {
                HtmlReport.write(report, out);
            } else {
                PdfReport.write(report, out);
            }
        });
        return report;
    }
}
