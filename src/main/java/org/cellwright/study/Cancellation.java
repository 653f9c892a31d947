package org.cellwright.study;

import java.util.concurrent.CancellationException;

/**
 * A flag that asks a running study to stop: the window's Cancel button sets it from the event thread, the
 * study's workers look at it before each engine run (a run itself takes milliseconds, so a study stops
 * within one run per worker). An interrupt of the thread that runs the study counts as a cancellation too.
 */
public final class Cancellation {

    private volatile boolean cancelled;

    /** @return a fresh flag, not set */
    public static Cancellation none() {
        return new Cancellation();
    }

    /** Asks the study to stop. Safe from any thread; a second call does nothing. */
    public void cancel() {
        cancelled = true;
    }

    /** @return true once {@link #cancel()} was called */
    public boolean isCancelled() {
        return cancelled;
    }

    /**
     * Throws when the study should stop: the flag is set or the current thread was interrupted.
     *
     * @throws CancellationException then
     */
    public void check() {
        if (cancelled || Thread.currentThread().isInterrupted()) {
            throw new CancellationException("the study was cancelled");
        }
    }
}
