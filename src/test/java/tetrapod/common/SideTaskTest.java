package tetrapod.common;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.concurrent.atomic.AtomicBoolean;
import org.junit.jupiter.api.Test;

class SideTaskTest {

    @Test
    void theResultAndTheFailuresComeBackAsTheWorkGaveThem() {
        assertEquals("drawn", assertDoesNotThrowResult(SideTask.start("t", () -> "drawn")));
        IOException io = new IOException("disk full");
        assertSame(io, assertThrows(IOException.class, () -> SideTask.start("t", () -> {
            throw io;
        }).result()));
        OutOfMemoryError oom = new OutOfMemoryError("Java heap space");
        assertSame(oom, assertThrows(OutOfMemoryError.class, () -> SideTask.start("t", () -> {
            throw oom;
        }).result()));
    }

    @Test
    void anInterruptedCallerStillWaitsForTheWorkAndKeepsItsInterrupt() {
        AtomicBoolean finished = new AtomicBoolean();
        SideTask<Void> slow = SideTask.start("t", () -> {
            Thread.sleep(300);
            finished.set(true);
            return null;
        });
        Thread.currentThread().interrupt();
        slow.await();
        assertTrue(Thread.interrupted(), "the interrupt is kept (and cleared here)");
        assertTrue(finished.get(), "the work ended before await returned");
    }

    private static <T> T assertDoesNotThrowResult(SideTask<T> task) {
        try {
            return task.result();
        } catch (Exception e) {
            throw new AssertionError(e);
        }
    }
}
