package tetrapod.io;

import java.time.Instant;
import java.util.Optional;

/** Whether the process that left a lock or a temporary file is still running. */
final class Processes {

    private Processes() { }

    static long currentPid() {
        return ProcessHandle.current().pid();
    }

    /** The start of the current process in ms since the epoch (0 when the system does not say). */
    static long currentStart() {
        return start(ProcessHandle.current());
    }

    /** Whether process {@code pid} runs; with {@code startMillis} > 0 also that it is the same process (pid reuse). */
    static boolean isAlive(long pid, long startMillis) {
        Optional<ProcessHandle> handle = ProcessHandle.of(pid);
        if (handle.isEmpty() || !handle.get().isAlive()) {
            return false;
        }
        long start = start(handle.get());
        return startMillis <= 0 || start <= 0 || Math.abs(start - startMillis) < 2000;
    }

    private static long start(ProcessHandle handle) {
        return handle.info().startInstant().map(Instant::toEpochMilli).orElse(0L);
    }
}
