package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.concurrent.atomic.AtomicInteger;

import javax.swing.SwingUtilities;

import org.junit.jupiter.api.Test;

class DebouncerTest {

    @Test
    void aBurstRunsTheActionOnceAfterTheQuiet() throws Exception {
        AtomicInteger runs = new AtomicInteger();
        Debouncer[] d = new Debouncer[1];
        SwingUtilities.invokeAndWait(() -> d[0] = new Debouncer(150, runs::incrementAndGet));
        for (int i = 0; i < 6; i++) {
            SwingUtilities.invokeAndWait(d[0]::trigger);
            Thread.sleep(20);
        }
        // 6 calls 20 ms apart, each well inside the 150 ms quiet time: nothing has run yet
        assertEquals(0, runs.get());
        Thread.sleep(600);
        assertEquals(1, runs.get());
        SwingUtilities.invokeAndWait(() -> assertFalse(d[0].pending()));
    }

    @Test
    void flushRunsAPendingActionNowAndCancelDropsIt() throws Exception {
        AtomicInteger runs = new AtomicInteger();
        Debouncer[] d = new Debouncer[1];
        SwingUtilities.invokeAndWait(() -> {
            d[0] = new Debouncer(10_000, runs::incrementAndGet);
            d[0].flush();
            assertEquals(0, runs.get(), "nothing pending, nothing to flush");
            d[0].trigger();
            d[0].flush();
            assertEquals(1, runs.get());
            d[0].trigger();
            d[0].cancel();
        });
        Thread.sleep(50);
        assertEquals(1, runs.get());
    }
}
