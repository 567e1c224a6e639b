package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicIntegerArray;
import org.junit.jupiter.api.Test;

class WorkersTest {

    @Test
    void everyTaskRunsExactlyOnceWhateverTheThreadCount() {
        for (int threads : new int[] {1, 2, 3, 7}) {
            for (int tasks : new int[] {0, 1, 2, 5, 100}) {
                AtomicIntegerArray runs = new AtomicIntegerArray(tasks);
                new Workers(threads).run(tasks, runs::incrementAndGet);
                for (int t = 0; t < tasks; t++) {
                    assertEquals(1, runs.get(t), threads + " threads, " + tasks + " tasks: task " + t);
                }
            }
        }
    }

    @Test
    void theFirstFailureInTaskOrderIsThrownUnchanged() {
        IllegalArgumentException third = new IllegalArgumentException("task 3");
        IllegalArgumentException thrown = assertThrows(IllegalArgumentException.class,
                () -> new Workers(2).run(50, t -> {
                    if (t == 3) {
                        sleep();   // the other thread fails task 4 first in time
                        throw third;
                    }
                    if (t == 4) {
                        throw new IllegalArgumentException("task 4");
                    }
                }));
        assertSame(third, thrown);
    }

    @Test
    void anOutOfMemoryErrorOfAWorkerEndsTheRunWithThatError() {
        OutOfMemoryError oom = new OutOfMemoryError("Java heap space");
        int before = Thread.activeCount();
        OutOfMemoryError thrown = assertThrows(OutOfMemoryError.class, () -> new Workers(4).run(40, t -> {
            if (!Thread.currentThread().getName().startsWith("tetrapod-worker")) {
                sleep();   // the caller's own thread: the error must come from a started one
                return;
            }
            throw oom;
        }));
        assertSame(oom, thrown);
        assertTrue(Thread.activeCount() <= before + 1, "the run's threads have ended");
    }

    private static void sleep() {
        try {
            Thread.sleep(100);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
