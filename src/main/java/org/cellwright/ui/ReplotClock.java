package org.cellwright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Measures how long a slider takes to show its effect: from the slider's change to the moment the last of
 * the charts has finished drawing the recomputed run (the engine's share is noted apart). The window feeds
 * it the change time with the result ({@link #expect}) and each chart's end of drawing ({@link #chartDrawn});
 * a newer result before all charts are drawn replaces the measurement under way.
 */
final class ReplotClock {

    /**
     * One measurement.
     *
     * @param totalMs from the slider's change to the last chart drawn (ms)
     * @param engineMs of which the engine's run (ms)
     */
    record Latency(double totalMs, double engineMs) {
        /** @return e.g. "slider to plot 74 ms (engine 52 ms)" */
        String text() {
            return String.format(Locale.ROOT, "slider to plot %.0f ms (engine %.0f ms)", totalMs, engineMs);
        }
    }

    private final List<Latency> history = new ArrayList<>();
    private long changeNanos = -1;
    private double engineMs;
    private int waitingFor;

    /**
     * A recomputed run has been put into the charts.
     *
     * @param changedAtNanos {@link System#nanoTime()} at the slider change the run answers
     * @param engineNanos how long the engine took (ns)
     * @param charts how many charts must draw it
     */
    void expect(long changedAtNanos, long engineNanos, int charts) {
        changeNanos = changedAtNanos;
        engineMs = engineNanos / 1e6;
        waitingFor = charts;
    }

    /**
     * A chart has finished drawing.
     *
     * @param nowNanos {@link System#nanoTime()} now
     * @return the measurement when this was the last chart awaited, else null
     */
    Latency chartDrawn(long nowNanos) {
        if (changeNanos < 0 || waitingFor <= 0) {
            return null;
        }
        waitingFor--;
        if (waitingFor > 0) {
            return null;
        }
        Latency l = new Latency((nowNanos - changeNanos) / 1e6, engineMs);
        changeNanos = -1;
        history.add(l);
        return l;
    }

    /** @return every measurement so far, oldest first */
    List<Latency> history() {
        return List.copyOf(history);
    }

    /** @return the median total of the measurements so far (ms), NaN when none */
    double medianMs() {
        if (history.isEmpty()) {
            return Double.NaN;
        }
        double[] t = history.stream().mapToDouble(Latency::totalMs).sorted().toArray();
        int n = t.length;
        return n % 2 == 1 ? t[n / 2] : (t[n / 2 - 1] + t[n / 2]) / 2;
    }
}
