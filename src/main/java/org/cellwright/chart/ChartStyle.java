package org.cellwright.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Stroke;
import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.StandardChartTheme;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.DefaultDrawingSupplier;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleInsets;

/**
 * Cellwright's own look for charts, light and dark.
 *
 * <p>The line palette keeps the eight hues of the Okabe-Ito set, which stays distinguishable for the common
 * forms of colour-blindness (source: M. Okabe and K. Ito, "Color Universal Design", 2008), but with our own
 * shades: on the light background every hue is darkened until thin lines stand out from white (the yellow
 * becomes an olive, the orange an amber), on the dark background every hue is lightened. Beyond eight
 * series the hues repeat with dashed, then dotted, strokes, so colour is never the only cue. Filled areas
 * (the voltage breakdown) use the same hues blended into the plot background. A pinned reference run uses
 * the hue of its series, faded halfway into the background, with a dashed stroke.
 *
 * <p>{@link #apply(JFreeChart)} applies a {@link StandardChartTheme} built from these colours; it clears the
 * series paints of the renderers, so callers set series paints after it (see {@link RunCharts}).
 */
public final class ChartStyle {

    private static final String FONT = Font.SANS_SERIF;

    /** Okabe-Ito hues darkened for white: blue, vermillion, bluish green, reddish purple, orange, sky blue, yellow, black. */
    private static final List<Color> LIGHT_LINES = List.of(
            new Color(0x0B6FAE), new Color(0xCF5A0C), new Color(0x00926A), new Color(0xB24F88),
            new Color(0xB67A00), new Color(0x2E8DC6), new Color(0x857B00), new Color(0x4F5761));
    /** The same hues lightened for a dark background. */
    private static final List<Color> DARK_LINES = List.of(
            new Color(0x5AAEE6), new Color(0xF08A4B), new Color(0x35C99C), new Color(0xE394C2),
            new Color(0xF2BC4C), new Color(0x92D2F4), new Color(0xE8DC5A), new Color(0xBAC1CA));

    private final String name;
    private final boolean dark;
    private final Color paper;
    private final Color plot;
    private final Color grid;
    private final Color outline;
    private final Color text;
    private final Color mutedText;
    private final List<Color> lines;

    private ChartStyle(String name, boolean dark, Color paper, Color plot, Color grid, Color outline, Color text,
                       Color mutedText, List<Color> lines) {
        this.name = name;
        this.dark = dark;
        this.paper = paper;
        this.plot = plot;
        this.grid = grid;
        this.outline = outline;
        this.text = text;
        this.mutedText = mutedText;
        this.lines = lines;
    }

    /** @return the light style: white plots on a faintly grey sheet, dark grey text */
    public static ChartStyle light() {
        return new ChartStyle("cellwright-light", false, new Color(0xF6F7F9), Color.WHITE, new Color(0xDDE1E6),
                new Color(0xB9C0C8), new Color(0x1F242B), new Color(0x59616C), LIGHT_LINES);
    }

    /** @return the dark style: slate plots on a near-black sheet, light grey text */
    public static ChartStyle dark() {
        return new ChartStyle("cellwright-dark", true, new Color(0x181B20), new Color(0x22262C), new Color(0x373D46),
                new Color(0x4C535E), new Color(0xE6E8EB), new Color(0xA5ACB7), DARK_LINES);
    }

    /**
     * @param darkLook true for the dark style
     * @return {@link #dark()} or {@link #light()}
     */
    public static ChartStyle of(boolean darkLook) {
        return darkLook ? dark() : light();
    }

    /** @return true for the dark style */
    public boolean isDark() {
        return dark;
    }

    /** @return the background around the plots */
    public Color paper() {
        return paper;
    }

    /** @return the plot background */
    public Color plotBackground() {
        return plot;
    }

    /** @return the colour of grid lines */
    public Color grid() {
        return grid;
    }

    /** @return the colour of titles, labels and the cell-voltage line */
    public Color text() {
        return text;
    }

    /** @return the colour of secondary text (subtitles, event labels) */
    public Color mutedText() {
        return mutedText;
    }

    /**
     * @param index series index, from 0
     * @return the line colour of that series (the eight hues repeat)
     */
    public Color series(int index) {
        return lines.get(Math.floorMod(index, lines.size()));
    }

    /**
     * @param index series index, from 0
     * @return solid for the first eight series, dashed for the next eight, dotted beyond
     */
    public Stroke seriesStroke(int index) {
        int round = index / lines.size();
        if (round == 0) {
            return new BasicStroke(1.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        }
        float[] dash = round == 1 ? new float[] {7f, 4f} : new float[] {2f, 3f};
        return new BasicStroke(1.8f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    /**
     * @param hue one of the palette's hue indices (0 blue, 1 vermillion, 2 green, 3 purple, 4 amber, 5 sky, 6 olive)
     * @return that hue as a fill, blended into the plot background so that lines on top stay readable
     */
    public Color fill(int hue) {
        return blend(series(hue), plot, 0.50);
    }

    /**
     * @param seriesColour the colour of the live series
     * @return the colour of the same series of a pinned reference run (faded toward the background)
     */
    public Color reference(Color seriesColour) {
        return blend(seriesColour, plot, 0.55);
    }

    /** @return the stroke of reference-run series (dashed) */
    public Stroke referenceStroke() {
        return new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[] {6f, 4f}, 0f);
    }

    /** @return the colour of the gap line and other limits (the vermillion hue) */
    public Color limit() {
        return series(1);
    }

    /** @return the colour of event lines (secondary text, partly transparent) */
    public Color event() {
        return new Color(mutedText.getRed(), mutedText.getGreen(), mutedText.getBlue(), 150);
    }

    /**
     * @param size point size
     * @param bold true for bold
     * @return the style's sans-serif font
     */
    public Font font(float size, boolean bold) {
        return new Font(FONT, bold ? Font.BOLD : Font.PLAIN, 1).deriveFont(size);
    }

    /** @return a JFreeChart theme carrying this style's colours and fonts */
    public StandardChartTheme theme() {
        StandardChartTheme t = new StandardChartTheme(name, false);
        t.setExtraLargeFont(font(14f, true));
        t.setLargeFont(font(12f, false));
        t.setRegularFont(font(11f, false));
        t.setSmallFont(font(10f, false));
        t.setTitlePaint(text);
        t.setSubtitlePaint(mutedText);
        t.setChartBackgroundPaint(paper);
        t.setLegendBackgroundPaint(paper);
        t.setLegendItemPaint(text);
        t.setPlotBackgroundPaint(plot);
        t.setPlotOutlinePaint(outline);
        t.setDomainGridlinePaint(grid);
        t.setRangeGridlinePaint(grid);
        t.setBaselinePaint(outline);
        t.setCrosshairPaint(mutedText);
        t.setAxisLabelPaint(text);
        t.setTickLabelPaint(mutedText);
        t.setItemLabelPaint(text);
        t.setAxisOffset(new RectangleInsets(2, 2, 2, 2));
        t.setShadowVisible(false);
        t.setXYBarPainter(new StandardXYBarPainter());
        t.setDrawingSupplier(new DefaultDrawingSupplier(lines.toArray(new Color[0]),
                DefaultDrawingSupplier.DEFAULT_FILL_PAINT_SEQUENCE, DefaultDrawingSupplier.DEFAULT_OUTLINE_PAINT_SEQUENCE,
                DefaultDrawingSupplier.DEFAULT_STROKE_SEQUENCE, DefaultDrawingSupplier.DEFAULT_OUTLINE_STROKE_SEQUENCE,
                DefaultDrawingSupplier.DEFAULT_SHAPE_SEQUENCE));
        return t;
    }

    /**
     * Applies the theme to a chart and finishes what the theme leaves out (legend frame, grid strokes, axis
     * lines). Series paints must be set again afterwards.
     *
     * @param chart the chart
     */
    public void apply(JFreeChart chart) {
        theme().apply(chart);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        chart.setBorderVisible(false);
        chart.setPadding(new RectangleInsets(4, 4, 4, 8));
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            if (chart.getSubtitle(i) instanceof LegendTitle legend) {
                legend.setFrame(BlockBorder.NONE);
                legend.setItemFont(font(10f, false));
            }
        }
        Plot p = chart.getPlot();
        if (p instanceof XYPlot xy) {
            Stroke thin = new BasicStroke(0.7f);
            xy.setDomainGridlineStroke(thin);
            xy.setRangeGridlineStroke(thin);
            xy.setOutlineStroke(new BasicStroke(0.8f));
            for (int i = 0; i < xy.getRangeAxisCount(); i++) {
                if (xy.getRangeAxis(i) != null) {
                    xy.getRangeAxis(i).setAxisLinePaint(outline);
                    xy.getRangeAxis(i).setTickMarkPaint(outline);
                    // Taller label boxes make the automatic tick choice keep about 30 px between ticks
                    // instead of 16 (only the side insets move the labels on a vertical axis).
                    xy.getRangeAxis(i).setTickLabelInsets(new RectangleInsets(9, 4, 9, 4));
                }
            }
            if (xy.getDomainAxis() != null) {
                xy.getDomainAxis().setAxisLinePaint(outline);
                xy.getDomainAxis().setTickMarkPaint(outline);
            }
        }
    }

    static Color blend(Color c, Color toward, double amount) {
        double k = 1 - amount;
        return new Color((int) Math.round(c.getRed() * k + toward.getRed() * amount),
                (int) Math.round(c.getGreen() * k + toward.getGreen() * amount),
                (int) Math.round(c.getBlue() * k + toward.getBlue() * amount));
    }
}
