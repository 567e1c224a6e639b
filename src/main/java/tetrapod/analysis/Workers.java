package tetrapod.analysis;

import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReferenceArray;
import java.util.function.IntConsumer;
import tetrapod.common.Threads;

/**
 * Runs numbered tasks on a fixed number of threads and waits for all of them: inline on the
 * caller's thread with one thread, else on the caller's thread and threads started for the run,
 * each taking the next task in order. A task that fails makes {@link #run} throw its error
 * unchanged (the first in task order); after a failure no thread takes a new task.
 * <p>
 * The run waits for its threads to end, not for a pool's futures: a worker hit by an
 * OutOfMemoryError, whose report may itself need memory, still ends, where a fork-join pool's
 * task could stay unfinished and the caller wait for ever (seen with a 24 MB heap).
 */
final class Workers {

    private final int threads;

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
        AtomicInteger next = new AtomicInteger();
        AtomicInteger finished = new AtomicInteger();
        AtomicBoolean failed = new AtomicBoolean();
        AtomicReferenceArray<Throwable> failures = new AtomicReferenceArray<>(tasks);
        Runnable work = () -> {
            int t;
            while (!failed.get() && (t = next.getAndIncrement()) < tasks) {
                try {
                    task.accept(t);
                    finished.incrementAndGet();
                } catch (Throwable e) { // recorded without allocating, rethrown by the caller below
                    failures.set(t, e);
                    failed.set(true);
                }
            }
        };
        Thread[] helpers = new Thread[Math.min(threads, tasks) - 1];
        int started = 0;
        try {
            for (; started < helpers.length; started++) {
                helpers[started] = new Thread(work, "tetrapod-worker-" + (started + 1));
                helpers[started].setDaemon(true);
                helpers[started].start();
            }
        } catch (OutOfMemoryError noMoreThreads) {
            // the threads already started and this one take every task
        }
        try {
            work.run();
        } finally {
            for (int i = 0; i < started; i++) {
                Threads.joinUninterruptibly(helpers[i]);   // the tasks write into the caller's arrays
            }
        }
        for (int t = 0; t < tasks; t++) {
            Throwable e = failures.get(t);
            if (e instanceof RuntimeException r) {
                throw r;
            }
            if (e instanceof Error err) {
                throw err;
            }
            if (e != null) {
                throw new IllegalStateException(e);
            }
        }
        if (finished.get() != tasks) {
            throw new IllegalStateException("a worker thread ended with " + (tasks - finished.get())
                    + " of " + tasks + " tasks unfinished");
        }
    }
}
