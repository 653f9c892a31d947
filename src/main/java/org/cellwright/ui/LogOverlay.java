package org.cellwright.ui;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Ellipse2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.ToDoubleFunction;

import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.RunCharts;
import org.cellwright.chart.TimeScale;
import org.cellwright.study.LogSeries;
import org.cellwright.study.MeasuredLog;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A measured log drawn over the run charts as markers: current on the current chart, cell voltage on the
 * voltage chart, the weighed deposit on the deposit chart, sampled concentrations on the bath chart and the
 * bath temperature on its chart, each in the chart's display unit (time in the charts' {@link TimeScale},
 * concentrations in mol/L, deposit in g, temperature in degrees C). The markers sit in a dataset of their own
 * ({@link #DATASET}), so the run's lines can be replaced, replayed or restyled without touching them.
 *
 * <p>Event thread only once attached to shown charts.
 */
final class LogOverlay {

    /** Dataset index of the markers on each plot: above those the run charts use (0 to 3). */
    static final int DATASET = 6;
    /** Marker diameter (px): larger than the 1.8 px lines, so a dot stays visible on its line. */
    static final double MARKER_PX = 6;

    /** The charts a logged column is drawn on. */
    enum Target {
        /** Bath composition (mol/L). */
        CONCENTRATIONS,
        /** Cell voltage (V). */
        VOLTAGE,
        /** Current (A). */
        CURRENT,
        /** Deposit (g). */
        DEPOSIT,
        /** Bath temperature (degrees C). */
        TEMPERATURE
    }

    /**
     * One logged column as chart points.
     *
     * @param target the chart it is drawn on
     * @param series its points, x in the time scale's unit, y in the chart's unit
     * @param species the species of a concentration, else null
     */
    record Markers(Target target, XYSeries series, String species) {
    }

    private final MeasuredLog log;
    private final ToDoubleFunction<String> molarMassKgPerMol;
    private RunCharts charts;

    /**
     * @param log the measured log
     * @param molarMassKgPerMol a species' molar mass (kg/mol), for columns given in g/L
     */
    LogOverlay(MeasuredLog log, ToDoubleFunction<String> molarMassKgPerMol) {
        this.log = log;
        this.molarMassKgPerMol = molarMassKgPerMol;
    }

    /** @return the log drawn */
    MeasuredLog log() {
        return log;
    }

    /**
     * The log's columns as chart points: blank cells left out, times in {@code scale}, values in the unit of
     * the chart they are drawn on.
     *
     * @param scale the charts' time unit
     * @return one entry per column that a chart shows, in log order
     */
    List<Markers> markers(TimeScale scale) {
        List<Markers> out = new ArrayList<>();
        double[] t = log.timesS();
        for (LogSeries s : log.series()) {
            Target target = switch (s.quantity()) {
                case CURRENT -> Target.CURRENT;
                case CELL_VOLTAGE -> Target.VOLTAGE;
                case DEPOSIT -> Target.DEPOSIT;
                case CONCENTRATION_G_PER_L, CONCENTRATION_MOL_PER_L -> Target.CONCENTRATIONS;
                case TEMPERATURE -> Target.TEMPERATURE;
            };
            double factor = 1;
            if (s.quantity() == org.cellwright.study.LoggedQuantity.CONCENTRATION_G_PER_L) {
                // g/L is kg/m3; divided by kg/mol gives mol/m3, and mol/m3 / 1000 is mol/L
                double m = molarMassKgPerMol.applyAsDouble(s.species());
                if (!(m > 0)) {
                    continue;
                }
                factor = 1 / (m * 1000);
            }
            XYSeries xy = new XYSeries(label(s), true, true);
            for (int row = 0; row < t.length; row++) {
                double v = s.values()[row];
                if (!Double.isNaN(v)) {
                    xy.add(scale.fromSeconds(t[row]), v * factor, false);
                }
            }
            out.add(new Markers(target, xy, s.species()));
        }
        return out;
    }

    /** @return the legend name of a column's markers ("Cu2+ measured") */
    static String label(LogSeries s) {
        return switch (s.quantity()) {
            case CURRENT -> "current, measured";
            case CELL_VOLTAGE -> "cell voltage, measured";
            case DEPOSIT -> "deposit, weighed";
            case CONCENTRATION_G_PER_L, CONCENTRATION_MOL_PER_L -> s.species() + ", sampled";
            case TEMPERATURE -> "bath, measured";
        };
    }

    /**
     * Draws the markers on charts (replacing what this overlay drew on earlier charts).
     *
     * @param c the charts shown now, or null
     */
    void attach(RunCharts c) {
        charts = c;
        if (c == null) {
            return;
        }
        ChartStyle style = ChartStyle.of(UiTheme.isDark());
        List<Markers> all = markers(c.model().timeScale());
        for (Target target : Target.values()) {
            JFreeChart chart = chartOf(c, target);
            XYSeriesCollection data = new XYSeriesCollection();
            XYLineAndShapeRenderer r = renderer();
            for (Markers m : all) {
                if (m.target() != target) {
                    continue;
                }
                int i = data.getSeriesCount();
                data.addSeries(m.series());
                Color line = colourOf(c, m, style);
                r.setSeriesPaint(i, line, false);
                r.setSeriesOutlinePaint(i, line, false);
                r.setSeriesFillPaint(i, ChartStyle.of(style.isDark()).plotBackground(), false);
            }
            XYPlot plot = chart.getXYPlot();
            plot.setDataset(DATASET, data.getSeriesCount() == 0 ? null : data);
            plot.setRenderer(DATASET, data.getSeriesCount() == 0 ? null : r);
        }
    }

    /** Removes the markers from the charts they were drawn on. */
    void detach() {
        if (charts != null) {
            for (Target target : Target.values()) {
                XYPlot plot = chartOf(charts, target).getXYPlot();
                plot.setDataset(DATASET, null);
                plot.setRenderer(DATASET, null);
            }
        }
        charts = null;
    }

    /** Draws the markers again in the look now in force (after a switch of light and dark). */
    void restyle() {
        if (charts != null) {
            attach(charts);
        }
    }

    /**
     * @param c charts
     * @param target a target
     * @return the chart of that target
     */
    static JFreeChart chartOf(RunCharts c, Target target) {
        return switch (target) {
            case CONCENTRATIONS -> c.concentrations();
            case VOLTAGE -> c.voltage();
            case CURRENT -> c.current();
            case DEPOSIT -> c.deposit();
            case TEMPERATURE -> c.temperature();
        };
    }

    /** The colour of the line the markers are compared with, so a sample sits on its own species' curve. */
    private static Color colourOf(RunCharts c, Markers m, ChartStyle style) {
        return switch (m.target()) {
            case CONCENTRATIONS -> c.speciesColour(m.species());
            // the line is in the text colour over coloured bands: vermillion dots stand out from both
            case VOLTAGE -> style.series(1);
            case CURRENT -> style.series(0);
            case DEPOSIT -> c.model().metalSymbols().size() == 1 ? c.metalColour(c.model().metalSymbols().get(0))
                    : style.text();
            case TEMPERATURE -> style.series(1);
        };
    }

    /**
     * Open round markers without lines; the series keep their own colours and shapes when the chart theme
     * is applied again (auto-population off), and make no per-item entities (pitfall P6).
     */
    private static XYLineAndShapeRenderer renderer() {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(false, true);
        r.setAutoPopulateSeriesPaint(false);
        r.setAutoPopulateSeriesFillPaint(false);
        r.setAutoPopulateSeriesOutlinePaint(false);
        r.setAutoPopulateSeriesShape(false);
        r.setAutoPopulateSeriesStroke(false);
        r.setAutoPopulateSeriesOutlineStroke(false);
        double d = MARKER_PX;
        r.setDefaultShape(new Ellipse2D.Double(-d / 2, -d / 2, d, d), false);
        r.setUseFillPaint(true);
        r.setDrawOutlines(true);
        r.setUseOutlinePaint(true);
        r.setDefaultOutlineStroke(new BasicStroke(1.5f), false);
        r.setDefaultCreateEntities(false);
        r.setDefaultSeriesVisibleInLegend(true, false);
        return r;
    }

    /**
     * @return a line saying what is drawn ("81 rows over 6 h 53 min: current_A, cell_voltage_V ...")
     */
    String describe() {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "%d rows over %s:", log.timesS().length,
                org.cellwright.sim.RunClock.format(log.endS())));
        for (LogSeries s : log.series()) {
            sb.append(' ').append(s.column()).append(" (").append(s.count()).append(')');
        }
        return sb.toString();
    }
}
