package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;

import javax.swing.SwingUtilities;

import org.junit.jupiter.api.Test;

/** Latest request wins: requests made while the engine computes replace each other; results come on the EDT. */
class RecomputeQueueTest {

    @Test
    void onlyTheFirstAndTheLatestOfABurstAreComputed() throws Exception {
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch allDone = new CountDownLatch(2);
        List<Integer> computed = new CopyOnWriteArrayList<>();
        List<Integer> delivered = new CopyOnWriteArrayList<>();
        List<Boolean> onEdt = new CopyOnWriteArrayList<>();
        AtomicReference<RecomputeQueue<Integer, Integer>> q = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> q.set(new RecomputeQueue<>(i -> {
            computed.add(i);
            try {
                release.await(5, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return i * 10;
        }, new RecomputeQueue.Sink<>() {
            @Override
            public void done(Integer request, Integer result, long nanos) {
                delivered.add(result);
                onEdt.add(SwingUtilities.isEventDispatchThread());
                allDone.countDown();
            }

            @Override
            public void failed(Integer request, Throwable failure) {
                throw new AssertionError(failure);
            }
        })));
        SwingUtilities.invokeAndWait(() -> {
            for (int i = 1; i <= 5; i++) {
                q.get().submit(i);
            }
            assertTrue(q.get().busy());
        });
        release.countDown();
        assertTrue(allDone.await(10, TimeUnit.SECONDS), "both computations delivered");
        Thread.sleep(100);
        assertEquals(List.of(1, 5), computed, "2, 3 and 4 were replaced before they ran");
        assertEquals(List.of(10, 50), delivered);
        assertEquals(List.of(true, true), onEdt);
        SwingUtilities.invokeAndWait(() -> {
            assertEquals(3, q.get().dropped());
            assertEquals(2, q.get().started());
        });
    }

    @Test
    void aFailureIsDeliveredAndTheQueueGoesOn() throws Exception {
        CountDownLatch done = new CountDownLatch(2);
        List<String> seen = new CopyOnWriteArrayList<>();
        SwingUtilities.invokeAndWait(() -> {
            RecomputeQueue<String, String> q = new RecomputeQueue<>(s -> {
                if (s.equals("bad")) {
                    throw new IllegalArgumentException("cannot run " + s);
                }
                return s.toUpperCase(java.util.Locale.ROOT);
            }, new RecomputeQueue.Sink<>() {
                @Override
                public void done(String request, String result, long nanos) {
                    seen.add(result);
                    done.countDown();
                }

                @Override
                public void failed(String request, Throwable failure) {
                    seen.add(failure.getMessage());
                    done.countDown();
                }
            });
            q.submit("bad");
            q.submit("good");
        });
        assertTrue(done.await(10, TimeUnit.SECONDS));
        assertEquals(List.of("cannot run bad", "GOOD"), seen);
    }
}
