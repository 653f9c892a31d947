package org.cellwright.chart;

import java.awt.Color;
import java.io.IOException;
import java.io.OutputStream;
import java.util.List;
import java.util.Locale;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.jfree.chart.JFreeChart;

/**
 * Writes a {@link RunReport} as a PDF through Apache PDFBox: A4 pages with the same sections as the HTML
 * report (the scenario's TOML text left out; the inputs table carries its values), the charts as vector
 * drawings two to a row.
 */
public final class PdfReport {

    private static final float BODY = 9.5f;
    private static final Color MUTED = new Color(0x5b6570);
    private static final Color CAUTION_FILL = new Color(0xfdf3ec);
    private static final Color CAUTION_EDGE = new Color(0xcf5a0c);
    private static final Color CAUTION_TEXT = new Color(0x9c3f05);
    /** Layout size of each chart (px) and its scale on the page: two charts side by side across 495 pt. */
    private static final int CHART_W = 600;
    private static final int CHART_H = 420;

    private PdfReport() {
    }

    /**
     * @param report the report's content
     * @param out where to write (not closed)
     * @throws IOException when writing fails
     */
    public static void write(RunReport report, OutputStream out) throws IOException {
        try (PDDocument doc = new PDDocument()) {
            PDDocumentInformation info = doc.getDocumentInformation();
            info.setTitle(PdfPages.plain(report.title()));
            info.setCreator("Cellwright");
            try (PdfPages p = new PdfPages(doc)) {
                body(report, p);
            }
            doc.save(out);
        }
        out.flush();
    }

    private static void body(RunReport report, PdfPages p) throws IOException {
        p.need(60);
        p.paragraph(report.title(), PdfPages.BOLD, 17, Color.BLACK, 0);
        p.paragraph("Run report for the scenario " + report.source() + ", made by Cellwright", PdfPages.REGULAR, BODY,
                MUTED, 0);
        if (!report.notes().isEmpty()) {
            p.space(4);
            p.paragraph(report.notes().replace("\n", " "), PdfPages.ITALIC, BODY, new Color(0x3a434c), 0);
        }

        p.heading("Safety");
        if (report.cautions().isEmpty()) {
            p.paragraph("This run flags no particular hazard; the usual care with a DC supply and a chemical bath"
                    + " applies.", PdfPages.REGULAR, BODY, Color.BLACK, 0);
        }
        for (SafetyCautions.Caution c : report.cautions()) {
            String text = capitalised(c.trigger()) + ". " + c.advice();
            float h = PdfPages.height(c.hazard(), PdfPages.BOLD, BODY, 12)
                    + PdfPages.height(text, PdfPages.REGULAR, BODY, 12) + 8;
            p.band(h, CAUTION_FILL, CAUTION_EDGE);
            p.space(3);
            p.paragraph(c.hazard(), PdfPages.BOLD, BODY, CAUTION_TEXT, 12);
            p.paragraph(text, PdfPages.REGULAR, BODY, Color.BLACK, 12);
            p.space(9);
        }
        p.paragraph(SafetyCautions.DEFERRAL, PdfPages.ITALIC, BODY, new Color(0x3a434c), 0);

        p.heading("Key figures");
        p.table(report.figures(), 150, BODY);

        List<JFreeChart> charts = RunCharts.of(report.run(), ChartStyle.light()).all();
        float scale = (PdfPages.width() - 8) / 2 / CHART_W;
        p.need(60 + CHART_H * scale);
        p.heading("Plots");
        for (int i = 0; i < charts.size(); i++) {
            boolean left = i % 2 == 0;
            p.drawing(charts.get(i), CHART_W, CHART_H, left ? 0 : PdfPages.width() / 2 + 4, scale, left);
        }

        p.heading("Where the cell voltage goes");
        float[] xs = {0, 200, 290, 380};
        p.cells(List.of("part", "at the start", "averaged", "at the end"), xs, PdfPages.BOLD, BODY);
        for (VoltageBreakdown.Part part : report.breakdown().parts()) {
            p.cells(List.of(part.name(), volts(part.start()), volts(part.mean()), volts(part.end())), xs,
                    PdfPages.REGULAR, BODY);
        }
        double[] v = report.breakdown().cellVoltage();
        p.cells(List.of("cell voltage", volts(v[0]), volts(v[1]), volts(v[2])), xs, PdfPages.BOLD, BODY);

        p.heading("Where the charge went");
        p.table(report.charge(), 150, BODY);

        p.heading("Forecast: short circuit and deposit form");
        p.table(report.forecast(), 150, BODY);

        p.heading("Events");
        if (report.events().isEmpty()) {
            p.paragraph("none", PdfPages.REGULAR, BODY, Color.BLACK, 0);
        }
        p.table(report.events(), 70, BODY);

        if (!report.dataNotes().isEmpty()) {
            p.heading("Notes on the data");
            for (String n : report.dataNotes()) {
                p.paragraph("- " + n, PdfPages.REGULAR, BODY, Color.BLACK, 0);
            }
        }

        p.heading("Inputs");
        p.table(report.inputs(), 150, BODY);
        p.space(10);
        p.paragraph("Cellwright is a planning aid: its figures come from a model and the data library named in its"
                + " documentation. Check them against measurements before acting on them.", PdfPages.ITALIC, 8.5f,
                MUTED, 0);
    }

    private static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    private static String volts(double v) {
        return String.format(Locale.ROOT, "%.3f V", v);
    }
}
