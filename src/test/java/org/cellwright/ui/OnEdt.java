package org.cellwright.ui;

import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;

import javax.swing.SwingUtilities;

/**
 * What the window tests do on the event thread: read or change the window there and wait, politely, until
 * something the window does off the event thread has happened.
 */
final class OnEdt {

    /** A condition polled while waiting. */
    interface Check {
        boolean ok() throws Exception;
    }

    private OnEdt() {
    }

    /**
     * Runs {@code c} on the event thread and returns its result; its exception is thrown here.
     *
     * @param c what to do
     * @param <T> the result's type
     * @return what {@code c} returned
     * @throws Exception what {@code c} threw
     */
    static <T> T edt(Callable<T> c) throws Exception {
        AtomicReference<T> out = new AtomicReference<>();
        AtomicReference<Exception> err = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            try {
                out.set(c.call());
            } catch (Exception e) {
                err.set(e);
            }
        });
        if (err.get() != null) {
            throw err.get();
        }
        return out.get();
    }

    /**
     * Polls {@code check} every 20 ms until it holds.
     *
     * @param what what is awaited, for the message
     * @param seconds how long at most (s)
     * @param check the condition
     * @return the time it took (s)
     * @throws AssertionError when it does not hold in time
     * @throws Exception what the check threw
     */
    static double await(String what, int seconds, Check check) throws Exception {
        long t0 = System.nanoTime();
        long end = t0 + seconds * 1_000_000_000L;
        while (System.nanoTime() < end) {
            if (check.ok()) {
                return (System.nanoTime() - t0) / 1e9;
            }
            Thread.sleep(20);
        }
        throw new AssertionError("timed out waiting until " + what + " (" + seconds + " s)");
    }
}
