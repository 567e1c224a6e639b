package tetrapod.common;

/**
 * One thing wrong with an input, located by its JSON path (e.g. {@code segments[2].topWidthX})
 * and, where known, its line in the file (0 when unknown).
 */
public record Problem(String path, int line, String message) {

    public Problem {
        path = path == null || path.isEmpty() ? "$" : path;
    }

    public static Problem at(String path, String message) {
        return new Problem(path, 0, message);
    }

    public Problem withLine(int line) {
        return new Problem(path, line, message);
    }

    /** One line for a person: {@code segments[2].topWidthX: must be > 0 m, was -1.5 (line 14)}. */
    @Override
    public String toString() {
        return path + ": " + message + (line > 0 ? " (line " + line + ")" : "");
    }
}
