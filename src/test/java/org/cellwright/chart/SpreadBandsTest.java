package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.sim.RunResult;
import org.cellwright.study.SeriesBands;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYPolygonAnnotation;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.YIntervalSeriesCollection;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** Spread bands under a run's charts: in chart units, on the right axis, once however often applied. */
class SpreadBandsTest {

    private static RunResult run;
    private static SeriesBands bands;

    @BeforeAll
    static void fixture() {
        run = ChartFixtures.run(1.5, 3 * 3600);
        int n = run.trace().size();
        double[] t = run.trace().stream().mapToDouble(p -> p.timeS()).toArray();
        Map<String, SeriesBands.Band> series = new LinkedHashMap<>();
        for (String key : List.of("cell_voltage", "current", "efficiency", "efficiency_cumulative", "temperature",
                "dendrite")) {
            series.put(key, band(n, 1.0));
        }
        run.speciesNames().forEach(s -> series.put("c:" + s, band(n, 100.0)));
        run.metalSymbols().forEach(m -> series.put("deposit:" + m, band(n, 0.002)));
        // the temperature band: 300 K +- 1 K
        series.put("temperature", new SeriesBands.Band(fill(n, 299), fill(n, 300), fill(n, 301)));
        bands = new SeriesBands(t, series);
    }

    private static double[] fill(int n, double v) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, v);
        return a;
    }

    private static SeriesBands.Band band(int n, double mid) {
        return new SeriesBands.Band(fill(n, 0.9 * mid), fill(n, mid), fill(n, 1.1 * mid));
    }

    @Test
    void bandsAreInChartUnitsBehindTheLines() {
        RunCharts charts = RunCharts.of(run, ChartStyle.light());
        SpreadBands.apply(charts, bands, 40);
        YIntervalSeriesCollection t = (YIntervalSeriesCollection) charts.temperature().getXYPlot()
                .getDataset(SpreadBands.BANDS);
        assertEquals(run.trace().size(), t.getItemCount(0));
        // source: t/C = T/K - 273.15 (SI Brochure 2.3.1)
        assertEquals(25.85, t.getStartYValue(0, 3), 1e-9);
        assertEquals(27.85, t.getEndYValue(0, 3), 1e-9);
        YIntervalSeriesCollection c = (YIntervalSeriesCollection) charts.concentrations().getXYPlot()
                .getDataset(SpreadBands.BANDS);
        // 110 mol/m3 is 0.11 mol/L
        assertEquals(0.11, c.getEndYValue(0, 0), 1e-12);
        var plot = charts.current().getXYPlot();
        assertEquals(plot.getRangeAxis(1), plot.getRangeAxisForDataset(SpreadBands.EFFICIENCY_BANDS));
        assertEquals(110.0, ((YIntervalSeriesCollection) plot.getDataset(SpreadBands.EFFICIENCY_BANDS))
                .getEndYValue(0, 0), 1e-9);
        long polygons = charts.voltage().getXYPlot().getAnnotations().stream()
                .filter(a -> a instanceof XYPolygonAnnotation).count();
        assertEquals(1, polygons);
    }

    @Test
    void applyingAgainReplacesTheNoteAndTheOverlay() {
        RunCharts charts = RunCharts.of(run, ChartStyle.dark());
        SpreadBands.apply(charts, bands, 40);
        SpreadBands.apply(charts, bands, 40);
        for (JFreeChart chart : charts.all()) {
            long notes = 0;
            for (int i = 0; i < chart.getSubtitleCount(); i++) {
                if (chart.getSubtitle(i) instanceof TextTitle tt && tt.getText().startsWith(SpreadBands.NOTE)) {
                    notes++;
                }
            }
            assertEquals(1, notes, chart.getTitle().getText());
        }
        assertEquals(1, charts.voltage().getXYPlot().getAnnotations().size());
        assertTrue(ChartExport.render(new ChartSheet(charts, "t", "f"), 900, 600, 1).getWidth() == 900);
    }
}
