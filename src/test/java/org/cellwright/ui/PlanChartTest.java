package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.cellwright.cell.SetPoint;
import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.TimeScale;
import org.cellwright.chem.PhysicalConstants;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.TracePoint;
import org.cellwright.study.SchedulePlan;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.renderer.xy.XYStepRenderer;
import org.jfree.data.xy.XYDataset;
import org.jfree.data.xy.XYSeries;
import org.junit.jupiter.api.Test;

/**
 * The plan view's chart without a screen: the set current drawn as steps is the plan's schedule, and the
 * limiting current read back from the run agrees with the Nernst-layer limiting current n F D c A / delta.
 */
class PlanChartTest {

    private static SchedulePlan plan(List<SetPoint> steps, double durationS) {
        RunResult run = TinRun.run();
        return new SchedulePlan("Sn", 0.003, 0.5, steps, durationS, run.scenario(), run, 0.49, 0.45, 12000, 9000,
                List.of(), 40);
    }

    @Test
    void theStepSeriesIsThePlansSchedule() {
        List<SetPoint> steps = List.of(new SetPoint(0, 0.52, false), new SetPoint(2400, 0.47, false),
                new SetPoint(6000, 0.43, false));
        SchedulePlan p = plan(steps, 10_500);
        TimeScale scale = TimeScale.forSpan(p.durationS());
        XYSeries s = PlanChart.steps(p, scale);
        assertEquals(steps.size() + 1, s.getItemCount(), "one item per step and one at the goal");
        for (int k = 0; k < steps.size(); k++) {
            assertEquals(scale.fromSeconds(steps.get(k).atS()), s.getX(k).doubleValue(), 1e-12);
            assertEquals(steps.get(k).value(), s.getY(k).doubleValue(), 1e-12);
        }
        assertEquals(scale.fromSeconds(10_500), s.getX(3).doubleValue(), 1e-12, "the last step holds to the goal");
        assertEquals(0.43, s.getY(3).doubleValue(), 1e-12);

        JFreeChart chart = PlanChart.of(p, ChartStyle.light());
        assertTrue(chart.getXYPlot().getRenderer(0) instanceof XYStepRenderer, "drawn as steps");
        XYDataset drawn = chart.getXYPlot().getDataset(0);
        for (int i = 0; i < s.getItemCount(); i++) {
            assertEquals(s.getY(i).doubleValue(), drawn.getYValue(0, i), 1e-12);
        }
        // the allowed share is the limiting current times the plan's fraction, point by point
        XYDataset lines = chart.getXYPlot().getDataset(1);
        for (int i = 0; i < lines.getItemCount(0); i++) {
            assertEquals(0.5 * lines.getYValue(0, i), lines.getYValue(1, i), 1e-12);
        }
        assertTrue(chart.getXYPlot().getRangeAxis().getUpperBound() >= 0.52 * 1.2 - 1e-12, "the steps fit");
    }

    @Test
    void theLimitingCurrentReadFromTheRunIsTheNernstLayerValue() {
        RunResult run = TinRun.run();
        int sn = run.speciesNames().indexOf("Sn2+");
        TracePoint at = run.trace().stream().filter(t -> t.timeS() >= 600).findFirst().orElseThrow();
        XYSeries limit = PlanChart.limit(run.trace(), TimeScale.MINUTES, 1, "i_L");
        double read = Double.NaN;
        for (int i = 0; i < limit.getItemCount(); i++) {
            if (Math.abs(limit.getX(i).doubleValue() - TimeScale.MINUTES.fromSeconds(at.timeS())) < 1e-9) {
                read = limit.getY(i).doubleValue();
            }
        }
        double d = TinRun.lib().findSpecies("Sn2+").orElseThrow().diffusionM2PerS();
        double c = at.state().concentrationsMolPerM3()[sn];
        double area = run.scenario().cathode().areaM2();
        double delta = run.scenario().cell().agitation().diffusionLayerM();
        // source: i_L = n F D c A / delta, Nernst diffusion layer (Bard and Faulkner, Electrochemical Methods,
        // 2nd ed., 2001, eq. 1.4.10); D of Sn2+ at 25 C from the library
        double nernst = 2 * PhysicalConstants.FARADAY * d * c * area / delta;
        // 2 %: by 10 min the bath has warmed by about 0.15 K, and D rises about 2 % per kelvin (Stokes-Einstein
        // with water's viscosity, common practice); the layer has long reached its steady thickness (about 2 min)
        assertEquals(nernst, read, 0.02 * nernst);
    }
}
