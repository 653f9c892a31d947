package org.cellwright.cli;

import java.io.PrintWriter;

import org.cellwright.study.StudyProgress;

/**
 * A study's progress on standard error, one line rewritten in place ("sweep: 120/400 runs"), only when
 * standard error is a terminal: in a log or a pipe a carriage return cannot move the cursor and would leave
 * one line per update (ecosystem pitfall P18). Updates at most every 100 ms; {@link #finish()} clears the
 * line. Thread-safe: study workers call it from several threads.
 */
final class ProgressLine implements StudyProgress {

    private static final long MIN_INTERVAL_NS = 100_000_000L;

    private final PrintWriter err;
    private final String label;
    private final boolean terminal;
    private long lastNs;
    private int width;

    /**
     * @param err standard error
     * @param label what is running ("sweep")
     * @param terminal true when standard error is a terminal ({@link #onTerminal()})
     */
    ProgressLine(PrintWriter err, String label, boolean terminal) {
        this.err = err;
        this.label = label;
        this.terminal = terminal;
    }

    /** @return true when the JVM has a console, i.e. standard input and output are a terminal */
    static boolean onTerminal() {
        return System.console() != null;
    }

    @Override
    public synchronized void progress(int done, int total) {
        if (!terminal) {
            return;
        }
        long now = System.nanoTime();
        if (done < total && now - lastNs < MIN_INTERVAL_NS) {
            return;
        }
        lastNs = now;
        String text = label + ": " + done + "/" + total + " runs";
        width = Math.max(width, text.length());
        err.print("\r" + text);
        err.flush();
    }

    /** Clears the progress line (when one was drawn). */
    synchronized void finish() {
        if (terminal && width > 0) {
            err.print("\r" + " ".repeat(width) + "\r");
            err.flush();
        }
    }
}
