package tetrapod.cli;

/** The process exit codes of DESIGN.md. */
public final class ExitCode {
    public static final int DONE = 0;
    /** Something is overstressed and --strict was given. */
    public static final int OVERSTRESS = 1;
    /** Sizing found no allowed section for some group (or no passing design within the iteration limit). */
    public static final int INFEASIBLE = 1;
    public static final int BAD_INPUT = 2;
    public static final int UNSTABLE = 3;
    public static final int INTERNAL = 4;
    /**
     * The machine lacks what the command needs and the input is not at fault: no display for
     * {@code view}. (5 is left free for the exit codes other sessions define.)
     */
    public static final int BAD_ENVIRONMENT = 6;

    private ExitCode() { }
}
