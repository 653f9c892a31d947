package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.RunChartModel;
import org.cellwright.chart.RunCharts;
import org.cellwright.chart.TimeScale;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Species;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.RunLogReader;
import org.cellwright.io.ScenarioReader;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunResult;
import org.cellwright.study.MeasuredLog;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * A measured log as chart markers: each column on its chart, in that chart's display unit, blanks left out;
 * the markers survive a restyle and a replaced run, leave with {@code detach}; and the distance of a run from
 * the log, column by column.
 */
class LogOverlayTest {

    private static final Path LOG = Path.of("scenarios", "copper-etchant-bleed-log.csv");
    private static ChemLibrary lib;
    private static MeasuredLog log;
    private static LogOverlay overlay;

    @BeforeAll
    static void load() throws Exception {
        lib = LibraryReader.builtIn();
        log = new RunLogReader(lib).read(LOG).log();
        overlay = new LogOverlay(log, sp -> lib.findSpecies(sp).map(Species::molarMassKgPerMol).orElse(Double.NaN));
    }

    private static LogOverlay.Markers of(List<LogOverlay.Markers> all, LogOverlay.Target t) {
        return all.stream().filter(m -> m.target() == t).findFirst().orElseThrow();
    }

    @Test
    void columnsBecomePointsInTheChartsUnits() throws Exception {
        List<LogOverlay.Markers> hours = overlay.markers(TimeScale.HOURS);
        assertEquals(4, hours.size(), "current, voltage, deposit and Cu2+");
        // source: the file itself, split here by hand: the first data row is time_min, current_A,
        // cell_voltage_V, deposit_g, c_Cu2+_g_per_L; the cells filled in each column are counted the same way
        List<String[]> rows = Files.readAllLines(LOG).stream().filter(l -> !l.startsWith("#") && !l.isBlank())
                .skip(1).map(l -> l.split(",", -1)).toList();
        double[] first = java.util.Arrays.stream(rows.get(0)).mapToDouble(Double::parseDouble).toArray();
        LogOverlay.Markers current = of(hours, LogOverlay.Target.CURRENT);
        assertEquals(filled(rows, 1), current.series().getItemCount());
        assertEquals(first[0] / 60, current.series().getX(0).doubleValue(), 1e-12, "minutes to hours");
        assertEquals(first[1], current.series().getY(0).doubleValue(), 1e-12);
        LogOverlay.Markers volts = of(hours, LogOverlay.Target.VOLTAGE);
        assertEquals(filled(rows, 2), volts.series().getItemCount(), "blank voltage cells are left out");
        assertTrue(filled(rows, 2) < rows.size(), "the demo log has blank voltage cells");
        assertEquals(first[2], volts.series().getY(0).doubleValue(), 1e-12);
        assertEquals(filled(rows, 3), of(hours, LogOverlay.Target.DEPOSIT).series().getItemCount(), "weighed hourly");
        LogOverlay.Markers cu = of(hours, LogOverlay.Target.CONCENTRATIONS);
        assertEquals("Cu2+", cu.species());
        assertEquals(filled(rows, 4), cu.series().getItemCount());
        // source: IUPAC standard atomic weight of copper 63.546 g/mol (CIAAW 2013); the ion's two missing
        // electrons (2 x 0.00055 g/mol) are below the 1e-4 relative tolerance
        assertEquals(first[4] / 63.546, cu.series().getY(0).doubleValue(), first[4] / 63.546 * 1e-4, "g/L to mol/L");
        List<LogOverlay.Markers> minutes = overlay.markers(TimeScale.MINUTES);
        assertEquals(first[0], of(minutes, LogOverlay.Target.CURRENT).series().getX(0).doubleValue(), 1e-12);
    }

    private static int filled(List<String[]> rows, int column) {
        return (int) rows.stream().filter(r -> r.length > column && !r[column].isBlank()).count();
    }

    @Test
    void markersStayThroughRestylesAndLeaveOnDetach() throws Exception {
        RunResult run = copperRun(8 * 3600);
        RunCharts charts = RunCharts.of(run, ChartStyle.light());
        assertEquals(TimeScale.HOURS, charts.model().timeScale());
        overlay.attach(charts);
        XYPlot v = charts.voltage().getXYPlot();
        XYDataset d = v.getDataset(LogOverlay.DATASET);
        assertNotNull(d);
        assertEquals(log.column("cell_voltage_V").count(), d.getItemCount(0));
        assertNull(charts.temperature().getXYPlot().getDataset(LogOverlay.DATASET), "the log has no temperature");
        charts.setStyle(ChartStyle.dark());
        charts.setTimeSpan(9 * 3600);
        assertNotNull(v.getRenderer(LogOverlay.DATASET).getSeriesPaint(0), "the marker colour outlives a restyle");
        assertTrue(((org.jfree.chart.renderer.AbstractRenderer) v.getRenderer(LogOverlay.DATASET)).lookupSeriesShape(0)
                instanceof java.awt.geom.Ellipse2D,
                "and so does its round shape");
        double highest = java.util.Arrays.stream(log.column("cell_voltage_V").values()).filter(x -> !Double.isNaN(x))
                .max().orElseThrow();
        assertTrue(v.getDataRange(v.getRangeAxis()).contains(highest), "the markers take part in the axis range");
        overlay.detach();
        assertNull(v.getDataset(LogOverlay.DATASET));
    }

    @Test
    void aRunIsComparedOverTheRowsItCovers() throws Exception {
        LogMatch whole = LogMatch.of(log, copperRun(8 * 3600), lib);
        assertEquals(4, whole.columns().size());
        // source: the log's header: logger noise on a 4 A current; the CLI's fit leaves 19.9 mA rms
        // (docs), so an unfitted run with the same current set point lies within 50 mA
        assertTrue(whole.columns().get(0).rmse() < 0.05, "current rms " + whole.columns().get(0).rmse());
        assertTrue(whole.note().contains(log.timesS().length + " rows"), whole.note());
        LogMatch part = LogMatch.of(log, copperRun(3 * 3600), lib);
        assertTrue(part.note().startsWith("Over the log's first "), part.note());
        int rows = LogMatch.upTo(log, 3 * 3600).timesS().length;
        assertTrue(rows > 30 && rows < 40, "about 3 h of a 6 h 53 min log: " + rows);
        assertEquals(List.of("current_A", "cell_voltage_V", "deposit_g", "c_Cu2+_g_per_L"),
                part.rows().stream().map(r -> r[0]).toList());
    }

    private static RunResult copperRun(double durationS) throws Exception {
        var s = new ScenarioReader(lib).load(Path.of("scenarios", "copper-etchant-bleed.toml"),
                List.of("run.duration=\"" + durationS + " s\"", "run.stop=[]")).scenario();
        return CellSimulation.withDefaults().run(s, lib, null);
    }

    @Test
    void describesWhatIsDrawn() {
        String d = overlay.describe();
        assertTrue(d.startsWith(log.timesS().length + " rows over " + org.cellwright.sim.RunClock.format(log.endS())
                + ":"), d);
        assertTrue(d.contains("c_Cu2+_g_per_L (4)"), d);
    }
}
