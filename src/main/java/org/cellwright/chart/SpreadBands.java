package org.cellwright.chart;

import java.awt.Color;
import java.util.List;

import org.cellwright.study.SeriesBands;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYPolygonAnnotation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.YIntervalDataItem;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/**
 * Draws a spread study's 5-95 % bands under the lines of a run's charts ({@link RunCharts}): each band in
 * the hue of its line, translucent, behind everything else on the plot, with a note under the chart title.
 * Units as the charts show them: mol/L, V, A, %, g, degrees C, mm.
 *
 * <p>Call {@link #apply} on the event thread once the charts show the nominal run, and again after
 * {@link RunCharts#setStyle} (a new style resets the renderers' colours).
 */
public final class SpreadBands {

    /** Dataset index of the bands on each plot (behind the run's own datasets 0-3). */
    public static final int BANDS = 5;
    /** Dataset index of the efficiency bands, on the current chart's second axis. */
    public static final int EFFICIENCY_BANDS = 6;
    /** The start of the note under each chart title. */
    static final String NOTE = "shaded: 5-95 % of ";
    /** Opacity of a band. */
    static final float ALPHA = 0.28f;

    private SpreadBands() {
    }

    /**
     * @param charts the charts of the nominal run
     * @param bands the study's bands
     * @param samples how many samples they come from (for the note)
     */
    public static void apply(RunCharts charts, SeriesBands bands, int samples) {
        RunChartModel m = charts.model();
        ChartStyle style = charts.style();
        List<String> species = m.speciesNames();
        YIntervalSeriesCollection c = new YIntervalSeriesCollection();
        Color[] colours = new Color[species.size()];
        for (int i = 0; i < species.size(); i++) {
            c.addSeries(series(species.get(i), bands, "c:" + species.get(i), m, 1e-3, 0));
            colours[i] = charts.speciesColour(species.get(i));
        }
        put(charts.concentrations(), BANDS, c, colours);
        // the voltage parts are opaque areas: a band behind them would hide, so this one lies on top, translucent
        overlay(charts.voltage(), series("cell voltage", bands, "cell_voltage", m, 1, 0), style.text());
        put(charts.current(), BANDS, one("current", bands, "current", m, 1, 0), style.series(0));
        YIntervalSeriesCollection eff = new YIntervalSeriesCollection();
        eff.addSeries(series("current efficiency", bands, "efficiency", m, 100, 0));
        eff.addSeries(series("cumulative", bands, "efficiency_cumulative", m, 100, 0));
        put(charts.current(), EFFICIENCY_BANDS, eff, style.series(4), style.series(2));
        charts.current().getXYPlot().mapDatasetToRangeAxis(EFFICIENCY_BANDS, 1);
        List<String> metals = m.metalSymbols();
        YIntervalSeriesCollection d = new YIntervalSeriesCollection();
        Color[] metalColours = new Color[metals.size()];
        for (int i = 0; i < metals.size(); i++) {
            d.addSeries(series(metals.get(i), bands, "deposit:" + metals.get(i), m, 1000, 0));
            metalColours[i] = charts.metalColour(metals.get(i));
        }
        put(charts.deposit(), BANDS, d, metalColours);
        put(charts.temperature(), BANDS, one("temperature", bands, "temperature", m, 1, -273.15), style.series(1));
        put(charts.dendrite(), BANDS, one("dendrite", bands, "dendrite", m, 1000, 0), style.series(3));
        for (JFreeChart chart : charts.all()) {
            for (int i = chart.getSubtitleCount() - 1; i >= 0; i--) {
                if (chart.getSubtitle(i) instanceof TextTitle t && t.getText().startsWith(NOTE)) {
                    chart.removeSubtitle(t);
                }
            }
            TextTitle note = new TextTitle(NOTE + samples + " samples", style.font(10f, false));
            note.setPaint(style.mutedText());
            chart.addSubtitle(note);
        }
    }

    /**
     * Takes the bands off the charts again (their datasets, the voltage chart's polygon and the notes); does
     * nothing to charts without bands.
     *
     * @param charts the charts
     */
    public static void remove(RunCharts charts) {
        for (JFreeChart chart : charts.all()) {
            XYPlot plot = chart.getXYPlot();
            if (plot.getDataset(BANDS) != null) {
                plot.setDataset(BANDS, null);
            }
            if (plot.getDataset(EFFICIENCY_BANDS) != null) {
                plot.setDataset(EFFICIENCY_BANDS, null);
            }
            for (Object a : new java.util.ArrayList<>(plot.getAnnotations())) {
                if (a instanceof XYPolygonAnnotation p && NOTE.equals(p.getToolTipText())) {
                    plot.removeAnnotation(p);
                }
            }
            for (int i = chart.getSubtitleCount() - 1; i >= 0; i--) {
                if (chart.getSubtitle(i) instanceof TextTitle t && t.getText().startsWith(NOTE)) {
                    chart.removeSubtitle(t);
                }
            }
        }
    }

    /**
     * @param charts the charts
     * @return true when they show bands now
     */
    public static boolean shown(RunCharts charts) {
        return charts.concentrations().getXYPlot().getDataset(BANDS) != null;
    }

    /** Draws a band as a translucent polygon over everything on the plot (replacing an earlier one). */
    private static void overlay(JFreeChart chart, YIntervalSeries band, Color colour) {
        XYPlot plot = chart.getXYPlot();
        for (Object a : new java.util.ArrayList<>(plot.getAnnotations())) {
            if (a instanceof XYPolygonAnnotation p && NOTE.equals(p.getToolTipText())) {
                plot.removeAnnotation(p);
            }
        }
        int n = band.getItemCount();
        if (n < 2) {
            return;
        }
        double[] polygon = new double[4 * n];
        for (int i = 0; i < n; i++) {
            polygon[2 * i] = band.getX(i).doubleValue();
            polygon[2 * i + 1] = band.getYHighValue(i);
            polygon[4 * n - 2 * i - 2] = band.getX(i).doubleValue();
            polygon[4 * n - 2 * i - 1] = band.getYLowValue(i);
        }
        Color fill = new Color(colour.getRed(), colour.getGreen(), colour.getBlue(), Math.round(255 * ALPHA));
        XYPolygonAnnotation a = new XYPolygonAnnotation(polygon, null, null, fill);
        a.setToolTipText(NOTE);
        plot.addAnnotation(a);
    }

    private static YIntervalSeriesCollection one(String name, SeriesBands bands, String key, RunChartModel m,
                                                 double scale, double offset) {
        YIntervalSeriesCollection c = new YIntervalSeriesCollection();
        c.addSeries(series(name, bands, key, m, scale, offset));
        return c;
    }

    /**
     * @return a band as a series in chart units: x in the model's time unit, y = scale * SI + offset; times
     *     without a band are left out
     */
    static YIntervalSeries series(String name, SeriesBands bands, String key, RunChartModel m, double scale,
                                  double offset) {
        YIntervalSeries s = new YIntervalSeries(name);
        SeriesBands.Band b = bands.band(key);
        if (b == null) {
            return s;
        }
        double[] t = bands.timeS();
        for (int g = 0; g < t.length; g++) {
            if (Double.isFinite(b.p5()[g]) && Double.isFinite(b.p95()[g])) {
                s.add(new YIntervalDataItem(m.timeScale().fromSeconds(t[g]), b.p50()[g] * scale + offset,
                        b.p5()[g] * scale + offset, b.p95()[g] * scale + offset), false);
            }
        }
        return s;
    }

    private static void put(JFreeChart chart, int index, YIntervalSeriesCollection data, Color... colours) {
        XYPlot plot = chart.getXYPlot();
        DeviationRenderer r = new DeviationRenderer(false, false);
        r.setAlpha(ALPHA);
        r.setDefaultCreateEntities(false);
        r.setDefaultSeriesVisibleInLegend(false);
        for (int i = 0; i < colours.length; i++) {
            r.setSeriesFillPaint(i, colours[i], false);
            r.setSeriesPaint(i, colours[i], false);
        }
        plot.setDataset(index, data);
        plot.setRenderer(index, r);
    }
}
