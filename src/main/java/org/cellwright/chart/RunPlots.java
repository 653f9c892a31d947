package org.cellwright.chart;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.data.xy.XYDataset;

/**
 * Builds the six run charts' plots: datasets, axes with their units and renderers, without colours (those
 * come from {@link ChartStyle} through {@link RunCharts}). Datasets are rendered in reverse index order,
 * so the live series (index {@link #LIVE}) lie on top of the reference run ({@link #REFERENCE}), which lies
 * on top of the voltage bands ({@link #BANDS}).
 */
final class RunPlots {

    /** Dataset index of the live run's series. */
    static final int LIVE = 0;
    /** Dataset index of the pinned reference run's series. */
    static final int REFERENCE = 1;
    /** Dataset index of the voltage breakdown bands (voltage chart) and of the efficiencies (current chart). */
    static final int BANDS = 2;
    /** Dataset index of the efficiencies on the current chart's second axis. */
    static final int EFFICIENCY = 2;
    /** Dataset index of the reference run's efficiencies. */
    static final int REFERENCE_EFFICIENCY = 3;
    /** Dataset index of the anolyte's concentrations of a divided cell (composition chart). */
    static final int ANOLYTE = 4;

    /** Upper end of the efficiency axis (%): 100 % plus room so the line at 100 % is not on the frame. */
    static final double EFFICIENCY_AXIS_MAX = 105;
    /**
     * Headroom above the highest current, as a share of the axis: keeps a steady current's line clear of
     * the efficiency lines near 100 % on the second axis.
     */
    static final double CURRENT_HEADROOM = 0.3;
    /** Smallest span of the temperature axis (degrees C), so that an isothermal run draws a flat line. */
    static final double TEMPERATURE_MIN_SPAN_C = 2;

    private RunPlots() {
    }

    static JFreeChart concentrations(RunChartModel m) {
        XYPlot plot = withRun(plot(m, "concentration (mol/L)"), m.concentrations());
        if (!m.anolyteSpecies().isEmpty()) {
            plot.setDataset(ANOLYTE, m.anolyte());
            plot.setRenderer(ANOLYTE, referenceLines());
        }
        return chart("Bath composition", plot);
    }

    static JFreeChart voltage(RunChartModel m) {
        XYPlot plot = withRun(plot(m, "voltage (V)"), m.cellVoltage());
        plot.setDataset(BANDS, m.voltageParts());
        DeviationRenderer bands = new DeviationRenderer(false, false);
        bands.setAlpha(1f);
        bands.setDefaultCreateEntities(false);
        plot.setRenderer(BANDS, bands);
        return chart("Cell voltage and its parts", plot);
    }

    static JFreeChart current(RunChartModel m) {
        XYPlot plot = plot(m, "current (A)");
        plot.getRangeAxis().setUpperMargin(CURRENT_HEADROOM);
        withRun(plot, m.current());
        NumberAxis eff = new NumberAxis("current efficiency (%)");
        eff.setRange(0, EFFICIENCY_AXIS_MAX);
        eff.setAutoRange(false);
        plot.setRangeAxis(1, eff);
        plot.setRangeAxisLocation(1, AxisLocation.BOTTOM_OR_RIGHT);
        plot.setDataset(EFFICIENCY, m.efficiency());
        plot.setRenderer(EFFICIENCY, lines());
        plot.mapDatasetToRangeAxis(EFFICIENCY, 1);
        plot.setRenderer(REFERENCE_EFFICIENCY, referenceLines());
        plot.mapDatasetToRangeAxis(REFERENCE_EFFICIENCY, 1);
        return chart("Current and current efficiency", plot);
    }

    static JFreeChart deposit(RunChartModel m) {
        return chart("Deposit per metal", withRun(plot(m, "deposit (g)"), m.deposit()));
    }

    static JFreeChart temperature(RunChartModel m) {
        XYPlot plot = plot(m, "temperature (\u00b0C)");
        ((NumberAxis) plot.getRangeAxis()).setAutoRangeIncludesZero(false);
        plot.getRangeAxis().setAutoRangeMinimumSize(TEMPERATURE_MIN_SPAN_C);
        return chart("Bath temperature", withRun(plot, m.temperature()));
    }

    static JFreeChart dendrite(RunChartModel m) {
        XYPlot plot = plot(m, "tip height (mm)");
        plot.getRangeAxis().setAutoRange(false);
        return chart("Dendrite tip against the gap", withRun(plot, m.dendrite()));
    }

    /**
     * Puts the live run's series on {@code plot} (drawn as lines) and readies the reference run's renderer
     * (lines without a legend entry); the axes are set up before, so that their auto-range settings hold
     * when the data arrive.
     */
    private static XYPlot withRun(XYPlot plot, XYDataset live) {
        plot.setDataset(LIVE, live);
        plot.setRenderer(LIVE, lines());
        plot.setRenderer(REFERENCE, referenceLines());
        return plot;
    }

    private static XYPlot plot(RunChartModel m, String rangeLabel) {
        NumberAxis time = new NumberAxis(m.timeScale().axisLabel());
        time.setAutoRange(false);
        time.setLowerMargin(0);
        time.setUpperMargin(0);
        NumberAxis range = new NumberAxis(rangeLabel);
        range.setAutoRangeIncludesZero(true);
        range.setUpperMargin(0.06);
        XYPlot plot = new XYPlot(null, time, range, null);
        plot.setOrientation(PlotOrientation.VERTICAL);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.REVERSE);
        plot.setAxisOffset(new RectangleInsets(2, 2, 2, 2));
        plot.setDomainPannable(false);
        plot.setRangePannable(false);
        return plot;
    }

    /** A line renderer without shapes or per-item entities (pitfall P6: entities cost on every repaint). */
    static XYLineAndShapeRenderer lines() {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setDrawSeriesLineAsPath(true);
        r.setDefaultCreateEntities(false);
        return r;
    }

    private static XYLineAndShapeRenderer referenceLines() {
        XYLineAndShapeRenderer r = lines();
        r.setDefaultSeriesVisibleInLegend(false);
        return r;
    }

    private static JFreeChart chart(String title, XYPlot plot) {
        JFreeChart chart = new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.BOTTOM);
        legend.setItemLabelPadding(new RectangleInsets(1, 2, 1, 6));
        return chart;
    }
}
