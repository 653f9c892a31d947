package org.cellwright.study;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.IntFunction;

/**
 * Runs many independent engine runs on a fixed pool of worker threads and gives the results back in task
 * order. Each task builds its own simulation (the engine is not thread-safe per instance); the chemistry
 * library is immutable and shared. Workers check the cancellation flag before each task; a task not started
 * when the study is cancelled yields the caller's "not run" value.
 */
final class ParallelRuns {

    private static final AtomicInteger POOLS = new AtomicInteger();

    private ParallelRuns() {
    }

    /** @return the default parallelism: every core the JVM may use */
    static int allCores() {
        return Runtime.getRuntime().availableProcessors();
    }

    /**
     * @param count number of tasks
     * @param threads worker threads (at least 1; more than {@code count} are not started)
     * @param task computes task i; must not throw for bad input (return a failed result instead)
     * @param notRun the result of a task skipped because of cancellation
     * @param progress told after each task
     * @param cancel the study's cancellation flag; set here too when the calling thread is interrupted
     * @param <T> the result type
     * @return the results in task order
     */
    static <T> List<T> run(int count, int threads, IntFunction<T> task, IntFunction<T> notRun,
                           StudyProgress progress, Cancellation cancel) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, got " + threads);
        }
        int n = Math.max(1, Math.min(threads, count));
        int pool = POOLS.incrementAndGet();
        AtomicInteger names = new AtomicInteger();
        ThreadFactory factory = r -> {
            Thread t = new Thread(r, "cellwright-study-" + pool + "-" + names.incrementAndGet());
            t.setDaemon(true);
            return t;
        };
        ExecutorService executor = Executors.newFixedThreadPool(n, factory);
        AtomicInteger done = new AtomicInteger();
        List<Future<T>> futures = new ArrayList<>(count);
        try {
            for (int i = 0; i < count; i++) {
                int index = i;
                futures.add(executor.submit(() -> {
                    if (cancel.isCancelled()) {
                        return notRun.apply(index);
                    }
                    T result = task.apply(index);
                    progress.progress(done.incrementAndGet(), count);
                    return result;
                }));
            }
            List<T> results = new ArrayList<>(count);
            boolean interrupted = false;
            for (int i = 0; i < count; i++) {
                Future<T> f = futures.get(i);
                if (interrupted && !f.isDone()) {
                    results.add(notRun.apply(i));
                    continue;
                }
                try {
                    results.add(f.get());
                } catch (InterruptedException e) {
                    interrupted = true;
                    cancel.cancel();
                    executor.shutdownNow();
                    results.add(f.isDone() && !f.isCancelled() ? value(f) : notRun.apply(i));
                } catch (java.util.concurrent.CancellationException e) {
                    results.add(notRun.apply(i));
                } catch (ExecutionException e) {
                    throw unwrap(e);
                }
            }
            if (interrupted) {
                Thread.currentThread().interrupt();
            }
            return results;
        } finally {
            executor.shutdownNow();
        }
    }

    /** The value of a finished task (no waiting, so no interrupt can reach it). */
    private static <T> T value(Future<T> f) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("a finished task cannot be interrupted", e);
        } catch (ExecutionException e) {
            throw unwrap(e);
        }
    }

    private static RuntimeException unwrap(ExecutionException e) {
        Throwable cause = e.getCause();
        if (cause instanceof RuntimeException r) {
            return r;
        }
        if (cause instanceof Error err) {
            throw err;
        }
        return new IllegalStateException(cause);
    }
}
