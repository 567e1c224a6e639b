package tetrapod.common;

/** Waiting for threads that write into the caller's data or folders. */
public final class Threads {

    private Threads() { }

    /**
     * Waits for {@code thread} to end even when interrupted (it may still be writing what the caller
     * is about to read, move or delete); an interrupt met on the way is kept for the caller.
     */
    public static void joinUninterruptibly(Thread thread) {
        boolean interrupted = false;
        while (true) {
            try {
                thread.join();
                break;
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }
}
