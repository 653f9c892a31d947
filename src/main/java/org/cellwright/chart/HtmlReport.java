package org.cellwright.chart;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.Base64;
import java.util.List;
import java.util.Locale;

import org.jfree.chart.JFreeChart;

/**
 * Writes a {@link RunReport} as one self-contained XHTML file: well-formed XML (any XML parser reads it), styles
 * inline, each chart embedded as a PNG data URI, so the file can be mailed or archived alone.
 */
public final class HtmlReport {

    /** Size of each embedded chart (layout px) and its pixel scale: sharp on screens and in print. */
    static final int CHART_W = 640;
    static final int CHART_H = 420;
    static final double CHART_SCALE = 1.5;

    private static final String CSS = """
            body{font-family:"DejaVu Sans",Helvetica,Arial,sans-serif;color:#1f2429;margin:2em auto;max-width:62em;\
            line-height:1.45;padding:0 1em}
            h1{font-size:1.6em;margin:0 0 .2em}h2{font-size:1.15em;border-bottom:2px solid #0b6fae;padding-bottom:.15em;\
            margin-top:1.8em}
            .source{color:#5b6570;margin:0}.notes{white-space:pre-wrap;color:#3a434c}
            table{border-collapse:collapse;margin:.4em 0}td,th{padding:.25em .8em .25em 0;vertical-align:top;\
            text-align:left}th{color:#5b6570;font-weight:normal}td.num{text-align:right;font-variant-numeric:tabular-nums}
            tr+tr td{border-top:1px solid #e3e7eb}
            .caution{border-left:5px solid #cf5a0c;background:#fdf3ec;padding:.5em .8em;margin:.5em 0}
            .caution b{color:#9c3f05}.deferral{font-style:italic;color:#3a434c}
            .plots{display:flex;flex-wrap:wrap;gap:.6em}.plots figure{margin:0;flex:1 1 30em}\
            .plots img{width:100%;height:auto;border:1px solid #e3e7eb}
            pre{background:#f3f5f7;padding:.8em;overflow-x:auto;font-size:.85em}
            footer{margin-top:2.5em;color:#5b6570;font-size:.9em}
            """;

    private HtmlReport() {
    }

    /**
     * @param report the report's content
     * @param out where to write (UTF-8; flushed, not closed)
     * @throws IOException when writing or rendering a chart fails
     */
    public static void write(RunReport report, OutputStream out) throws IOException {
        StringBuilder h = new StringBuilder(1 << 16);
        h.append("<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">\n<head>\n")
                .append("<meta charset=\"UTF-8\"/>\n<title>").append(esc(report.title())).append("</title>\n")
                .append("<style>").append(CSS).append("</style>\n</head>\n<body>\n");
        h.append("<header><h1>").append(esc(report.title())).append("</h1><p class=\"source\">Run report for the scenario ")
                .append(esc(report.source())).append(", made by Cellwright</p></header>\n");
        if (!report.notes().isEmpty()) {
            h.append("<p class=\"notes\">").append(esc(report.notes())).append("</p>\n");
        }
        section(h, "safety", "Safety");
        if (report.cautions().isEmpty()) {
            h.append("<p>This run flags no particular hazard; the usual care with a DC supply and a chemical bath"
                    + " applies.</p>\n");
        }
        for (SafetyCautions.Caution c : report.cautions()) {
            h.append("<div class=\"caution\"><b>").append(esc(c.hazard())).append("</b><br/>")
                    .append(esc(Character.toUpperCase(c.trigger().charAt(0)) + c.trigger().substring(1)))
                    .append(". ").append(esc(c.advice())).append("</div>\n");
        }
        h.append("<p class=\"deferral\">").append(esc(SafetyCautions.DEFERRAL)).append("</p>\n</section>\n");
        section(h, "figures", "Key figures");
        rows(h, report.figures());
        h.append("</section>\n");
        section(h, "plots", "Plots");
        h.append("<div class=\"plots\">\n");
        for (JFreeChart c : RunCharts.of(report.run(), ChartStyle.light()).all()) {
            String name = c.getTitle() == null ? "chart" : c.getTitle().getText();
            h.append("<figure><img alt=\"").append(esc(name)).append("\" src=\"data:image/png;base64,")
                    .append(png(c)).append("\"/></figure>\n");
        }
        h.append("</div>\n</section>\n");
        section(h, "voltage", "Where the cell voltage goes");
        h.append("<table>\n<tr><th>part</th><th>at the start</th><th>averaged</th><th>at the end</th></tr>\n");
        for (VoltageBreakdown.Part p : report.breakdown().parts()) {
            h.append("<tr><td>").append(esc(p.name())).append("</td>").append(volts(p.start())).append(volts(p.mean()))
                    .append(volts(p.end())).append("</tr>\n");
        }
        double[] v = report.breakdown().cellVoltage();
        h.append("<tr><td><b>cell voltage</b></td>").append(volts(v[0])).append(volts(v[1])).append(volts(v[2]))
                .append("</tr>\n</table>\n</section>\n");
        section(h, "charge", "Where the charge went");
        rows(h, report.charge());
        h.append("</section>\n");
        section(h, "forecast", "Forecast: short circuit and deposit form");
        rows(h, report.forecast());
        h.append("</section>\n");
        section(h, "events", "Events");
        rows(h, report.events());
        h.append("</section>\n");
        if (!report.dataNotes().isEmpty()) {
            section(h, "notes", "Notes on the data");
            list(h, report.dataNotes());
            h.append("</section>\n");
        }
        section(h, "inputs", "Inputs");
        rows(h, report.inputs());
        h.append("<details><summary>The scenario as TOML (values with units)</summary><pre>")
                .append(esc(report.scenarioText())).append("</pre></details>\n</section>\n");
        h.append("<footer>Cellwright is a planning aid: its figures come from a model and the data library named in"
                + " its documentation. Check them against measurements before acting on them.</footer>\n");
        h.append("</body>\n</html>\n");
        out.write(h.toString().getBytes(StandardCharsets.UTF_8));
        out.flush();
    }

    private static void section(StringBuilder h, String id, String heading) {
        h.append("<section id=\"").append(id).append("\"><h2>").append(esc(heading)).append("</h2>\n");
    }

    private static void rows(StringBuilder h, List<RunReport.Row> rows) {
        if (rows.isEmpty()) {
            h.append("<p>none</p>\n");
            return;
        }
        h.append("<table>\n");
        for (RunReport.Row r : rows) {
            h.append("<tr><th>").append(esc(r.label())).append("</th><td>").append(esc(r.value())).append("</td></tr>\n");
        }
        h.append("</table>\n");
    }

    private static void list(StringBuilder h, List<String> items) {
        h.append("<ul>\n");
        for (String s : items) {
            h.append("<li>").append(esc(s)).append("</li>\n");
        }
        h.append("</ul>\n");
    }

    private static String volts(double v) {
        return String.format(Locale.ROOT, "<td class=\"num\">%.3f V</td>", v);
    }

    private static String png(JFreeChart chart) throws IOException {
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        ChartExport.writePng(chart, CHART_W, CHART_H, CHART_SCALE, buf);
        return Base64.getEncoder().encodeToString(buf.toByteArray());
    }

    /** @return the text with the five XML special characters escaped */
    static String esc(String s) {
        StringBuilder sb = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> {
                    if (c < 0x20 && c != '\n' && c != '\t') {
                        sb.append(' ');
                    } else {
                        sb.append(c);
                    }
                }
            }
        }
        return sb.toString();
    }
}
