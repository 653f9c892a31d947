package org.cellwright.ui;

import java.util.concurrent.CancellationException;
import java.util.function.Consumer;

import org.cellwright.cell.Scenario;
import org.cellwright.chart.RunCharts;
import org.cellwright.chart.SpreadBands;
import org.cellwright.sim.RunResult;
import org.cellwright.study.SpreadResult;
import org.cellwright.study.SpreadStudy;
import org.cellwright.study.Sweep;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.Range;
import org.jfree.data.general.DatasetUtils;
import org.jfree.data.xy.XYDataset;

/**
 * The uncertainty bands on the main window's charts: runs the spread study for the scenario shown (on worker
 * threads, with progress and Cancel in the {@link RangesPanel}), shades its 5-95 % bands on the charts
 * ({@link SpreadBands}) and lists the ranges under the summary. The bands belong to one scenario: whenever the
 * charts show another (a slider, an edit, a file), they are cleared and the panel offers to recompute; when
 * the charts are remade or restyled for the same scenario they are drawn again. Event thread only.
 */
final class BandsOverlay {

    /** Seed of the samples: fixed, so the same scenario gives the same bands (as the command line's default). */
    static final long SEED = 1;

    private final StudyHost host;
    private final RunDirector director;
    private final RangesPanel panel;
    private final Consumer<Boolean> shownChanged;
    private StudyTask<SpreadResult> task;
    private SpreadResult bands;
    private Scenario bandsFor;

    /**
     * @param host the main window
     * @param director shows the runs and owns the charts
     * @param panel the ranges section under the summary
     * @param shownChanged told whether bands are shown or being computed (for the menu's tick)
     */
    BandsOverlay(StudyHost host, RunDirector director, RangesPanel panel, Consumer<Boolean> shownChanged) {
        this.host = host;
        this.director = director;
        this.panel = panel;
        this.shownChanged = shownChanged;
    }

    /** Computes the bands for the form's scenario (replacing any). */
    void compute() {
        Scenario s = host.scenario();
        if (s == null) {
            panel.failed("The scenario has problems (marked in the form): fix them to compute its bands.");
            shownChanged.accept(false);
            return;
        }
        if (task != null) {
            task.stop();
        }
        clear(null);
        if (director.result() == null) {
            // nothing shown yet: show the nominal run whole, so the bands have their lines
            director.replot(s, host.scenarioName(), System.nanoTime());
        }
        int samples = panel.samples();
        panel.running(true);
        shownChanged.accept(true);
        StudyTask<SpreadResult>[] self = new StudyTask[1];
        self[0] = new StudyTask<>((p, c) -> new SpreadStudy(host.library(), Sweep.allCores()).run(s, samples, SEED, p, c),
                panel.bar(), r -> done(self[0], s, r), t -> failed(self[0], t));
        task = self[0];
        task.start();
        host.say("Computing the uncertainty bands: " + samples + " samples...");
    }

    /** Stops a running study; the samples that ran still give bands. */
    void cancel() {
        if (task != null) {
            task.stop();
        }
    }

    /** Switches the bands off. */
    void off() {
        if (task != null) {
            task.stop();
            task = null;
        }
        panel.running(false);
        clear("Bands off. Compute them again for the scenario shown.");
    }

    private void done(StudyTask<SpreadResult> t, Scenario s, SpreadResult r) {
        if (t != task) {
            return;
        }
        task = null;
        panel.running(false);
        if (!s.equals(host.scenario())) {
            clear("The scenario changed while the bands were computed; compute them again.");
            return;
        }
        bands = r;
        bandsFor = s;
        panel.show(r, t.elapsedS());
        draw();
        host.say(String.format(java.util.Locale.ROOT, "Uncertainty bands: %d samples in %.1f s.", r.ran(),
                t.elapsedS()));
    }

    private void failed(StudyTask<SpreadResult> t, Throwable e) {
        if (t != task) {
            return;
        }
        task = null;
        panel.running(false);
        shownChanged.accept(false);
        panel.failed(e instanceof CancellationException ? "Cancelled." : e instanceof IllegalArgumentException
                ? "The spread study cannot run this scenario: " + e.getMessage() : "Internal failure: " + e);
    }

    /** The charts changed (a run shown, remade, restyled): draws the bands again, or clears them. */
    void chartsChanged() {
        if (bands == null) {
            return;
        }
        RunResult shown = director.result();
        Scenario now = shown != null ? shown.scenario() : host.scenario();
        if (!bandsFor.equals(now)) {
            clear("The scenario changed: the bands were cleared. Recompute them for the scenario shown.");
            return;
        }
        draw();
    }

    private void draw() {
        RunCharts charts = director.charts();
        if (charts == null || bands == null) {
            return;
        }
        SpreadBands.apply(charts, bands.bands(), bands.ran());
        widenHeldAxes(charts);
        shownChanged.accept(true);
    }

    /** While a run plays, the value axes are held to the run's range: widen them to take the bands in too. */
    static void widenHeldAxes(RunCharts charts) {
        for (JFreeChart c : charts.all()) {
            XYPlot plot = c.getXYPlot();
            ValueAxis axis = plot.getRangeAxis(0);
            if (axis.isAutoRange() || c == charts.dendrite()) {
                continue;
            }
            Range r = axis.getRange();
            for (int i : new int[] {SpreadBands.BANDS, SpreadBands.EFFICIENCY_BANDS}) {
                XYDataset d = plot.getDataset(i);
                if (d != null && plot.getRangeAxisForDataset(i) == axis) {
                    Range b = DatasetUtils.findRangeBounds(d, true);
                    if (b != null) {
                        r = Range.combine(r, b);
                    }
                }
            }
            if (!r.equals(axis.getRange())) {
                axis.setRange(r, true, true);
            }
        }
    }

    private void clear(String why) {
        bands = null;
        bandsFor = null;
        RunCharts charts = director.charts();
        if (charts != null) {
            SpreadBands.remove(charts);
        }
        if (why != null) {
            panel.cleared(why);
            shownChanged.accept(false);
        }
    }

    /** @return the bands shown, or null */
    SpreadResult bands() {
        return bands;
    }

    /** @return true while the study runs */
    boolean running() {
        return task != null;
    }
}
