package org.cellwright.ui;

import java.awt.BasicStroke;
import java.util.List;
import java.util.Locale;

import org.cellwright.cell.SetPoint;
import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.TimeScale;
import org.cellwright.sim.InstantState;
import org.cellwright.sim.TracePoint;
import org.cellwright.study.SchedulePlan;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.renderer.xy.XYStepRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A planned schedule as a chart: the set current in steps over the run, against the target metal's limiting
 * current and the allowed fraction of it, and the target's own deposition current, all from the plan's
 * checked run. Time in the unit {@link TimeScale} picks for the run's length.
 *
 * <p>The limiting current is read from the run: the engine gives the target's net deposition current
 * ({@code currentA * targetEfficiency}) and its share of the limiting current ({@code targetLimitRatio}),
 * so {@code i_L = currentA * targetEfficiency / targetLimitRatio} wherever the metal deposits.
 */
final class PlanChart {

    /** Below this share of the limiting current the quotient is left out: round-off, no deposition (our own). */
    static final double MIN_RATIO = 1e-4;

    private PlanChart() {
    }

    /**
     * @param p a plan
     * @param scale the time unit of the x values
     * @return the set current as a step series: one item per step at its start, and one at the goal holding
     *     the last step's current (A)
     */
    static XYSeries steps(SchedulePlan p, TimeScale scale) {
        XYSeries s = new XYSeries("set current", false, true);
        List<SetPoint> steps = p.steps();
        for (SetPoint sp : steps) {
            s.add(scale.fromSeconds(sp.atS()), sp.value());
        }
        if (!steps.isEmpty()) {
            s.add(scale.fromSeconds(p.durationS()), steps.get(steps.size() - 1).value());
        }
        return s;
    }

    /**
     * @param trace the checked run's points
     * @param scale the time unit
     * @param fraction multiplies the limiting current (1 for i_L itself, F for the allowed ceiling)
     * @param name the series name
     * @return the target's limiting current times the fraction at each point where the metal deposits (A)
     */
    static XYSeries limit(List<TracePoint> trace, TimeScale scale, double fraction, String name) {
        XYSeries s = new XYSeries(name);
        for (TracePoint t : trace) {
            InstantState st = t.state();
            if (st.targetLimitRatio() > MIN_RATIO) {
                s.add(scale.fromSeconds(t.timeS()), fraction * st.currentA() * st.targetEfficiency()
                        / st.targetLimitRatio(), false);
            }
        }
        s.fireSeriesChanged();
        return s;
    }

    /**
     * @return the target metal's deposition current at each point (A)
     */
    static XYSeries deposition(List<TracePoint> trace, TimeScale scale, String metal) {
        XYSeries s = new XYSeries(metal + " deposition current");
        for (TracePoint t : trace) {
            s.add(scale.fromSeconds(t.timeS()), t.state().currentA() * t.state().targetEfficiency(), false);
        }
        s.fireSeriesChanged();
        return s;
    }

    /**
     * @param p a plan
     * @param style the look
     * @return the chart: steps, limiting current, allowed fraction, deposition current; a line at the goal
     */
    static JFreeChart of(SchedulePlan p, ChartStyle style) {
        TimeScale scale = TimeScale.forSpan(p.durationS());
        List<TracePoint> trace = p.verification().trace();
        XYSeriesCollection stepData = new XYSeriesCollection(steps(p, scale));
        XYSeriesCollection lines = new XYSeriesCollection();
        lines.addSeries(limit(trace, scale, 1, "limiting current of " + p.metal()));
        lines.addSeries(limit(trace, scale, p.maxFraction(), String.format(Locale.ROOT, "%.2f of the limiting current",
                p.maxFraction())));
        lines.addSeries(deposition(trace, scale, p.metal()));
        NumberAxis time = new NumberAxis(scale.axisLabel());
        time.setRange(0, scale.fromSeconds(p.durationS()) * 1.02);
        NumberAxis amps = new NumberAxis("current (A)");
        amps.setRange(0, top(p, lines.getSeries(0)));
        XYStepRenderer stepRenderer = new XYStepRenderer();
        XYLineAndShapeRenderer lineRenderer = new XYLineAndShapeRenderer(true, false);
        XYPlot plot = new XYPlot(stepData, time, amps, stepRenderer);
        plot.setDataset(1, lines);
        plot.setRenderer(1, lineRenderer);
        JFreeChart chart = new JFreeChart(String.format(Locale.ROOT, "Planned current for %s g of %s",
                SweepKeys.num(p.massKg() * 1000), p.metal()), JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        style.apply(chart);
        stepRenderer.setSeriesPaint(0, style.series(1));
        stepRenderer.setSeriesStroke(0, new BasicStroke(2.6f));
        // the limiting current thin and muted, the allowed share of it dashed in the text colour
        lineRenderer.setSeriesPaint(0, style.mutedText());
        lineRenderer.setSeriesStroke(0, new BasicStroke(1.2f));
        lineRenderer.setSeriesPaint(1, style.text());
        lineRenderer.setSeriesStroke(1, new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10,
                new float[] {6, 4}, 0));
        lineRenderer.setSeriesPaint(2, style.series(0));
        lineRenderer.setSeriesStroke(2, new BasicStroke(1.4f));
        ValueMarker goal = new ValueMarker(scale.fromSeconds(p.durationS()), style.mutedText(), new BasicStroke(1f,
                BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10, new float[] {2, 3}, 0));
        goal.setLabel("goal");
        goal.setLabelPaint(style.mutedText());
        goal.setLabelAnchor(RectangleAnchor.TOP_LEFT);
        goal.setLabelTextAnchor(TextAnchor.TOP_RIGHT);
        plot.addDomainMarker(goal);
        TextTitle sub = new TextTitle(summary(p), style.font(11f, false));
        sub.setPaint(style.mutedText());
        chart.addSubtitle(0, sub);
        return chart;
    }

    /**
     * @return the top of the current axis: a fifth above the highest step and the limiting current, leaving
     *     out the first minutes, where the limiting current is far higher while the diffusion layer grows to
     *     its steady thickness (drawn, but off the top)
     */
    static double top(SchedulePlan p, XYSeries limit) {
        double high = p.steps().stream().mapToDouble(SetPoint::value).max().orElse(1);
        double[] values = new double[limit.getItemCount()];
        for (int i = 0; i < values.length; i++) {
            values[i] = limit.getY(i).doubleValue();
        }
        java.util.Arrays.sort(values);
        if (values.length > 0) {
            // the 90th percentile: past the transient of the first tenth of the run
            high = Math.max(high, values[(int) Math.floor(0.9 * (values.length - 1))]);
        }
        return 1.2 * high;
    }

    /** @return the plan in one line: its time, and the constant current it beats */
    static String summary(SchedulePlan p) {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "%d steps reach the goal in %s",
                p.steps().size(), org.cellwright.sim.RunClock.format(p.durationS())));
        if (Double.isFinite(p.constantCurrentA())) {
            sb.append(String.format(Locale.ROOT, "; the best constant current, %s A, takes %s", SweepKeys.num(
                    p.constantCurrentA()), org.cellwright.sim.RunClock.format(p.constantCurrentS())));
            if (p.savedS() > 0.005 * p.constantCurrentS()) {
                sb.append(String.format(Locale.ROOT, " (the plan saves %.0f %%)", 100 * p.savedS()
                        / p.constantCurrentS()));
            }
        }
        return sb.toString();
    }
}
