package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.cellwright.sim.RunSummary;
import org.cellwright.study.AxisValue;
import org.cellwright.study.GridPoint;
import org.cellwright.study.SummaryFigure;
import org.cellwright.study.Sweep;
import org.cellwright.study.SweepAxis;
import org.cellwright.study.SweepPoint;
import org.cellwright.study.SweepResult;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/** The sweep's heat map and line chart: cells where the points are, colours by value, gaps for failures. */
class SweepChartsTest {

    /** A summary whose only meaningful figure is the specific energy (J/kg). */
    static RunSummary summary(double specificJPerKg) {
        return new RunSummary("end", 3600, 1e4, Map.of("Cu", 1e-3), Map.of("Cu", 1.0), "Cu", 0.9, 1e5,
                specificJPerKg, 2, 2, 2, 2, Map.of(), Map.of(), null, null, null, 298, 298, 298, Map.of(), List.of(), Map.of(),
                Map.of());
    }

    private static SweepAxis axis(String key, String unit, double... numbers) {
        List<AxisValue> v = new ArrayList<>();
        for (double n : numbers) {
            v.add(new AxisValue(n + " " + unit, n, n));
        }
        return new SweepAxis(key, unit, v, false);
    }

    /** 3 x 2 grid; specific energy (kWh/kg) = 1 + i + 0.5 j, point (1, 1) failed. */
    private static SweepResult grid() {
        List<SweepAxis> axes = List.of(axis("cell.gap", "mm", 20, 40, 60), axis("supply.current", "A", 1, 2));
        List<GridPoint> points = new Sweep(axes, p -> null, sc -> null).grid();
        List<SweepPoint> out = new ArrayList<>();
        for (GridPoint p : points) {
            int i = p.indices()[0];
            int j = p.indices()[1];
            out.add(i == 1 && j == 1 ? new SweepPoint(p, SweepPoint.Status.INVALID, null, null, "bad")
                    : new SweepPoint(p, SweepPoint.Status.OK, null, summary((1 + i + 0.5 * j) * 3.6e6), null));
        }
        return new SweepResult(axes, out, false, 0.1, 1);
    }

    private static int pixelAt(JFreeChart chart, double x, double y, BufferedImage[] image) {
        BufferedImage img = new BufferedImage(800, 600, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        ChartRenderingInfo info = new ChartRenderingInfo();
        chart.draw(g, new Rectangle2D.Double(0, 0, 800, 600), info);
        g.dispose();
        image[0] = img;
        Rectangle2D area = info.getPlotInfo().getDataArea();
        XYPlot plot = chart.getXYPlot();
        int px = (int) plot.getDomainAxis().valueToJava2D(x, area, RectangleEdge.BOTTOM);
        int py = (int) plot.getRangeAxis().valueToJava2D(y, area, RectangleEdge.LEFT);
        return img.getRGB(px, py);
    }

    @Test
    void eachCellHasItsValuesColourAndAFailedCellIsGrey() {
        ChartStyle style = ChartStyle.light();
        JFreeChart chart = SweepCharts.of(grid(), SummaryFigure.SPECIFIC_ENERGY, "a scenario", style);
        BufferedImage[] img = new BufferedImage[1];
        // evenly spaced numeric axes are drawn to scale: the cell of (40 mm, 2 A) is at x = 40, y = 2
        HeatScale scale = new HeatScale(1.0, 3.5, style.grid());
        assertEquals(((Color) scale.getPaint(1.0)).getRGB(), pixelAt(chart, 20, 1, img));
        assertEquals(((Color) scale.getPaint(3.5)).getRGB(), pixelAt(chart, 60, 2, img));
        assertEquals(((Color) scale.getPaint(2.0)).getRGB(), pixelAt(chart, 40, 1, img));
        assertEquals(style.grid().getRGB(), pixelAt(chart, 40, 2, img));
        XYDataset data = chart.getXYPlot().getDataset();
        // item i is grid point i, so a click on a cell finds its run
        assertEquals(6, data.getItemCount(0));
        assertEquals(40.0, data.getXValue(0, 3));
        assertEquals(2.0, data.getYValue(0, 3));
    }

    @Test
    void oneKeyDrawsALineWithAGapAtAFailedPoint() {
        SweepAxis a = axis("cell.gap", "mm", 10, 20, 30);
        List<GridPoint> points = new Sweep(List.of(a), p -> null, sc -> null).grid();
        SweepResult r = new SweepResult(List.of(a), List.of(
                new SweepPoint(points.get(0), SweepPoint.Status.OK, null, summary(7.2e6), null),
                new SweepPoint(points.get(1), SweepPoint.Status.FAILED, null, null, "x"),
                new SweepPoint(points.get(2), SweepPoint.Status.OK, null, summary(9.0e6), null)), false, 0.1, 1);
        JFreeChart chart = SweepCharts.of(r, SummaryFigure.SPECIFIC_ENERGY, null, ChartStyle.dark());
        XYDataset d = chart.getXYPlot().getDataset();
        assertEquals(3, d.getItemCount(0));
        assertEquals(30.0, d.getXValue(0, 2));
        // source: 9.0e6 J/kg / 3.6e6 J/kWh = 2.5 kWh/kg (SI Brochure table 8)
        assertEquals(2.5, d.getYValue(0, 2), 1e-12);
        assertNull(d.getY(0, 1));
        assertEquals("specific energy (kWh/kg)", chart.getXYPlot().getRangeAxis().getLabel());
    }

    @Test
    void wordsAreOneCellEachLabelledWithTheWord() {
        List<AxisValue> words = List.of(new AxisValue("still", 0, Double.NaN), new AxisValue("stirred", 1, Double.NaN));
        SweepAxis w = new SweepAxis("cell.agitation", "", words, false);
        assertEquals("stirred", new SweepCharts.ValueLabels(List.of("still", "stirred")).format(1.0));
        assertEquals("", new SweepCharts.ValueLabels(List.of("still", "stirred")).format(0.5));
        SweepAxis x = axis("supply.current", "A", 1, 2, 4);
        assertTrue(!SweepCharts.evenlySpaced(x) && !SweepCharts.evenlySpaced(w));
        assertTrue(SweepCharts.evenlySpaced(axis("g", "mm", 10, 12.6316, 15.2632, 17.8947)));
    }

    @Test
    void theHeatScaleGrowsLighterFromOneEndToTheOther() {
        HeatScale s = new HeatScale(0, 1, Color.GRAY);
        double last = -1;
        for (int k = 0; k <= 100; k++) {
            double lum = HeatScale.luminance((Color) s.getPaint(k / 100.0));
            // lightness carries the order (readable in grey print): strictly rising
            assertTrue(lum > last, "luminance at " + k + "%: " + lum + " after " + last);
            last = lum;
        }
        assertEquals(Color.GRAY, s.getPaint(Double.NaN));
        assertEquals(s.getPaint(1), s.getPaint(7));
        assertTrue(new HeatScale(2, 2, Color.GRAY).getUpperBound() > 2);
    }
}
