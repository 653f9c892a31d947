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
 * <p>The line palette has eight hues of our own (blue, vermillion, green, pink, olive, sky, plum, graphite),
 * chosen so that every pair stays apart for readers with normal vision and for the two common red-green
 * colour-vision deficiencies (deuteranopia, protanopia, simulated after G. M. Machado, M. M. Oliveira and
 * L. A. F. Fernandes, IEEE TVCG 15(6), 2009): CIEDE2000 difference at least 7 between any two hues in both
 * looks ({@code ChartPaletteTest}); each keeps a contrast of at least 3:1 against its plot background (WCAG
 * 2.1, success criterion 1.4.11, non-text contrast). The dark look uses lighter shades of the same hues.
 * Beyond eight series the hues repeat with dash-dot, then sparser dash-dot, strokes, so colour is never the
 * only cue. Species and metals get their hue by name ({@link SeriesHues}). Filled areas (the voltage
 * breakdown) use the same hues blended into the plot background. A pinned reference run uses the hue of its
 * series, faded halfway into the background, with a dashed stroke; the anolyte of a divided cell a dotted one.
 *
 * <p>{@link #apply(JFreeChart)} applies a {@link StandardChartTheme} built from these colours; it clears the
 * series paints of the renderers, so callers set series paints after it (see {@link RunCharts}).
 */
public final class ChartStyle {

    private static final String FONT = Font.SANS_SERIF;

    /** The eight hues on white: blue, vermillion, green, pink, olive, sky, plum, graphite. */
    private static final List<Color> LIGHT_LINES = List.of(
            new Color(0x2A55CC), new Color(0xB8401A), new Color(0x0B9371), new Color(0xC25F99),
            new Color(0x8F8A1E), new Color(0x0C8DE7), new Color(0x733671), new Color(0x5C6066));
    /** The same hues lightened for the dark plot background. */
    private static final List<Color> DARK_LINES = List.of(
            new Color(0x8C9BFF), new Color(0xFF8A5C), new Color(0x4FD1A5), new Color(0xFFA3D2),
            new Color(0xD9D064), new Color(0x7FD4FF), new Color(0xA070C0), new Color(0x8C929A));

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

    /** @return how many hues the palette has before they repeat with other strokes */
    public int hueCount() {
        return lines.size();
    }

    /**
     * @param index series index, from 0
     * @return solid for the first eight series, dash-dot for the next eight, a sparser dash-dot beyond (never
     *     plain dashes or dots: those mark a pinned run and an anolyte)
     */
    public Stroke seriesStroke(int index) {
        int round = index / lines.size();
        if (round == 0) {
            return new BasicStroke(1.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        }
        float[] dash = round == 1 ? new float[] {9f, 3f, 2f, 3f} : new float[] {14f, 3f, 2f, 3f, 2f, 3f};
        return new BasicStroke(1.8f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    /** @return the stroke of the anolyte's series of a divided cell (dotted) */
    public Stroke anolyteStroke() {
        return new BasicStroke(2.0f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 10f, new float[] {0.5f, 4f}, 0f);
    }

    /**
     * @param hue one of the palette's hue indices (0 blue, 1 vermillion, 2 green, 3 pink, 4 olive, 5 sky, 6 plum, 7 graphite)
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

    /**
     * @param index series slot, from 0
     * @return dashed for the first eight slots; beyond them (a hue repeated) long dashes with a dot between
     */
    public Stroke referenceStroke(int index) {
        if (index < lines.size()) {
            return referenceStroke();
        }
        return new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                new float[] {10f, 3f, 1.5f, 3f}, 0f);
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
