package tetrapod.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.Future;
import java.util.function.IntConsumer;

/**
 * Runs numbered tasks on a fixed number of threads and waits for all of them: inline on the
 * caller's thread with one thread, else on a pool of its own, made on first use and shut down by
 * {@link #close}. A task that fails makes {@link #run} throw its error unchanged (the first in
 * task order).
 */
final class Workers implements AutoCloseable {

    private final int threads;
    private ForkJoinPool pool;

    /** @param threads at least 1 */
    Workers(int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, was " + threads);
        }
        this.threads = threads;
    }

    int threads() {
        return threads;
    }

    /** Runs {@code task} for 0 … {@code tasks} − 1 and returns when every one has finished. */
    void run(int tasks, IntConsumer task) {
        if (threads == 1 || tasks <= 1) {
            for (int t = 0; t < tasks; t++) {
                task.accept(t);
            }
            return;
        }
        if (pool == null) {
            pool = new ForkJoinPool(threads);
        }
        List<Callable<Void>> calls = new ArrayList<>(tasks);
        for (int t = 0; t < tasks; t++) {
            int number = t;
            calls.add(() -> {
                task.accept(number);
                return null;
            });
        }
        for (Future<Void> f : pool.invokeAll(calls)) {
            try {
                f.get();
            } catch (ExecutionException e) {
                Throwable cause = e.getCause();
                if (cause instanceof RuntimeException r) {
                    throw r;
                }
                if (cause instanceof Error err) {
                    throw err;
                }
                throw new IllegalStateException(cause);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted while waiting for the member checks", e);
            }
        }
    }

    @Override
    public void close() {
        if (pool != null) {
            pool.shutdown();
            pool = null;
        }
    }
}
