package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;

import org.cellwright.sim.RunEvent;
import org.cellwright.sim.RunResult;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.Marker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

class RunChartsTest {

    private static RunResult limited;
    private static RunResult reference;

    @BeforeAll
    static void runs() {
        limited = ChartFixtures.runWithVoltageLimit(2.0, 2.45, 3 * 3600);
        reference = ChartFixtures.run(1.5, 3 * 3600);
    }

    @Test
    void everyAxisNamesItsUnit() {
        RunCharts c = RunCharts.of(limited, ChartStyle.light());
        Map<JFreeChart, List<String>> expected = Map.of(
                c.concentrations(), List.of("concentration (mol/L)"),
                c.voltage(), List.of("voltage (V)"),
                c.current(), List.of("current (A)", "current efficiency (%)"),
                c.deposit(), List.of("deposit (g)"),
                c.temperature(), List.of("temperature (\u00b0C)"),
                c.dendrite(), List.of("tip height (mm)"));
        assertEquals(6, c.all().size());
        for (JFreeChart chart : c.all()) {
            XYPlot p = chart.getXYPlot();
            assertEquals("time (min)", p.getDomainAxis().getLabel());
            List<String> labels = new ArrayList<>();
            for (int i = 0; i < p.getRangeAxisCount(); i++) {
                labels.add(p.getRangeAxis(i).getLabel());
            }
            assertEquals(expected.get(chart), labels, chart.getTitle().getText());
            // the time axis spans the run: 3 h = 180 min
            assertEquals(180.0, p.getDomainAxis().getUpperBound(), 1e-9);
        }
    }

    @Test
    void dendriteChartShowsTheGap() {
        RunCharts c = RunCharts.of(limited, ChartStyle.light());
        XYPlot p = c.dendrite().getXYPlot();
        Collection<?> markers = p.getRangeMarkers(Layer.FOREGROUND);
        assertEquals(1, markers.size());
        ValueMarker gap = (ValueMarker) markers.iterator().next();
        // source: fixture gap 0.03 m = 30 mm
        assertEquals(30.0, gap.getValue(), 1e-9);
        assertTrue(gap.getLabel().contains("30"), gap.getLabel());
        assertTrue(p.getRangeAxis().getUpperBound() > 30.0, "the gap line must be inside the axis");
    }

    @Test
    void dendriteAxisGrowsPastTheGapWhenATipOutgrowsIt() {
        RunChartModel m = RunChartModel.emptyFor(limited);
        RunCharts c = RunCharts.live(m, 0.03, 3 * 3600, ChartStyle.light());
        // 12 % above the gap while the tips are short
        assertEquals(30.0 * 1.12, c.dendrite().getXYPlot().getRangeAxis().getUpperBound(), 1e-9);
        org.cellwright.sim.TracePoint first = limited.trace().get(0);
        org.cellwright.sim.InstantState s = first.state();
        org.cellwright.sim.InstantState tall = new org.cellwright.sim.InstantState(600, s.currentA(),
                s.cellVoltageV(), s.cathodePotentialV(), s.anodePotentialV(), s.equilibriumVoltageV(),
                s.anodeOverpotentialV(), s.cathodeOverpotentialV(), s.ohmicSolutionV(), s.ohmicBubblesV(),
                s.ohmicContactsV(), s.cathodeCurrentsA(), s.anodeCurrentsA(), s.concentrationsMolPerM3(),
                s.temperatureK(), s.conductivitySPerM(), s.voidFraction(), s.targetEfficiency(),
                s.targetLimitRatio(), s.supplyLimited(), 0.040);
        m.append(List.of(first, new org.cellwright.sim.TracePoint(tall, first.depositKg(), 1200, 2400, 1.0)));
        // a 40 mm tip (a synthetic point past a 30 mm gap) stays in view
        assertEquals(40.0 * 1.12, c.dendrite().getXYPlot().getRangeAxis().getUpperBound(), 1e-9);
    }

    @Test
    void eventsBecomeVerticalLines() {
        RunCharts c = RunCharts.of(limited, ChartStyle.light());
        List<RunEvent> lined = limited.events().stream().filter(e -> e.kind() != RunEvent.Kind.END).toList();
        assertTrue(lined.stream().anyMatch(e -> e.kind() == RunEvent.Kind.VOLTAGE_LIMIT_ENTERED));
        for (JFreeChart chart : c.all()) {
            Collection<?> m = chart.getXYPlot().getDomainMarkers(Layer.BACKGROUND);
            assertEquals(lined.size(), m.size(), chart.getTitle().getText());
        }
        List<?> first = new ArrayList<>(c.concentrations().getXYPlot().getDomainMarkers(Layer.BACKGROUND));
        RunEvent e0 = lined.get(0);
        ValueMarker m0 = (ValueMarker) first.get(0);
        assertEquals(e0.timeS() / 60, m0.getValue(), 1e-9);
        assertEquals(EventMarkers.shortLabel(e0.kind()), m0.getLabel());
        // labels print on the first chart only; the others carry the bare lines
        for (Object o : c.voltage().getXYPlot().getDomainMarkers(Layer.BACKGROUND)) {
            assertNull(((Marker) o).getLabel());
        }
        int before = first.size();
        c.addEvent(new RunEvent(170 * 60, RunEvent.Kind.SCHEDULE_STEP, "a step"));
        assertEquals(before + 1, c.concentrations().getXYPlot().getDomainMarkers(Layer.BACKGROUND).size());
    }

    @Test
    void labelsNearTheRightEndStandLeftOfTheirLine() {
        RunCharts c = RunCharts.of(limited, ChartStyle.light());
        double span = c.spanS();
        c.setEvents(List.of(new RunEvent(0.2 * span, RunEvent.Kind.SCHEDULE_STEP, "a step"),
                new RunEvent(0.95 * span, RunEvent.Kind.SCHEDULE_STEP, "another step")));
        List<?> markers = new ArrayList<>(c.concentrations().getXYPlot().getDomainMarkers(Layer.BACKGROUND));
        assertEquals(org.jfree.chart.ui.TextAnchor.TOP_LEFT, ((ValueMarker) markers.get(0)).getLabelTextAnchor());
        // within the last 15 % of the axis the label would be cut off by the plot's edge on the right
        assertEquals(org.jfree.chart.ui.TextAnchor.TOP_RIGHT, ((ValueMarker) markers.get(1)).getLabelTextAnchor());
        assertEquals("step", ((ValueMarker) markers.get(1)).getLabel());
        // the second label stands one line lower than the first
        assertEquals(EventMarkers.LABEL_LINE_PX, ((ValueMarker) markers.get(1)).getLabelOffset().getTop()
                - ((ValueMarker) markers.get(0)).getLabelOffset().getTop(), 1e-9);
    }

    @Test
    void referenceRunIsOverlaidOutsideTheLegend() {
        RunCharts c = RunCharts.of(limited, ChartStyle.light());
        int legendBefore = c.concentrations().getXYPlot().getLegendItems().getItemCount();
        c.setReference(reference, "1.5 A");
        for (JFreeChart chart : c.all()) {
            assertNotNull(chart.getXYPlot().getDataset(RunPlots.REFERENCE), chart.getTitle().getText());
            assertEquals(2, chart.getSubtitleCount(), "legend and the reference note");
        }
        assertNotNull(c.current().getXYPlot().getDataset(RunPlots.REFERENCE_EFFICIENCY));
        assertEquals(legendBefore, c.concentrations().getXYPlot().getLegendItems().getItemCount());
        XYPlot p = c.concentrations().getXYPlot();
        Color live = (Color) p.getRenderer(RunPlots.LIVE).getSeriesPaint(0);
        String species0 = limited.speciesNames().get(0);
        int refIndex = reference.speciesNames().indexOf(species0);
        Color ref = (Color) p.getRenderer(RunPlots.REFERENCE).getSeriesPaint(refIndex);
        assertEquals(ChartStyle.light().reference(live), ref, "same species, same hue, faded");
        c.setReference(null, null);
        for (JFreeChart chart : c.all()) {
            assertNull(chart.getXYPlot().getDataset(RunPlots.REFERENCE));
            assertEquals(1, chart.getSubtitleCount());
        }
    }

    @Test
    void seriesColoursSurviveTheTheme() {
        RunCharts c = RunCharts.of(limited, ChartStyle.light());
        c.setStyle(ChartStyle.dark());
        ChartStyle dark = ChartStyle.dark();
        for (JFreeChart chart : c.all()) {
            XYPlot p = chart.getXYPlot();
            assertEquals(dark.plotBackground(), p.getBackgroundPaint());
            assertNotEquals(Color.LIGHT_GRAY, p.getBackgroundPaint());
            assertEquals(dark.paper(), chart.getBackgroundPaint());
            assertNotNull(p.getRenderer(RunPlots.LIVE).getSeriesPaint(0), "set after the theme (pitfall P9)");
        }
        assertEquals(dark.series(0), c.concentrations().getXYPlot().getRenderer(RunPlots.LIVE).getSeriesPaint(0));
        assertEquals(dark.text(), c.voltage().getXYPlot().getRenderer(RunPlots.LIVE).getSeriesPaint(0));
        assertEquals(dark.fill(1), c.voltage().getXYPlot().getRenderer(RunPlots.BANDS).getSeriesFillPaint(1));
    }

    @Test
    void liveChartsKeepTheirAxisWhilePointsArrive() {
        RunChartModel m = RunChartModel.emptyFor(limited);
        RunCharts c = RunCharts.live(m, limited.scenario().cell().gapM(), limited.scenario().run().durationS(),
                ChartStyle.light());
        List<org.cellwright.sim.TracePoint> t = limited.trace();
        for (int i = 0; i < t.size(); i += 25) {
            m.append(t.subList(i, Math.min(t.size(), i + 25)));
            assertEquals(180.0, c.current().getXYPlot().getDomainAxis().getUpperBound(), 1e-9);
        }
        assertEquals(t.size(), m.pointCount());
        double maxVolt = limited.trace().stream().mapToDouble(p -> p.state().cellVoltageV()).max().orElseThrow();
        assertTrue(c.voltage().getXYPlot().getRangeAxis().getUpperBound() >= maxVolt,
                "the voltage axis follows the appended points");
    }
}
