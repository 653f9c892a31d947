package org.cellwright.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.cellwright.cell.Scenario;
import org.cellwright.sim.RunResult;

/**
 * A parameter sweep: runs the scenario at every point of a grid of one or two varied keys, in parallel, and
 * keeps each point's summary.
 *
 * <p>Use from the window: build it with the axes and a {@link PointScenarios} that sets the values into the
 * base scenario, call {@link #run} on a worker thread (not the event thread) with a progress callback that
 * hands the numbers to the event thread, and a {@link Cancellation} that the Cancel button sets. A point
 * whose values make the scenario invalid, or on which the engine fails, is kept with its reason and does not
 * stop the sweep. Each point keeps its scenario, so a click on a heat-map cell can run it again with its
 * time series.
 */
public final class Sweep {

    /** Most points a sweep accepts: about a minute of runs on two cores at 15 ms each (our own limit). */
    public static final int MAX_POINTS = 10_000;

    private final List<SweepAxis> axes;
    private final PointScenarios scenarios;
    private final ScenarioRunner runner;

    /**
     * @param axes one or two varied keys
     * @param scenarios makes the scenario of each point
     * @param runner runs one scenario (thread-safe)
     */
    public Sweep(List<SweepAxis> axes, PointScenarios scenarios, ScenarioRunner runner) {
        this.axes = List.copyOf(axes);
        this.scenarios = Objects.requireNonNull(scenarios, "scenarios");
        this.runner = Objects.requireNonNull(runner, "runner");
        if (this.axes.isEmpty() || this.axes.size() > 2) {
            throw new IllegalArgumentException("a sweep varies one or two keys, got " + this.axes.size());
        }
        if (this.axes.size() == 2 && this.axes.get(0).key().equals(this.axes.get(1).key())) {
            throw new IllegalArgumentException("the two varied keys are the same: " + this.axes.get(0).key());
        }
        long n = pointCount(this.axes);
        if (n > MAX_POINTS) {
            throw new IllegalArgumentException("the grid has " + n + " points; at most " + MAX_POINTS
                    + " are accepted");
        }
    }

    /** @return the axes */
    public List<SweepAxis> axes() {
        return axes;
    }

    /** @return every grid point, row-major (the first axis varies slowest) */
    public List<GridPoint> grid() {
        int n = (int) pointCount(axes);
        List<GridPoint> out = new ArrayList<>(n);
        for (int index = 0; index < n; index++) {
            int[] idx = new int[axes.size()];
            int rest = index;
            for (int a = axes.size() - 1; a >= 0; a--) {
                idx[a] = rest % axes.get(a).size();
                rest /= axes.get(a).size();
            }
            List<AxisValue> values = new ArrayList<>(axes.size());
            for (int a = 0; a < axes.size(); a++) {
                values.add(axes.get(a).values().get(idx[a]));
            }
            out.add(new GridPoint(index, idx, values));
        }
        return out;
    }

    /**
     * Runs every point.
     *
     * @param threads runs in parallel (the command line uses every core)
     * @param progress told after each point (from worker threads)
     * @param cancel set it to stop; points not yet started are then left out
     * @return every point's outcome, in grid order
     */
    public SweepResult run(int threads, StudyProgress progress, Cancellation cancel) {
        long start = System.nanoTime();
        List<GridPoint> grid = grid();
        List<SweepPoint> points = ParallelRuns.run(grid.size(), threads, i -> runPoint(grid.get(i)),
                i -> new SweepPoint(grid.get(i), SweepPoint.Status.NOT_RUN, null, null, "not run (cancelled)"),
                progress, cancel);
        return new SweepResult(axes, points, cancel.isCancelled(), (System.nanoTime() - start) / 1e9,
                Math.max(1, Math.min(threads, grid.size())));
    }

    /** @return the default parallelism: every core available */
    public static int allCores() {
        return ParallelRuns.allCores();
    }

    private SweepPoint runPoint(GridPoint p) {
        Scenario sc;
        try {
            sc = scenarios.scenarioAt(p);
        } catch (IllegalArgumentException e) {
            return new SweepPoint(p, SweepPoint.Status.INVALID, null, null, message(e));
        }
        try {
            RunResult r = runner.run(sc);
            return new SweepPoint(p, SweepPoint.Status.OK, sc, r.summary(), null);
        } catch (IllegalArgumentException e) {
            return new SweepPoint(p, SweepPoint.Status.INVALID, sc, null, message(e));
        } catch (RuntimeException e) {
            return new SweepPoint(p, SweepPoint.Status.FAILED, sc, null, "internal failure: " + message(e));
        }
    }

    private static String message(RuntimeException e) {
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return m.replaceAll("\\s*\\R\\s*", "; ");
    }

    private static long pointCount(List<SweepAxis> axes) {
        long n = 1;
        for (SweepAxis a : axes) {
            n *= a.size();
        }
        return n;
    }
}
