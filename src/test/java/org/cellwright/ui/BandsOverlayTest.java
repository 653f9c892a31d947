package org.cellwright.ui;

import static org.cellwright.ui.OnEdt.edt;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;

import javax.swing.AbstractAction;
import javax.swing.JFrame;

import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.chart.SpreadBands;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.study.Percentiles;
import org.cellwright.study.SeriesBands;
import org.cellwright.study.SpreadResult;
import org.cellwright.study.SummaryFigure;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.YIntervalSeriesCollection;
import org.junit.jupiter.api.Test;

/**
 * The uncertainty bands on the window's charts without a screen: the spread study runs off the event thread,
 * the concentration chart's band dataset holds the study's 5 and 95 % percentiles in the chart's units, the
 * ranges under the summary are the figures' percentiles, the bands survive a restyle of the same scenario
 * and are cleared when the charts show another scenario.
 */
class BandsOverlayTest {

    private RunDirector director;
    private RangesPanel panel;
    private BandsOverlay overlay;
    private Scenario scenario;

    /** The tin scenario cut to one hour (about 20 ms a run), so that twelve samples take well under a second. */
    private static Scenario shortTin() {
        Scenario s = TinRun.scenario();
        RunSettings r = s.run();
        return s.withRun(new RunSettings(3600, r.outputIntervalS(), r.stops(), r.targetMetal()));
    }

    private void build() {
        ChartGrid grid = new ChartGrid(() -> director == null ? List.of() : director.shown(), () -> { });
        AbstractAction none = new AbstractAction("x") {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
            }
        };
        PlaybackBar bar = new PlaybackBar(none, none, none, s -> director.setSpeed(s), t -> director.scrubTo(t));
        director = new RunDirector(TinRun.lib(), new RunPanels(grid, bar, new EventLogPanel(t -> { }), new SummaryPanel(),
                new CautionPanel(), new CautionStrip(() -> { }), new RunComparison(), new StatusBar()), () -> { });
        panel = new RangesPanel(() -> { }, () -> { });
        StudyHost host = new StudyHost() {
            @Override
            public ChemLibrary library() {
                return TinRun.lib();
            }

            @Override
            public Scenario scenario() {
                return scenario;
            }

            @Override
            public ScenarioDraft draftCopy() {
                throw new UnsupportedOperationException("not used by the bands");
            }

            @Override
            public String scenarioName() {
                return "tin.toml";
            }

            @Override
            public boolean dark() {
                return false;
            }

            @Override
            public JFrame frame() {
                return null;
            }

            @Override
            public boolean load(ScenarioDraft d, String what) {
                return false;
            }

            @Override
            public void say(String text) {
            }
        };
        overlay = new BandsOverlay(host, director, panel, on -> { });
        director.onChartsChanged(overlay::chartsChanged);
    }

    @Test
    void bandsAreTheStudysPercentilesAndClearWhenTheScenarioChanges() throws Exception {
        scenario = shortTin();
        edt(() -> {
            build();
            panel.setSamples(12);
            director.replot(scenario, "tin, 1 h", System.nanoTime());
            return null;
        });
        await("the run is shown", () -> edt(() -> director.result() != null));
        edt(() -> {
            overlay.compute();
            return null;
        });
        assertTrue(edt(overlay::running), "the study runs off the event thread");
        await("the bands are computed", () -> edt(() -> overlay.bands() != null));
        SpreadResult r = edt(overlay::bands);
        assertEquals(12, r.samples());
        assertTrue(edt(() -> SpreadBands.shown(director.charts())), "the charts show the bands");

        // the concentration chart's band of Sn2+ is the study's 5-95 % band, in mol/L at the output times
        YIntervalSeriesCollection c = edt(() -> bandData(director.charts().concentrations().getXYPlot()));
        assertNotNull(c, "a band dataset on the composition chart");
        int k = c.indexOf("Sn2+");
        SeriesBands.Band b = r.bands().band("c:Sn2+");
        double[] t = r.bands().timeS();
        int item = 0;
        for (int g = 0; g < t.length; g++) {
            if (!Double.isFinite(b.p5()[g]) || !Double.isFinite(b.p95()[g])) {
                continue;
            }
            // 1 mol/L = 1000 mol/m3; the time axis of a one-hour run is in minutes
            assertEquals(t[g] / 60, c.getXValue(k, item), 1e-9);
            assertEquals(b.p5()[g] / 1000, c.getStartYValue(k, item), 1e-12);
            assertEquals(b.p95()[g] / 1000, c.getEndYValue(k, item), 1e-12);
            assertTrue(c.getStartYValue(k, item) <= c.getEndYValue(k, item));
            item++;
        }
        assertEquals(c.getItemCount(k), item);
        assertTrue(item > 30, "most of the hour has a band: " + item);

        // the ranges under the summary are the figures' percentiles
        Percentiles eff = r.figures().get(SummaryFigure.EFFICIENCY);
        String row = edt(() -> panel.shownRows().stream().filter(s -> s.startsWith("current efficiency"))
                .findFirst().orElseThrow());
        assertTrue(row.contains(String.format(Locale.ROOT, "%.3g to %.3g", 100 * eff.p5(), 100 * eff.p95())), row);

        // a restyle of the same scenario keeps them, another scenario clears them
        edt(() -> {
            director.setDark(true);
            return null;
        });
        assertTrue(edt(() -> SpreadBands.shown(director.charts())), "drawn again after a restyle");
        Scenario wider = scenario.withCell(scenario.cell().withGap(0.04));
        scenario = wider;
        edt(() -> {
            director.replot(wider, "gap 40 mm", System.nanoTime());
            return null;
        });
        await("the other run is shown", () -> edt(() -> director.result() != null
                && director.result().scenario().equals(wider)));
        assertNull(edt(overlay::bands), "the bands belong to the other scenario");
        assertFalse(edt(() -> SpreadBands.shown(director.charts())), "cleared from the charts");
        assertTrue(edt(panel::noteText).contains("changed"), edt(panel::noteText));
    }

    private static YIntervalSeriesCollection bandData(XYPlot plot) {
        // datasets sit at chosen indices (the bands at 5), not 0..n-1
        for (org.jfree.data.xy.XYDataset d : plot.getDatasets().values()) {
            if (d instanceof YIntervalSeriesCollection y && y.getSeriesCount() > 0
                    && y.indexOf("Sn2+") >= 0) {
                return y;
            }
        }
        return null;
    }

    private static void await(String what, OnEdt.Check check) throws Exception {
        OnEdt.await(what, 60, check);
    }
}
