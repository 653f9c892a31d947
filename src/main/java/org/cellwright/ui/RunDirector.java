package org.cellwright.ui;

import java.util.List;
import java.util.Locale;

import javax.swing.SwingUtilities;
import javax.swing.Timer;

import org.cellwright.cell.Scenario;
import org.cellwright.chart.ChartStyle;
import org.cellwright.chart.RunChartModel;
import org.cellwright.chart.RunCharts;
import org.cellwright.chart.TimeScale;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.InstantState;
import org.cellwright.sim.RunLayout;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.TracePoint;

/**
 * Runs scenarios and shows them: the engine computes off the event thread (one run at a time, the latest
 * request wins), then a run either plays back in simulated time (a {@link Timer} appends what the play head
 * passed, in batches, about 30 times a second) or is replotted whole at once (after a slider move). Keeps the
 * charts, the event log, the summary, the cautions, the comparison and the pinned reference in step. Every
 * method runs on the event thread; chart data are touched only there.
 */
final class RunDirector {

    /** What a run is for. */
    enum Purpose {
        /** Play it back from the start. */
        PLAY,
        /** Show it whole at once (a slider or form change). */
        REPLOT
    }

    /**
     * A request to the engine.
     *
     * @param scenario what to run
     * @param purpose play back or replot
     * @param changedAtNanos {@link System#nanoTime()} when the user asked
     * @param label a few words naming the run
     */
    record Request(Scenario scenario, Purpose purpose, long changedAtNanos, String label) {
    }

    /** Playback frame interval (ms): about 30 frames a second, smooth to the eye, light on the charts. */
    static final int FRAME_MS = 33;
    /** Longest wall time one frame may advance (s), so a stall does not jump the play head. */
    static final double MAX_FRAME_S = 0.25;

    private final ChemLibrary lib;
    private final RunPanels panels;
    private final RecomputeQueue<Request, RunResult> engine;
    private final ReplotClock clock = new ReplotClock();
    private final Timer ticker = new Timer(FRAME_MS, e -> tick());
    private final Runnable stateChanged;
    private RunCharts charts;
    private RunChartModel model;
    private RunResult result;
    private Playback playback;
    private PlaybackSpeed speed = PlaybackSpeed.ALL.get(3);
    private RunComparison.Entry reference;
    private boolean dark;
    private long lastTick;
    private double lastEngineMs = Double.NaN;
    private Runnable chartsChanged = () -> {
    };

    /**
     * @param lib the chemistry library
     * @param panels the panels that show runs
     * @param stateChanged called when the playback state changes (for the actions)
     */
    RunDirector(ChemLibrary lib, RunPanels panels, Runnable stateChanged) {
        this.lib = lib;
        this.panels = panels;
        this.stateChanged = stateChanged;
        this.engine = new RecomputeQueue<>(r -> CellSimulation.withDefaults().run(r.scenario(), lib, null),
                new RecomputeQueue.Sink<>() {
                    @Override
                    public void done(Request request, RunResult run, long computeNanos) {
                        show(request, run, computeNanos);
                    }

                    @Override
                    public void failed(Request request, Throwable failure) {
                        panels.status().busy(engine.busy());
                        panels.status().fail(failure instanceof IllegalArgumentException
                                ? "The engine cannot run this scenario: " + failure.getMessage()
                                : "Internal failure in the engine: " + failure);
                    }
                });
    }

    /**
     * Shows empty charts for a scenario before it has run.
     *
     * @param s the scenario
     * @throws IllegalArgumentException when the chemistry cannot run it
     */
    void prepare(Scenario s) {
        stop();
        RunLayout layout = CellSimulation.layout(s, lib);
        double span = s.run().durationS();
        model = new RunChartModel(TimeScale.forSpan(span), layout.speciesNames(), layout.metalSymbols());
        charts = RunCharts.live(model, s.cell().gapM(), span, ChartStyle.of(dark));
        panels.charts().setCharts(charts);
        if (reference != null) {
            charts.setReference(reference.run(), reference.name());
        }
        result = null;
        playback = null;
        panels.events().show(List.of());
        panels.summary().clear();
        panels.cautions().clear();
        panels.strip().clear();
        panels.playback().clear();
        panels.comparison().setCurrent(null, null);
        setSpeed(PlaybackSpeed.forDuration(span));
        panels.playback().showSpeed(speed);
        stateChanged.run();
        chartsChanged.run();
    }

    /**
     * Computes a run and plays it back from the start.
     *
     * @param s the scenario
     * @param label a few words naming it
     */
    void run(Scenario s, String label) {
        submit(new Request(s, Purpose.PLAY, System.nanoTime(), label));
    }

    /**
     * Computes a run and shows it whole at once.
     *
     * @param s the scenario
     * @param label a few words naming it
     * @param changedAtNanos when the user changed it (for the replot clock)
     */
    void replot(Scenario s, String label, long changedAtNanos) {
        submit(new Request(s, Purpose.REPLOT, changedAtNanos, label));
    }

    private void submit(Request r) {
        panels.status().busy(true);
        engine.submit(r);
    }

    private void show(Request request, RunResult run, long computeNanos) {
        panels.status().busy(engine.busy());
        lastEngineMs = computeNanos / 1e6;
        result = run;
        ensureCharts(run);
        playback = new Playback(run.trace(), run.events(), speed.simSecondsPerSecond());
        if (request.purpose() == Purpose.PLAY) {
            describe(request, run);
            SteadyAxes.freeze(charts, run.trace());
            charts.setEvents(List.of());
            panels.events().show(List.of());
            apply(playback.play());
            lastTick = System.nanoTime();
            ticker.start();
            panels.status().say("Playing the run at " + speed.label() + ". Space pauses, End jumps to the end.");
        } else {
            ticker.stop();
            playback.jumpToEnd();
            SteadyAxes.release(charts);
            model.replaceWith(run.trace());
            charts.setEvents(run.events());
            clock.expect(request.changedAtNanos(), computeNanos, panels.charts().chartCount());
            // the charts draw first; the panels beside them follow in the next event
            SwingUtilities.invokeLater(() -> {
                if (result == run) {
                    describe(request, run);
                    panels.events().show(run.events());
                }
            });
            panels.status().say("Recomputed: " + request.label());
        }
        showHead();
        showTiming(null);
        stateChanged.run();
        chartsChanged.run();
    }

    /** Shows a run's summary, cautions and place in the comparison. */
    private void describe(Request request, RunResult run) {
        panels.comparison().setCurrent(request.label(), run);
        panels.summary().show(request.label(), run);
        CautionList cautions = CautionList.of(run.summary().warnings());
        panels.cautions().show(cautions);
        panels.strip().show(cautions);
    }

    /** Puts the run's layout, span and gap on the charts, making new charts when the species differ. */
    private void ensureCharts(RunResult r) {
        double span = RunChartModel.plannedSpanOf(r);
        TimeScale scale = TimeScale.forSpan(Math.max(span, reference == null ? 0 : reference.run().summary().durationS()));
        double gap = r.scenario().cell().gapM();
        List<String> anolyte = RunChartModel.anolyteSpeciesOf(r);
        if (model == null || !model.speciesNames().equals(r.speciesNames())
                || !model.metalSymbols().equals(r.metalSymbols()) || !model.anolyteSpecies().equals(anolyte)
                || model.timeScale() != scale) {
            model = new RunChartModel(scale, r.speciesNames(), r.metalSymbols(), anolyte);
            charts = RunCharts.live(model, gap, span, ChartStyle.of(dark));
            panels.charts().setCharts(charts);
            if (reference != null) {
                charts.setReference(reference.run(), reference.name());
            }
            return;
        }
        if (charts.gapM() != gap) {
            charts.setGap(gap);
        }
        double want = Math.max(span, reference == null ? 0 : reference.run().summary().durationS());
        if (charts.spanS() != want) {
            charts.setTimeSpan(want);
        }
    }

    private void tick() {
        if (playback == null) {
            ticker.stop();
            return;
        }
        long now = System.nanoTime();
        double dt = Math.min(MAX_FRAME_S, (now - lastTick) / 1e9);
        lastTick = now;
        apply(playback.advance(dt));
        if (playback.state() != Playback.State.PLAYING) {
            ticker.stop();
            panels.status().say("The run has played to its end. Drag the time slider to look back; Space plays it again.");
            stateChanged.run();
        }
    }

    private void apply(Playback.Frame f) {
        if (f.replace()) {
            model.replaceWith(f.points());
            charts.setEvents(f.events());
            panels.events().show(f.events());
        } else {
            if (!f.points().isEmpty()) {
                model.append(f.points());
            }
            if (!f.events().isEmpty()) {
                charts.setEvents(playback.shownEvents());
                panels.events().add(f.events());
            }
        }
        showHead();
    }

    private void showHead() {
        if (playback == null) {
            return;
        }
        panels.playback().show(playback.headS(), playback.endS());
        TracePoint p = playback.current();
        if (p != null) {
            InstantState s = p.state();
            panels.status().readout(String.format(Locale.ROOT, "I %.3g A   U %.3g V   efficiency %.0f %%   %.1f C",
                    s.currentA(), s.cellVoltageV(), 100 * s.targetEfficiency(), s.temperatureK() - 273.15));
        }
    }

    /** Pauses, or resumes (from the end: plays again). */
    void togglePause() {
        if (playback == null) {
            return;
        }
        if (playback.state() == Playback.State.PLAYING) {
            playback.pause();
            ticker.stop();
            panels.status().say("Paused at " + org.cellwright.sim.RunClock.format(playback.headS()) + ".");
        } else {
            apply(playback.play());
            lastTick = System.nanoTime();
            ticker.start();
            panels.status().say("Playing at " + speed.label() + ".");
        }
        stateChanged.run();
    }

    /** Shows the whole run at once. */
    void jumpToEnd() {
        if (playback != null) {
            ticker.stop();
            apply(playback.jumpToEnd());
            panels.status().say(playback.shownText());
            stateChanged.run();
        }
    }

    /** @param timeS puts the play head there (s) */
    void scrubTo(double timeS) {
        if (playback != null) {
            apply(playback.scrubTo(timeS));
            panels.status().say(playback.shownText());
            lastTick = System.nanoTime();
            stateChanged.run();
        }
    }

    /** @param s the playback speed */
    void setSpeed(PlaybackSpeed s) {
        speed = s;
        if (playback != null) {
            playback.setSpeed(s.simSecondsPerSecond());
        }
    }

    /** @param darkLook true for the dark chart style */
    void setDark(boolean darkLook) {
        dark = darkLook;
        if (charts != null) {
            charts.setStyle(ChartStyle.of(darkLook));
            chartsChanged.run();
        }
    }

    /**
     * Draws a pinned run dashed under the live curves, or removes it.
     *
     * @param e the pinned run, or null
     */
    void setReference(RunComparison.Entry e) {
        reference = e;
        if (charts == null) {
            return;
        }
        SteadyAxes.release(charts);
        charts.setReference(e == null ? null : e.run(), e == null ? null : e.name());
        if (e == null && result != null) {
            charts.setTimeSpan(RunChartModel.plannedSpanOf(result));
        }
        chartsChanged.run();
    }

    /**
     * @param r told (on the event thread) after the charts were prepared, show a new run, or were restyled,
     *     so that an overlay (the spread bands) can draw itself again or clear
     */
    void onChartsChanged(Runnable r) {
        chartsChanged = r;
    }

    /** A chart has finished drawing (for the replot clock). */
    void chartDrawn() {
        ReplotClock.Latency l = clock.chartDrawn(System.nanoTime());
        if (l != null) {
            showTiming(l);
        }
    }

    private void showTiming(ReplotClock.Latency l) {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "engine %.0f ms", lastEngineMs));
        if (l != null || !clock.history().isEmpty()) {
            ReplotClock.Latency last = l != null ? l : clock.history().get(clock.history().size() - 1);
            sb.append(String.format(Locale.ROOT, "   slider to plot %.0f ms (median %.0f ms)", last.totalMs(),
                    clock.medianMs()));
        }
        panels.status().timing(sb.toString());
    }

    private void stop() {
        ticker.stop();
    }

    /** @return the run shown, or null */
    RunResult result() {
        return result;
    }

    /** @return the playback state, or null before a run */
    Playback.State state() {
        return playback == null ? null : playback.state();
    }

    /** @return the points shown now */
    List<TracePoint> shown() {
        return playback == null ? List.of() : playback.shown();
    }

    /** @return the pinned run drawn as reference, or null */
    RunComparison.Entry reference() {
        return reference;
    }

    /** @return the replot clock */
    ReplotClock clock() {
        return clock;
    }

    /** @return true while the engine computes */
    boolean computing() {
        return engine.busy();
    }

    /** @return true when the charts were made (for tests) */
    RunCharts charts() {
        return charts;
    }
}
