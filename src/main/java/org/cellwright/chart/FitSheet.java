package org.cellwright.chart;

import java.awt.BasicStroke;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.cellwright.study.ColumnFit;
import org.cellwright.study.LogFitResult;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Drawable;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Measured against fitted: one chart per logged column, the measured values as dots and the fitted model as
 * a line, under a heading with the fitted values. Written to PNG or SVG by {@link #export(Path)}; the window
 * can show {@link #charts()} in chart panels.
 */
public final class FitSheet implements Drawable {

    /** Default width (px). */
    public static final int DEFAULT_WIDTH = 1400;
    private static final int ROW_PX = 420;
    private static final int HEADING_PX = 48;
    private static final int FIGURE_LINE_PX = 20;
    private static final int GUTTER_PX = 8;

    private final List<JFreeChart> charts;
    private final String title;
    private final List<String> figures;
    private final ChartStyle style;

    /**
     * @param result a fit
     * @param title the heading (the scenario and the log)
     * @param style the look
     */
    public FitSheet(LogFitResult result, String title, ChartStyle style) {
        this.style = style;
        this.title = title;
        this.figures = FitText.parameterPhrases(result.outcome());
        TimeScale scale = TimeScale.forSpan(result.log().endS());
        List<JFreeChart> list = new ArrayList<>();
        for (ColumnFit c : result.columns()) {
            list.add(chart(c, scale, style));
        }
        this.charts = List.copyOf(list);
    }

    /** @return one chart per logged column, in log order */
    public List<JFreeChart> charts() {
        return charts;
    }

    /** @return columns of charts on the sheet: one for a single column, else two */
    private int columns() {
        return charts.size() == 1 ? 1 : 2;
    }

    /** @return the sheet's default height (px) for its number of charts */
    public int defaultHeight() {
        int rows = (charts.size() + columns() - 1) / columns();
        return headingPx() + rows * ROW_PX;
    }

    /** @return the heading's height: the title and one line per fitted value */
    private int headingPx() {
        return HEADING_PX + FIGURE_LINE_PX * figures.size();
    }

    private static JFreeChart chart(ColumnFit c, TimeScale scale, ChartStyle style) {
        XYSeries measured = new XYSeries("measured");
        for (int i = 0; i < c.timesS().length; i++) {
            measured.add(scale.fromSeconds(c.timesS()[i]), c.measured()[i], false);
        }
        XYSeries fitted = new XYSeries("fitted");
        for (int i = 0; i < c.curve().timesS().length; i++) {
            fitted.add(scale.fromSeconds(c.curve().timesS()[i]), c.curve().values()[i], false);
        }
        NumberAxis time = new NumberAxis(scale.axisLabel());
        time.setLowerMargin(0);
        time.setUpperMargin(0.02);
        NumberAxis range = new NumberAxis(FitText.columnLabel(c.series()) + " (" + FitText.unitLabel(c.series()) + ")");
        range.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(null, time, range, null);
        plot.setOrientation(PlotOrientation.VERTICAL);
        plot.setAxisOffset(new RectangleInsets(2, 2, 2, 2));
        XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
        dots.setDefaultCreateEntities(false);
        XYLineAndShapeRenderer line = new XYLineAndShapeRenderer(true, false);
        line.setDrawSeriesLineAsPath(true);
        line.setDefaultCreateEntities(false);
        plot.setDataset(0, new XYSeriesCollection(measured));
        plot.setRenderer(0, dots);
        plot.setDataset(1, new XYSeriesCollection(fitted));
        plot.setRenderer(1, line);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        JFreeChart chart = new JFreeChart(FitText.columnLabel(c.series()), JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.BOTTOM);
        style.apply(chart);
        // series paints after the theme, which clears them (pitfall P9)
        dots.setSeriesPaint(0, style.series(0));
        dots.setSeriesShape(0, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
        line.setSeriesPaint(0, style.series(1));
        line.setSeriesStroke(0, new BasicStroke(2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        TextTitle rmse = new TextTitle(String.format(Locale.ROOT, "%d values \u00b7 rmse %s", c.timesS().length,
                FitText.quantity(c.rmse(), c.series())), style.font(11f, false));
        rmse.setPaint(style.mutedText());
        chart.addSubtitle(rmse);
        return chart;
    }

    @Override
    public void draw(Graphics2D g, Rectangle2D area) {
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setPaint(style.paper());
        g.fill(area);
        double x0 = area.getX() + GUTTER_PX;
        double w = area.getWidth() - 2 * GUTTER_PX;
        g.setFont(style.font(19f, true));
        g.setPaint(style.text());
        FontMetrics fm = g.getFontMetrics();
        g.drawString(title, (float) (x0 + 6), (float) (area.getY() + 10 + fm.getAscent()));
        double y = area.getY() + 10 + fm.getHeight() + 4;
        g.setFont(style.font(13f, false));
        g.setPaint(style.mutedText());
        fm = g.getFontMetrics();
        for (String f : figures) {
            g.drawString(f, (float) (x0 + 6), (float) (y + fm.getAscent()));
            y += FIGURE_LINE_PX;
        }
        int cols = columns();
        int rows = (charts.size() + cols - 1) / cols;
        double top = area.getY() + headingPx();
        double cw = w / cols;
        double ch = (area.getMaxY() - top - GUTTER_PX) / rows;
        for (int i = 0; i < charts.size(); i++) {
            Rectangle2D cell = new Rectangle2D.Double(x0 + (i % cols) * cw, top + (i / cols) * ch, cw - GUTTER_PX,
                    ch - GUTTER_PX);
            charts.get(i).draw(g, cell);
        }
    }

    /**
     * Writes the sheet at its default size, PNG or SVG by the file's extension.
     *
     * @param file the target file
     * @throws IOException when it cannot be written
     * @throws IllegalArgumentException when the extension is neither .png nor .svg
     */
    public void export(Path file) throws IOException {
        ChartExport.write(this, DEFAULT_WIDTH, defaultHeight(), file);
    }
}
