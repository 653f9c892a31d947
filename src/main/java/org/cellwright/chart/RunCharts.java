package org.cellwright.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.cellwright.sim.RunEvent;
import org.cellwright.sim.RunResult;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.HorizontalAlignment;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The six charts of a run, on one {@link RunChartModel}: bath composition, cell voltage with its breakdown,
 * current with current efficiency, deposit per metal, bath temperature, and dendrite tip height against the
 * gap. Optionally a pinned reference run drawn dashed and faded, and vertical lines at the run's events.
 *
 * <p>For a live window: build the model empty ({@link RunChartModel#emptyFor} or its constructor), wrap it
 * here with {@link #live}, put {@link #all()} into chart panels and append batches to the model on the event
 * thread. For a finished run: {@link #of(RunResult, ChartStyle)}. Every method must run on the Swing event
 * thread once the charts are shown.
 */
public final class RunCharts {

    /** Palette hue of each voltage part: graphite, vermillion, blue, green, olive, plum. */
    private static final int[] BAND_HUES = {7, 1, 0, 2, 4, 6};

    private final RunChartModel model;
    private double gapMm;
    private final JFreeChart concentrations;
    private final JFreeChart voltage;
    private final JFreeChart current;
    private final JFreeChart deposit;
    private final JFreeChart temperature;
    private final JFreeChart dendrite;
    private ChartStyle style;
    private double spanS;
    private RunChartModel reference;
    private String referenceLabel;
    private List<RunEvent> events = List.of();

    /**
     * @param model the plotted data (may still be empty)
     * @param gapM the anode-cathode gap (m), drawn as a line on the dendrite chart
     * @param spanS the time span of every time axis (s)
     * @param style the look
     */
    public RunCharts(RunChartModel model, double gapM, double spanS, ChartStyle style) {
        this.model = model;
        this.gapMm = gapM * 1000;
        this.spanS = spanS;
        this.style = style;
        concentrations = RunPlots.concentrations(model);
        voltage = RunPlots.voltage(model);
        current = RunPlots.current(model);
        deposit = RunPlots.deposit(model);
        temperature = RunPlots.temperature(model);
        dendrite = RunPlots.dendrite(model);
        model.dendrite().addChangeListener(e -> fitDendriteAxis());
        restyle();
    }

    /**
     * @param result a finished run
     * @param style the look
     * @return its charts, with its events marked, over its duration
     */
    public static RunCharts of(RunResult result, ChartStyle style) {
        RunCharts c = new RunCharts(RunChartModel.of(result), result.scenario().cell().gapM(),
                result.summary().durationS(), style);
        c.setEvents(result.events());
        return c;
    }

    /**
     * @param model an empty model that a running or replaying run will fill, made with
     *     {@code TimeScale.forSpan(plannedDurationS)} (as {@link RunChartModel#emptyFor} does)
     * @param gapM the anode-cathode gap (m)
     * @param plannedDurationS the scenario's duration (s), so that the axes do not move while points arrive
     * @param style the look
     * @return charts over the planned duration
     */
    public static RunCharts live(RunChartModel model, double gapM, double plannedDurationS, ChartStyle style) {
        return new RunCharts(model, gapM, plannedDurationS, style);
    }

    /** @return the six charts, in sheet order: composition, voltage, current, deposit, temperature, dendrite */
    public List<JFreeChart> all() {
        return List.of(concentrations, voltage, current, deposit, temperature, dendrite);
    }

    /** @return the model the charts show */
    public RunChartModel model() {
        return model;
    }

    /** @return the style in use */
    public ChartStyle style() {
        return style;
    }

    /** @return the time span of the axes (s) */
    public double spanS() {
        return spanS;
    }

    /** @return the bath composition chart */
    public JFreeChart concentrations() {
        return concentrations;
    }

    /** @return the cell voltage chart with its stacked breakdown */
    public JFreeChart voltage() {
        return voltage;
    }

    /** @return the current and current efficiency chart */
    public JFreeChart current() {
        return current;
    }

    /** @return the deposit chart */
    public JFreeChart deposit() {
        return deposit;
    }

    /** @return the temperature chart */
    public JFreeChart temperature() {
        return temperature;
    }

    /** @return the dendrite chart */
    public JFreeChart dendrite() {
        return dendrite;
    }

    /**
     * Switches light/dark: applies the style's theme to every chart, then sets the series colours again.
     *
     * @param newStyle the look
     */
    public void setStyle(ChartStyle newStyle) {
        this.style = newStyle;
        restyle();
    }

    /**
     * Moves the gap line of the dendrite chart (when a run with another gap is shown on the same charts).
     *
     * @param gapM the anode-cathode gap (m), > 0
     */
    public void setGap(double gapM) {
        if (!(gapM > 0)) {
            throw new IllegalArgumentException("gap must be > 0 m, got " + gapM);
        }
        this.gapMm = gapM * 1000;
        placeMarkers();
        fitDendriteAxis();
    }

    /** @return the gap drawn on the dendrite chart (m) */
    public double gapM() {
        return gapMm / 1000;
    }

    /**
     * Sets the time span of every time axis.
     *
     * @param seconds the span (s), > 0
     */
    public void setTimeSpan(double seconds) {
        if (!(seconds > 0)) {
            throw new IllegalArgumentException("time span must be > 0 s, got " + seconds);
        }
        this.spanS = seconds;
        restyle();
    }

    /**
     * Pins a reference run (drawn dashed and faded under the live run), or removes it.
     *
     * @param ref the reference run, or null to remove it
     * @param label a few words naming it (shown above each chart)
     */
    public void setReference(RunResult ref, String label) {
        if (ref == null) {
            reference = null;
            referenceLabel = null;
        } else {
            reference = RunChartModel.of(ref, model.timeScale());
            referenceLabel = label;
            spanS = Math.max(spanS, ref.summary().durationS());
        }
        for (JFreeChart c : all()) {
            c.getXYPlot().setDataset(RunPlots.REFERENCE, reference == null ? null : refData(c));
        }
        current.getXYPlot().setDataset(RunPlots.REFERENCE_EFFICIENCY,
                reference == null ? null : reference.efficiency());
        restyle();
    }

    private XYSeriesCollection refData(JFreeChart c) {
        if (c == concentrations) {
            return reference.concentrations();
        } else if (c == voltage) {
            return reference.cellVoltage();
        } else if (c == current) {
            return reference.current();
        } else if (c == deposit) {
            return reference.deposit();
        } else if (c == temperature) {
            return reference.temperature();
        }
        return reference.dendrite();
    }

    /**
     * Replaces the event lines.
     *
     * @param runEvents the events in time order
     */
    public void setEvents(List<RunEvent> runEvents) {
        this.events = List.copyOf(runEvents);
        placeMarkers();
    }

    /**
     * Adds one event line (while a run plays).
     *
     * @param e the event, later than those already shown
     */
    public void addEvent(RunEvent e) {
        List<RunEvent> more = new ArrayList<>(events);
        more.add(e);
        setEvents(more);
    }

    private void restyle() {
        for (JFreeChart c : all()) {
            style.apply(c);
            XYPlot plot = c.getXYPlot();
            plot.getDomainAxis().setRange(0, model.timeScale().fromSeconds(spanS));
            // the y auto-range covers only the points inside the x range, so it must follow a new x range
            plot.configureRangeAxes();
            while (c.getSubtitleCount() > 1) {
                c.removeSubtitle(c.getSubtitle(1));
            }
            if (referenceLabel != null) {
                TextTitle t = new TextTitle("dashed: " + referenceLabel, style.font(10f, false));
                t.setPaint(style.mutedText());
                t.setHorizontalAlignment(HorizontalAlignment.CENTER);
                t.setPadding(new RectangleInsets(0, 0, 2, 0));
                c.addSubtitle(t);
            }
        }
        NamedSeriesPaint.paint(concentrations.getXYPlot(), style, model.speciesNames(),
                reference == null ? List.of() : reference.speciesNames(), model.anolyteSpecies());
        NamedSeriesPaint.paint(deposit.getXYPlot(), style, model.metalSymbols(),
                reference == null ? List.of() : reference.metalSymbols(), List.of());
        paintVoltage();
        XYPlot cp = current.getXYPlot();
        paintLine(cp, RunPlots.LIVE, 0, style.series(0));
        paintLine(cp, RunPlots.EFFICIENCY, 0, style.series(4));
        paintLine(cp, RunPlots.EFFICIENCY, 1, style.series(2));
        paintLine(cp, RunPlots.EFFICIENCY, 2, style.series(5));
        cp.getRenderer(RunPlots.EFFICIENCY).setSeriesStroke(2, style.seriesStroke(9), false);
        cp.getRangeAxis(1).setLabelPaint(style.text());
        paintLine(temperature.getXYPlot(), RunPlots.LIVE, 0, style.series(1));
        paintLine(dendrite.getXYPlot(), RunPlots.LIVE, 0, style.series(3));
        placeMarkers();
        fitDendriteAxis();
    }

    private Map<String, Integer> slotsOf(List<String> names, List<String> refNames) {
        return SeriesHues.assign(names, refNames);
    }

    /**
     * @param species a species of the composition chart
     * @return the colour of its line (the same for the live run, the reference, the anolyte and the bands)
     */
    public Color speciesColour(String species) {
        List<String> pinned = new ArrayList<>(reference == null ? List.of() : reference.speciesNames());
        pinned.add(species);
        return style.series(slotsOf(model.speciesNames(), pinned).get(species));
    }

    /**
     * @param metal a metal of the deposit chart
     * @return the colour of its line
     */
    public Color metalColour(String metal) {
        List<String> pinned = new ArrayList<>(reference == null ? List.of() : reference.metalSymbols());
        pinned.add(metal);
        return style.series(slotsOf(model.metalSymbols(), pinned).get(metal));
    }

    /** Sets a live series' colour and, when a reference is pinned, the matching reference series. */
    private void paintLine(XYPlot plot, int dataset, int series, Color c) {
        XYItemRenderer r = plot.getRenderer(dataset);
        r.setSeriesPaint(series, c, false);
        r.setSeriesStroke(series, style.seriesStroke(0), false);
        boolean efficiency = plot == current.getXYPlot() && dataset == RunPlots.EFFICIENCY;
        XYItemRenderer ref = plot.getRenderer(efficiency ? RunPlots.REFERENCE_EFFICIENCY : RunPlots.REFERENCE);
        if (ref != null) {
            ref.setSeriesPaint(series, style.reference(c), false);
            ref.setSeriesStroke(series, style.referenceStroke(), false);
        }
    }

    private void paintVoltage() {
        XYPlot p = voltage.getXYPlot();
        XYItemRenderer bands = p.getRenderer(RunPlots.BANDS);
        LegendItemCollection legend = new LegendItemCollection();
        Rectangle2D swatch = new Rectangle2D.Double(-5, -5, 10, 10);
        for (int k = 0; k < RunChartModel.VOLTAGE_PARTS.size(); k++) {
            Color fill = style.fill(BAND_HUES[k]);
            bands.setSeriesFillPaint(k, fill, false);
            bands.setSeriesPaint(k, fill, false);
            legend.add(new LegendItem(RunChartModel.VOLTAGE_PARTS.get(k), null, null, null, swatch, fill));
        }
        paintLine(p, RunPlots.LIVE, 0, style.text());
        p.getRenderer(RunPlots.LIVE).setSeriesStroke(0, new BasicStroke(2.2f, BasicStroke.CAP_ROUND,
                BasicStroke.JOIN_ROUND), false);
        legend.add(new LegendItem("cell voltage", null, null, null, new Line2D.Double(-8, 0, 8, 0),
                new BasicStroke(2.2f), style.text()));
        for (int i = 0; i < legend.getItemCount(); i++) {
            legend.get(i).setLabelFont(style.font(10f, false));
            legend.get(i).setLabelPaint(style.text());
        }
        p.setFixedLegendItems(legend);
    }

    private void placeMarkers() {
        boolean first = true;
        for (JFreeChart c : all()) {
            XYPlot p = c.getXYPlot();
            p.clearDomainMarkers();
            for (ValueMarker m : EventMarkers.of(events, model.timeScale(), spanS, style, first)) {
                p.addDomainMarker(m, Layer.BACKGROUND);
            }
            first = false;
        }
        XYPlot d = dendrite.getXYPlot();
        d.clearRangeMarkers();
        ValueMarker gap = new ValueMarker(gapMm, style.limit(), new BasicStroke(1.6f));
        gap.setLabel(String.format(java.util.Locale.ROOT, "gap %.3g mm", gapMm));
        gap.setLabelFont(style.font(10f, true));
        gap.setLabelPaint(style.limit());
        gap.setLabelBackgroundColor(new Color(0, 0, 0, 0));
        gap.setLabelAnchor(RectangleAnchor.TOP_LEFT);
        gap.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
        gap.setLabelOffset(new RectangleInsets(2, 6, 2, 6));
        d.addRangeMarker(gap, Layer.FOREGROUND);
    }

    /** Keeps the gap line in view: the axis runs to 12 % above the higher of the gap and the tallest tip. */
    private void fitDendriteAxis() {
        double top = gapMm;
        top = Math.max(top, maxY(model.dendrite()));
        if (reference != null) {
            top = Math.max(top, maxY(reference.dendrite()));
        }
        double upper = top * 1.12;
        var axis = dendrite.getXYPlot().getRangeAxis();
        if (axis.getLowerBound() != 0 || axis.getUpperBound() != upper) {
            axis.setRange(0, upper);
        }
    }

    private static double maxY(XYSeriesCollection c) {
        double max = 0;
        for (int i = 0; i < c.getSeriesCount(); i++) {
            if (c.getSeries(i).getItemCount() > 0) {
                max = Math.max(max, c.getSeries(i).getMaxY());
            }
        }
        return max;
    }
}
