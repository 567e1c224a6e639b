package tetrapod.common;

import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;

/**
 * Work started on a thread of its own beside the caller's, waited for by joining that thread (which
 * ends whatever the work throws, an OutOfMemoryError included), its result or failure then taken
 * as if the caller had done the work itself.
 */
public final class SideTask<T> {

    private final FutureTask<T> task;
    private final Thread thread;

    private SideTask(String name, Callable<T> work) {
        this.task = new FutureTask<>(work);
        this.thread = new Thread(task, name);
        thread.setDaemon(true);
    }

    /** Starts {@code work} now on a daemon thread named {@code name}. */
    public static <T> SideTask<T> start(String name, Callable<T> work) {
        SideTask<T> side = new SideTask<>(name, work);
        side.thread.start();
        return side;
    }

    /**
     * Waits for the work to end, without taking its outcome (for the way out of a failure elsewhere),
     * and without giving up when interrupted: the work may be writing files the caller is about to
     * move or delete. The interrupt is kept for the caller.
     */
    public void await() {
        Threads.joinUninterruptibly(thread);
    }

    /** Waits for the work and returns what it returned, or throws what it threw, unwrapped. */
    public T result() throws Exception {
        await();
        try {
            return task.get();
        } catch (ExecutionException e) {
            if (e.getCause() instanceof Exception cause) {
                throw cause;
            }
            if (e.getCause() instanceof Error error) {
                throw error;
            }
            throw e;
        }
    }

    /** As {@link #result}, for work that throws no checked exception. */
    public T resultUnchecked() {
        try {
            return result();
        } catch (RuntimeException e) {
            throw e;
        } catch (Exception e) {
            throw new IllegalStateException(thread.getName() + ": " + e.getMessage(), e);
        }
    }
}
