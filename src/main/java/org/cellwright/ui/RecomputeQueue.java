package org.cellwright.ui;

import java.util.function.Function;

import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;

/**
 * Runs computations off the event thread one at a time, latest request wins: a request made while one is
 * computing waits, and a newer request replaces a waiting one, so a dragged slider never queues up stale
 * runs and the result shown always catches up with the slider within two run times. Each computation runs
 * in a {@link SwingWorker}; results and failures are delivered on the event thread.
 *
 * <p>Call {@link #submit} on the event thread only (the queue's state is confined to it).
 *
 * @param <I> the request
 * @param <O> the result
 */
final class RecomputeQueue<I, O> {

    /** Receives outcomes on the event thread. */
    interface Sink<I, O> {
        /**
         * @param request the request
         * @param result its result
         * @param computeNanos how long the computation took (ns)
         */
        void done(I request, O result, long computeNanos);

        /**
         * @param request the request
         * @param failure what the computation threw
         */
        void failed(I request, Throwable failure);
    }

    private final Function<I, O> compute;
    private final Sink<I, O> sink;
    private I waiting;
    private boolean busy;
    private int started;
    private int dropped;

    /**
     * @param compute the computation (runs on a worker thread; must not touch Swing)
     * @param sink where outcomes go (on the event thread)
     */
    RecomputeQueue(Function<I, O> compute, Sink<I, O> sink) {
        this.compute = compute;
        this.sink = sink;
    }

    /**
     * Computes {@code request} now when idle, else after the running computation (replacing any request
     * still waiting).
     *
     * @param request the request
     */
    void submit(I request) {
        if (busy) {
            if (waiting != null) {
                dropped++;
            }
            waiting = request;
            return;
        }
        start(request);
    }

    /** @return true while a computation runs */
    boolean busy() {
        return busy;
    }

    /** @return how many computations were started */
    int started() {
        return started;
    }

    /** @return how many waiting requests were replaced by newer ones before they ran */
    int dropped() {
        return dropped;
    }

    private void start(I request) {
        busy = true;
        started++;
        new SwingWorker<Void, Void>() {
            @Override
            protected Void doInBackground() {
                long t0 = System.nanoTime();
                O out = null;
                Throwable failure = null;
                try {
                    out = compute.apply(request);
                } catch (RuntimeException | Error e) {
                    failure = e;
                }
                long nanos = System.nanoTime() - t0;
                O result = out;
                Throwable failed = failure;
                // Straight to the event queue: SwingWorker.done() would wait for its 33 ms coalescing timer.
                SwingUtilities.invokeLater(() -> finish(request, result, failed, nanos));
                return null;
            }
        }.execute();
    }

    private void finish(I request, O result, Throwable failure, long nanos) {
        busy = false;
        try {
            if (failure == null) {
                sink.done(request, result, nanos);
            } else {
                sink.failed(request, failure);
            }
        } finally {
            if (!busy && waiting != null) {
                I next = waiting;
                waiting = null;
                start(next);
            }
        }
    }
}
