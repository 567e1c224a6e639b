package tetrapod.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import tetrapod.common.BadInputException;
import tetrapod.common.OutputException;
import tetrapod.common.Problem;
import tetrapod.common.UnstableStructureException;

/**
 * The single exit path for everything a command can throw, errors of the JVM included: each maps
 * to one documented {@link ExitCode} and readable lines (one per problem); a stack trace only with
 * {@code --debug}. Public for the Spark job, which has its own entry point.
 */
public final class Failures {

    private Failures() { }

    /** Prints what went wrong to {@code err} and returns the exit code. */
    public static int report(Throwable thrown, PrintWriter err, boolean debug) {
        Throwable t = known(thrown);
        int code;
        if (t instanceof BadInputException bad) {
            for (Problem p : bad.problems()) {
                err.println("error: " + p);
            }
            code = ExitCode.BAD_INPUT;
        } else if (t instanceof UnstableStructureException unstable) {
            err.println("error: " + unstable.getMessage());
            code = ExitCode.UNSTABLE;
        } else if (t instanceof OutputException output) {
            err.println("error: " + output.getMessage());
            code = ExitCode.OUTPUT_FAILED;
        } else if (t instanceof IOException || t instanceof UncheckedIOException) {
            err.println("error: " + ioMessage(t instanceof UncheckedIOException u ? u.getCause() : (IOException) t));
            code = ExitCode.OUTPUT_FAILED;
        } else if (t instanceof OutOfMemoryError) {
            err.println("error: out of memory: the model is too large for the memory given to Java ("
                    + Runtime.getRuntime().maxMemory() / (1024 * 1024) + " MB); give it more with "
                    + "TETRAPOD_JAVA_OPTS=-Xmx8g (or java -Xmx8g -jar ...), or make the model smaller");
            code = ExitCode.OUT_OF_MEMORY;
        } else if (t instanceof StackOverflowError) {
            err.println("error: out of stack: the model is nested too deeply for the stack given to Java; "
                    + "give it more with TETRAPOD_JAVA_OPTS=-Xss64m, or make the model simpler");
            code = ExitCode.OUT_OF_MEMORY;
        } else {
            err.println("internal error: " + thrown);
            code = ExitCode.INTERNAL;
        }
        if (debug) {
            printStackTrace(thrown, err);
        } else if (code == ExitCode.INTERNAL) {
            err.println("(run again with --debug for the stack trace; please report it)");
        }
        return code;
    }

    /** The first throwable in the cause chain that has a meaning of its own, else {@code thrown}. */
    private static Throwable known(Throwable thrown) {
        for (Throwable t = thrown; t != null; t = t.getCause() == t ? null : t.getCause()) {
            if (t instanceof BadInputException || t instanceof UnstableStructureException || t instanceof OutputException
                    || t instanceof IOException || t instanceof UncheckedIOException || t instanceof VirtualMachineError) {
                return t;
            }
        }
        return thrown;
    }

    /** {@code I/O failure at out/x/results.json: No space left on device}: the path and the reason. */
    static String ioMessage(IOException e) {
        if (e instanceof FileSystemException fs && fs.getFile() != null) {
            String reason = e instanceof AccessDeniedException ? "permission denied"
                    : e instanceof NoSuchFileException ? "no such file or folder"
                    : e instanceof NotDirectoryException ? "not a folder"
                    : fs.getReason() != null ? fs.getReason() : e.getClass().getSimpleName();
            String other = fs.getOtherFile() != null ? " -> " + fs.getOtherFile() : "";
            return "I/O failure at " + fs.getFile() + other + ": " + reason;
        }
        return "I/O failure: " + (e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName());
    }

    /** The stack trace, one escaped line per frame, indented by spaces (tabs would be escaped). */
    private static void printStackTrace(Throwable t, PrintWriter err) {
        StringWriter trace = new StringWriter();
        t.printStackTrace(new PrintWriter(trace));
        trace.toString().lines().forEach(line -> err.println(line.replace("\t", "    ")));
    }
}
