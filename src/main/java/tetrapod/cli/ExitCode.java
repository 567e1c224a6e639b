package tetrapod.cli;

/**
 * The process exit codes; README.md and the help of the {@code tetrapod} command list the same
 * ones. Every way a run can end maps to one of them ({@link Failures}).
 */
public final class ExitCode {
    public static final int DONE = 0;
    /** Something is overstressed and --strict was given. */
    public static final int OVERSTRESS = 1;
    /** Sizing found no allowed section for some group (or no passing design within the iteration limit). */
    public static final int INFEASIBLE = 1;
    public static final int BAD_INPUT = 2;
    public static final int UNSTABLE = 3;
    /** A fault in Tetrapod itself: please report it. */
    public static final int INTERNAL = 4;
    /** An output could not be written (or its folder cannot be used): the path and the reason are printed. */
    public static final int OUTPUT_FAILED = 5;
    /**
     * The machine lacks what the command needs and the input is not at fault: no display for
     * {@code view}.
     */
    public static final int BAD_ENVIRONMENT = 6;
    /** The run needed more memory (or stack) than Java was given. */
    public static final int OUT_OF_MEMORY = 7;

    /** The lines the help of the {@code tetrapod} command shows. */
    static final String HELP = "Exit codes: 0 done (also when something is overstressed: the summary says so), "
            + "1 overstressed with --strict (size: no passing design), 2 bad input, 3 unstable structure, "
            + "4 internal error (please report it), 5 an output cannot be written (path and reason printed), "
            + "6 bad environment (view without a display), "
            + "7 out of memory (give Java more with TETRAPOD_JAVA_OPTS=-Xmx..., or make the model smaller).";

    private ExitCode() { }
}
