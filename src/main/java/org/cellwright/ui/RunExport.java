package org.cellwright.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.cellwright.chart.ChartSheet;
import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.RunCharts;
import org.cellwright.io.AtomicFile;
import org.cellwright.io.RunCsvWriter;
import org.cellwright.io.RunJsonWriter;
import org.cellwright.sim.RunResult;

/**
 * Writes a run to a file, the kind chosen by the file's extension: the chart sheet as PNG or SVG (with the
 * pinned reference drawn dashed, as on screen), the time series as CSV, the summary as JSON. Every file is
 * written whole or not at all. Builds its own charts, so it may run off the event thread.
 */
final class RunExport {

    /** The kinds of file an export can write. */
    enum Kind {
        /** Chart sheet, bitmap. */
        PNG("png", "Chart sheet (PNG)"),
        /** Chart sheet, vector. */
        SVG("svg", "Chart sheet (SVG)"),
        /** Time series. */
        CSV("csv", "Time series (CSV)"),
        /** Summary, events and cautions. */
        JSON("json", "Summary (JSON)");

        private final String extension;
        private final String label;

        Kind(String extension, String label) {
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

    /** Scale of a PNG sheet: twice the layout's pixels, sharp on HiDPI screens and in print (common practice). */
    static final double PNG_SCALE = 2;

    private RunExport() {
    }

    /**
     * @param file a file name
     * @return the kind its extension names
     * @throws IllegalArgumentException when the extension is none of png, svg, csv, json
     */
    static Kind kindOf(Path file) {
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
        for (Kind k : Kind.values()) {
            if (name.endsWith("." + k.extension)) {
                return k;
            }
        }
        throw new IllegalArgumentException("cannot tell what to write to '" + file.getFileName()
                + "': the name must end in .png, .svg, .csv or .json");
    }

    /**
     * @param file a file name, with or without an extension
     * @param kind the kind chosen
     * @return the name with the kind's extension (added when missing)
     */
    static Path withExtension(Path file, Kind kind) {
        String name = file.getFileName().toString();
        return name.toLowerCase(Locale.ROOT).endsWith("." + kind.extension) ? file
                : file.resolveSibling(name + "." + kind.extension);
    }

    /**
     * Writes a run.
     *
     * @param run the run
     * @param label the scenario's name (file) for titles
     * @param reference a pinned run to draw dashed on the chart sheet, or null
     * @param referenceLabel its label
     * @param dark true for the dark chart style
     * @param file the target; its extension chooses the kind
     * @throws IOException when the file cannot be written
     */
    static void write(RunResult run, String label, RunResult reference, String referenceLabel, boolean dark, Path file)
            throws IOException {
        switch (kindOf(file)) {
            case PNG, SVG -> {
                RunCharts charts = RunCharts.of(run, ChartStyle.of(dark));
                if (reference != null) {
                    charts.setReference(reference, referenceLabel);
                }
                ChartSheet sheet = new ChartSheet(charts, ChartSheet.titleOf(run), ChartSheet.figuresOf(run.summary()));
                sheet.export(file, ChartSheet.DEFAULT_WIDTH, ChartSheet.DEFAULT_HEIGHT,
                        kindOf(file) == Kind.PNG ? PNG_SCALE : 1);
            }
            case CSV -> AtomicFile.write(file, out -> RunCsvWriter.write(run, out));
            case JSON -> AtomicFile.write(file, out -> RunJsonWriter.write(label, run, out));
        }
    }

    /** @return the kinds in menu order */
    static List<Kind> kinds() {
        return List.of(Kind.values());
    }
}
