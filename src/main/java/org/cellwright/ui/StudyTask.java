package org.cellwright.ui;

import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;

import javax.swing.JProgressBar;
import javax.swing.SwingWorker;

import org.cellwright.study.Cancellation;
import org.cellwright.study.StudyProgress;

/**
 * A study (sweep, plan, spread) run on a worker thread: its progress ("37 of 100 runs") goes to a progress
 * bar on the event thread, Cancel sets the study's {@link Cancellation}, and the outcome or the failure is
 * handed to the event thread.
 *
 * @param <T> what the study gives
 */
final class StudyTask<T> extends SwingWorker<T, int[]> {

    /** The study's work, run on the worker thread. */
    @FunctionalInterface
    interface Work<T> {
        /**
         * @param progress hand progress here (from any thread)
         * @param cancel the study's flag
         * @return the outcome
         */
        T run(StudyProgress progress, Cancellation cancel);
    }

    private final Work<T> work;
    private final JProgressBar bar;
    private final Consumer<T> done;
    private final Consumer<Throwable> failed;
    private final Cancellation cancel = Cancellation.none();
    private long startNanos;
    private double elapsedS = Double.NaN;

    /**
     * @param work the study
     * @param bar where the progress shows (may be null)
     * @param done told the outcome, on the event thread
     * @param failed told the failure on the event thread: the study's own exception (an
     *     {@link IllegalArgumentException} for bad input), or a {@link CancellationException}
     */
    StudyTask(Work<T> work, JProgressBar bar, Consumer<T> done, Consumer<Throwable> failed) {
        this.work = work;
        this.bar = bar;
        this.done = done;
        this.failed = failed;
    }

    /** Starts the study (event thread). */
    void start() {
        startNanos = System.nanoTime();
        if (bar != null) {
            bar.setIndeterminate(true);
            bar.setStringPainted(true);
            bar.setString("starting...");
            bar.setVisible(true);
        }
        execute();
    }

    /** Asks the study to stop; it ends within one engine run per worker. */
    void stop() {
        cancel.cancel();
    }

    /** @return true once Cancel was pressed */
    boolean stopping() {
        return cancel.isCancelled();
    }

    /** @return wall-clock time from start to the outcome (s), NaN while running */
    double elapsedS() {
        return elapsedS;
    }

    @Override
    protected T doInBackground() {
        return work.run((d, t) -> publish(new int[] {d, t}), cancel);
    }

    @Override
    protected void process(List<int[]> chunks) {
        if (bar == null) {
            return;
        }
        int done = 0;
        int total = 1;
        for (int[] c : chunks) {
            if (c[0] >= done) {
                done = c[0];
                total = Math.max(c[1], c[0]);
            }
        }
        bar.setIndeterminate(false);
        bar.setMaximum(total);
        bar.setValue(done);
        bar.setString(done + " of " + total + " runs");
    }

    @Override
    protected void done() {
        elapsedS = (System.nanoTime() - startNanos) / 1e9;
        if (bar != null) {
            bar.setIndeterminate(false);
            bar.setVisible(false);
        }
        try {
            done.accept(get());
        } catch (ExecutionException e) {
            failed.accept(e.getCause() == null ? e : e.getCause());
        } catch (CancellationException e) {
            failed.accept(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            failed.accept(new CancellationException("interrupted"));
        }
    }
}
