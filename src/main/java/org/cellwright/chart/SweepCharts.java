package org.cellwright.chart;

import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.text.FieldPosition;
import java.text.NumberFormat;
import java.text.ParsePosition;
import java.util.List;

import org.cellwright.study.SummaryFigure;
import org.cellwright.study.SweepAxis;
import org.cellwright.study.SweepPoint;
import org.cellwright.study.SweepResult;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.data.xy.DefaultXYZDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The chart of a sweep: for two varied keys a heat map of one summary figure (first key across, second key
 * up, colours by {@link HeatScale}, cells without a value in the scale's grey), for one key a line with a
 * marker at each point (gaps where a point has no value).
 *
 * <p>Numeric axes are drawn to scale (in the heat map only when evenly spaced); log-spaced values and words
 * are drawn one step per value with the values as tick labels (for log-spaced values that is a log scale). In the heat map, item {@code i} of series 0 is grid point {@code i}, so a
 * window can map a click on a cell (its {@code XYItemEntity}) back to the point and run it again.
 */
public final class SweepCharts {

    private SweepCharts() {
    }

    /**
     * @param result the sweep
     * @param figure the figure to show
     * @param subtitle a line under the title (the scenario's title), or null
     * @param style the look
     * @return a heat map (two keys) or a line chart (one key)
     */
    public static JFreeChart of(SweepResult result, SummaryFigure figure, String subtitle, ChartStyle style) {
        JFreeChart chart = result.axes().size() == 2 ? heatMap(result, figure, style) : line(result, figure, style);
        if (subtitle != null && !subtitle.isBlank()) {
            TextTitle t = new TextTitle(subtitle, style.font(11f, false));
            t.setPaint(style.mutedText());
            chart.addSubtitle(0, t);
        }
        return chart;
    }

    /**
     * @param result a sweep over two keys
     * @param figure the figure
     * @param style the look
     * @return the heat map
     */
    public static JFreeChart heatMap(SweepResult result, SummaryFigure figure, ChartStyle style) {
        SweepAxis ax = result.axes().get(0);
        SweepAxis ay = result.axes().get(1);
        int n = result.points().size();
        double[][] data = new double[3][n];
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        boolean toScaleX = evenlySpaced(ax);
        boolean toScaleY = evenlySpaced(ay);
        for (int i = 0; i < n; i++) {
            SweepPoint p = result.points().get(i);
            int[] idx = p.point().indices();
            data[0][i] = toScaleX ? ax.values().get(idx[0]).number() : idx[0];
            data[1][i] = toScaleY ? ay.values().get(idx[1]).number() : idx[1];
            double z = figure.toDisplay(p.si(figure));
            data[2][i] = z;
            if (Double.isFinite(z)) {
                lo = Math.min(lo, z);
                hi = Math.max(hi, z);
            }
        }
        if (!(lo <= hi)) {
            lo = 0;
            hi = 1;
        }
        DefaultXYZDataset dataset = new DefaultXYZDataset();
        dataset.addSeries(figure.key(), data);
        HeatScale scale = new HeatScale(lo, hi, style.grid());
        XYBlockRenderer renderer = new XYBlockRenderer();
        renderer.setPaintScale(scale);
        renderer.setBlockWidth(toScaleX ? step(ax) : 1);
        renderer.setBlockHeight(toScaleY ? step(ay) : 1);
        XYPlot plot = new XYPlot(dataset, axis(ax, toScaleX, true), axis(ay, toScaleY, true), renderer);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        plot.setAxisOffset(new RectangleInsets(2, 2, 2, 2));
        JFreeChart chart = new JFreeChart(figure.description() + " over " + ax.key() + " and " + ay.key(),
                JFreeChart.DEFAULT_TITLE_FONT, plot, false);
        style.apply(chart);
        plot.setBackgroundPaint(style.plotBackground());
        NumberAxis scaleAxis = new NumberAxis(figure.label());
        scaleAxis.setRange(scale.getLowerBound(), scale.getUpperBound());
        scaleAxis.setLabelFont(style.font(11f, false));
        scaleAxis.setLabelPaint(style.text());
        scaleAxis.setTickLabelPaint(style.mutedText());
        PaintScaleLegend legend = new PaintScaleLegend(scale, scaleAxis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setAxisLocation(AxisLocation.BOTTOM_OR_RIGHT);
        legend.setMargin(new RectangleInsets(6, 10, 6, 4));
        legend.setStripWidth(14);
        legend.setBackgroundPaint(style.paper());
        chart.addSubtitle(legend);
        if (result.points().stream().anyMatch(p -> !Double.isFinite(p.si(figure)))) {
            TextTitle note = new TextTitle("grey cells: no value (the point failed, or the run has no such figure)",
                    style.font(10f, false));
            note.setPaint(style.mutedText());
            note.setPosition(RectangleEdge.BOTTOM);
            chart.addSubtitle(note);
        }
        return chart;
    }

    /**
     * @param result a sweep over one key
     * @param figure the figure
     * @param style the look
     * @return the line chart
     */
    public static JFreeChart line(SweepResult result, SummaryFigure figure, ChartStyle style) {
        SweepAxis ax = result.axes().get(0);
        // a log-spaced axis drawn one step per value is a log scale, labelled with the values themselves
        boolean toScale = ax.numeric() && !ax.logarithmic();
        XYSeries series = new XYSeries(figure.description());
        for (SweepPoint p : result.points()) {
            int k = p.point().indices()[0];
            double x = toScale ? ax.values().get(k).number() : k;
            double y = figure.toDisplay(p.si(figure));
            series.add(x, Double.isFinite(y) ? Double.valueOf(y) : null);
        }
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, true);
        renderer.setSeriesShape(0, new Ellipse2D.Double(-3.5, -3.5, 7, 7));
        NumberAxis range = new NumberAxis(figure.label());
        range.setAutoRangeIncludesZero(false);
        ValueAxis domain = axis(ax, toScale, false);
        XYPlot plot = new XYPlot(new XYSeriesCollection(series), domain, range, renderer);
        plot.setAxisOffset(new RectangleInsets(2, 2, 2, 2));
        JFreeChart chart = new JFreeChart(figure.description() + " over " + ax.key(), JFreeChart.DEFAULT_TITLE_FONT,
                plot, false);
        style.apply(chart);
        renderer.setSeriesPaint(0, style.series(0));
        renderer.setSeriesStroke(0, new BasicStroke(1.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        return chart;
    }

    /** @return true when the axis is numeric, linear and its values are evenly spaced (drawn to scale) */
    static boolean evenlySpaced(SweepAxis a) {
        if (!a.numeric() || a.logarithmic()) {
            return false;
        }
        if (a.size() < 2) {
            return true;
        }
        double step = step(a);
        double largest = a.values().stream().mapToDouble(v -> Math.abs(v.number())).max().orElse(0);
        for (int k = 1; k < a.size(); k++) {
            double d = a.values().get(k).number() - a.values().get(k - 1).number();
            // values are written with six significant digits: each may be off by half a unit in the sixth
            if (Math.abs(d - step) > 1e-5 * largest + 1e-12 * Math.abs(step)) {
                return false;
            }
        }
        return true;
    }

    private static double step(SweepAxis a) {
        return a.size() < 2 ? 1 : (a.values().get(a.size() - 1).number() - a.values().get(0).number()) / (a.size() - 1);
    }

    private static NumberAxis axis(SweepAxis a, boolean toScale, boolean cells) {
        NumberAxis axis = new NumberAxis(a.label());
        axis.setAutoRangeIncludesZero(false);
        if (toScale) {
            if (cells && a.size() > 1) {
                double half = Math.abs(step(a)) / 2;
                double lo = Math.min(a.values().get(0).number(), a.values().get(a.size() - 1).number());
                double hi = Math.max(a.values().get(0).number(), a.values().get(a.size() - 1).number());
                axis.setRange(lo - half, hi + half);
            }
            return axis;
        }
        axis.setRange(-0.5, a.size() - 0.5);
        axis.setTickUnit(new NumberTickUnit(Math.max(1, Math.ceil(a.size() / 10.0)), new ValueLabels(a.values()
                .stream().map(v -> v.numeric() ? trimUnit(v.text()) : v.text()).toList())));
        return axis;
    }

    private static String trimUnit(String text) {
        int space = text.indexOf(' ');
        return space < 0 ? text : text.substring(0, space);
    }

    /** Tick labels for an axis drawn one cell per value: the value written at each whole index. */
    static final class ValueLabels extends NumberFormat {
        private static final long serialVersionUID = 1L;
        private final List<String> labels;

        ValueLabels(List<String> labels) {
            this.labels = List.copyOf(labels);
        }

        @Override
        public StringBuffer format(double number, StringBuffer to, FieldPosition pos) {
            long k = Math.round(number);
            if (Math.abs(number - k) < 1e-9 && k >= 0 && k < labels.size()) {
                to.append(labels.get((int) k));
            }
            return to;
        }

        @Override
        public StringBuffer format(long number, StringBuffer to, FieldPosition pos) {
            return format((double) number, to, pos);
        }

        @Override
        public Number parse(String source, ParsePosition pos) {
            return null;
        }
    }
}
