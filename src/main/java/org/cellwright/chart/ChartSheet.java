package org.cellwright.chart;

import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.cellwright.sim.RunClock;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.RunSummary;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.ui.Drawable;

/**
 * One page with the six charts of a run in a grid of three columns and two rows, under a title line (the
 * scenario's title) and a line of key figures (how the run ended, deposit, current efficiency, mean cell
 * voltage, specific energy, duration). Written to PNG or SVG by {@link #export(Path)}.
 */
public final class ChartSheet implements Drawable {

    /** Default width (px): three charts of 600 px. */
    public static final int DEFAULT_WIDTH = 1800;
    /** Default height (px): the heading plus two rows of 560 px. */
    public static final int DEFAULT_HEIGHT = 1200;

    private static final int COLUMNS = 3;
    private static final int HEADING_PX = 72;
    private static final int GUTTER_PX = 8;
    /** J per kWh (source: SI Brochure, 9th ed., table 8: 1 W h = 3600 J). */
    private static final double J_PER_KWH = 3.6e6;
    /** Kelvin at 0 degrees C (source: SI Brochure, 9th ed., 2.3.1). */
    private static final double ZERO_CELSIUS_K = 273.15;

    private final RunCharts charts;
    private final String title;
    private final String figures;

    /**
     * @param charts the charts to lay out (their style is the sheet's)
     * @param title the heading
     * @param figures the line of key figures under it
     */
    public ChartSheet(RunCharts charts, String title, String figures) {
        this.charts = charts;
        this.title = title == null ? "" : title;
        this.figures = figures == null ? "" : figures;
    }

    /**
     * @param result a finished run
     * @param style the look
     * @return its sheet, with the run's title and figures
     */
    public static ChartSheet of(RunResult result, ChartStyle style) {
        return new ChartSheet(RunCharts.of(result, style), titleOf(result), figuresOf(result.summary()));
    }

    /**
     * @param result a run
     * @return the scenario title, or "Cellwright run" when it has none
     */
    public static String titleOf(RunResult result) {
        String t = result.scenario().title();
        return t.isBlank() ? "Cellwright run" : t;
    }

    /**
     * @param s a run's summary
     * @return how the run ended and its key figures, in display units, separated by middle dots
     */
    public static String figuresOf(RunSummary s) {
        List<String> parts = new ArrayList<>();
        parts.add(endingOf(s));
        parts.add(RunClock.format(s.durationS()));
        for (Map.Entry<String, Double> d : s.depositKg().entrySet()) {
            if (d.getValue() > 0 || d.getKey().equals(s.targetMetal())) {
                parts.add(d.getKey() + " " + grams(d.getValue()));
            }
        }
        if (s.targetMetal() != null) {
            parts.add(String.format(Locale.ROOT, "current efficiency %.1f %%", 100 * s.currentEfficiency()));
        }
        if (s.morphologyFinal() != null) {
            parts.add("deposit " + s.morphologyFinal());
        }
        if (s.shortCircuitS() != null) {
            parts.add("shorted at " + RunClock.format(s.shortCircuitS()));
        } else if (s.shortCircuitForecastS() != null) {
            parts.add("short foreseen at " + RunClock.format(s.shortCircuitForecastS()));
        }
        parts.add(String.format(Locale.ROOT, "mean cell voltage %.2f V", s.cellVoltageMeanV()));
        if (Double.isFinite(s.specificEnergyJPerKg())) {
            parts.add(String.format(Locale.ROOT, "%.3g kWh/kg", s.specificEnergyJPerKg() / J_PER_KWH));
        }
        parts.add(String.format(Locale.ROOT, "bath %.1f \u2192 %.1f \u00b0C", s.temperatureStartK() - ZERO_CELSIUS_K,
                s.temperatureEndK() - ZERO_CELSIUS_K));
        return String.join("  \u00b7  ", parts);
    }

    private static String endingOf(RunSummary s) {
        return switch (s.stopReason()) {
            case "end" -> "ran its full time";
            case "short_circuit" -> "stopped: a dendrite shorted the cell";
            case "target" -> "stopped: target reached";
            case "voltage_limit" -> "stopped at the voltage limit";
            case "temperature_limit" -> "stopped at the temperature limit";
            default -> "stopped: " + s.stopReason().replace('_', ' ');
        };
    }

    private static String grams(double kg) {
        double g = kg * 1000;
        return g >= 100 ? String.format(Locale.ROOT, "%.0f g", g) : String.format(Locale.ROOT, "%.3g g", g);
    }

    /** @return the charts on the sheet */
    public RunCharts charts() {
        return charts;
    }

    /** @return the heading */
    public String title() {
        return title;
    }

    /** @return the line of key figures */
    public String figures() {
        return figures;
    }

    @Override
    public void draw(Graphics2D g, Rectangle2D area) {
        ChartStyle style = charts.style();
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setPaint(style.paper());
        g.fill(area);
        double x0 = area.getX() + GUTTER_PX;
        double w = area.getWidth() - 2 * GUTTER_PX;
        Font big = style.font(19f, true);
        Font small = style.font(13f, false);
        g.setFont(big);
        g.setPaint(style.text());
        FontMetrics fm = g.getFontMetrics();
        g.drawString(fit(title, fm, w), (float) (x0 + 6), (float) (area.getY() + 10 + fm.getAscent()));
        double y = area.getY() + 10 + fm.getHeight() + 4;
        g.setFont(small);
        g.setPaint(style.mutedText());
        fm = g.getFontMetrics();
        g.drawString(fit(figures, fm, w), (float) (x0 + 6), (float) (y + fm.getAscent()));

        List<JFreeChart> all = charts.all();
        int rows = (all.size() + COLUMNS - 1) / COLUMNS;
        double top = area.getY() + HEADING_PX;
        double cw = w / COLUMNS;
        double ch = (area.getMaxY() - top - GUTTER_PX) / rows;
        for (int i = 0; i < all.size(); i++) {
            int col = i % COLUMNS;
            int row = i / COLUMNS;
            Rectangle2D cell = new Rectangle2D.Double(x0 + col * cw, top + row * ch, cw - GUTTER_PX, ch - GUTTER_PX);
            all.get(i).draw(g, cell);
        }
    }

    private static String fit(String text, FontMetrics fm, double width) {
        if (fm.stringWidth(text) <= width - 12) {
            return text;
        }
        String s = text;
        while (!s.isEmpty() && fm.stringWidth(s + "\u2026") > width - 12) {
            s = s.substring(0, s.length() - 1);
        }
        return s + "\u2026";
    }

    /**
     * Writes the sheet at its default size, PNG or SVG by the file's extension.
     *
     * @param file the target file
     * @throws IOException when it cannot be written
     * @throws IllegalArgumentException when the extension is neither .png nor .svg
     */
    public void export(Path file) throws IOException {
        export(file, DEFAULT_WIDTH, DEFAULT_HEIGHT);
    }

    /**
     * Writes the sheet at a given size, PNG or SVG by the file's extension.
     *
     * @param file the target file
     * @param width width (px)
     * @param height height (px)
     * @throws IOException when it cannot be written
     * @throws IllegalArgumentException when the extension is neither .png nor .svg or the size is below 1 px
     */
    public void export(Path file, int width, int height) throws IOException {
        ChartExport.write(this, width, height, file);
    }

    /**
     * Writes the sheet laid out at a given size; a PNG gets {@code scale} times the pixels each way.
     *
     * @param file the target file
     * @param width layout width (px)
     * @param height layout height (px)
     * @param scale pixels per layout pixel of a PNG (1 to {@link ChartExport#MAX_SCALE}); ignored for SVG
     * @throws IOException when it cannot be written
     * @throws IllegalArgumentException for a bad extension, size or scale
     */
    public void export(Path file, int width, int height, double scale) throws IOException {
        ChartExport.write(this, width, height, scale, file);
    }
}
