package tetrapod.testing;

/** A process id no running process has: for stale locks and leftovers in tests. */
public final class EndedProcess {

    private EndedProcess() { }

    /** The id of a process that has ended. */
    public static long pid() throws Exception {
        Process p = new ProcessBuilder("true").start();
        p.waitFor();
        return p.pid();
    }
}
