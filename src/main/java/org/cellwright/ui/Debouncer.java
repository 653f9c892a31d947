package org.cellwright.ui;

import javax.swing.Timer;

/**
 * Runs an action once a burst of calls has been quiet for a while: each {@link #trigger()} restarts the
 * wait, so typing in a field checks the whole scenario once, after the last key, not at every key. The
 * action runs on the event thread (a one-shot {@link Timer}).
 */
final class Debouncer {

    private final Timer timer;
    private final Runnable action;
    private int runs;

    /**
     * @param quietMillis how long the calls must pause before the action runs (ms)
     * @param action what to run
     */
    Debouncer(int quietMillis, Runnable action) {
        this.action = action;
        timer = new Timer(quietMillis, e -> fire());
        timer.setRepeats(false);
    }

    /** Starts (or restarts) the wait. */
    void trigger() {
        timer.restart();
    }

    /** Runs the action now if a wait is pending. */
    void flush() {
        if (timer.isRunning()) {
            timer.stop();
            fire();
        }
    }

    private void fire() {
        runs++;
        action.run();
    }

    /** Drops a pending wait. */
    void cancel() {
        timer.stop();
    }

    /** @return true while a wait is pending */
    boolean pending() {
        return timer.isRunning();
    }

    /** @return how many times the action ran */
    int runs() {
        return runs;
    }
}
