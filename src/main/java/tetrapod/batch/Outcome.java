package tetrapod.batch;

import java.io.Serializable;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * How the analysis of one tower × scenario ended: the exit code {@code analyze} would have given
 * (0 done, 2 bad input, 3 unstable, 4 internal error, 5 output failed, 7 out of memory), its
 * one-line message (empty when done), the figures (null unless done) and the report folder
 * relative to the run's folder (null when no report was written). Serializable, so that a Spark
 * executor can send it back to the driver.
 */
public record Outcome(int exitCode, String message, Figures figures, String report) implements Serializable {

    public static Outcome done(Figures figures, String report) {
        return new Outcome(0, "", figures, report);
    }

    public static Outcome failed(int exitCode, String message) {
        return new Outcome(exitCode, message, null, null);
    }

    /** What a one-line message adds for the problems it does not show: " (and 2 more problems)". */
    public static String moreProblems(int others) {
        return others <= 0 ? "" : " (and " + others + " more problem" + (others == 1 ? "" : "s") + ")";
    }

    /** The row's status for people. */
    public String status() {
        return switch (exitCode) {
            case 0 -> figures != null && figures.fails() ? "fails" : "passes";
            case 2 -> "bad input";
            case 3 -> "unstable";
            case 5 -> "output failed";
            case 6 -> "bad environment";
            case 7 -> "out of memory";
            default -> "internal error";
        };
    }

    /**
     * Whether running the same work again gives the same outcome, so that it is kept for a resumed
     * run: an analysis, bad input or an unstable structure; not a fault, a full disk or lack of memory.
     */
    boolean settled() {
        return exitCode == 0 || exitCode == 2 || exitCode == 3;
    }

    Map<String, Object> toMap() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("exitCode", exitCode);
        m.put("message", message);
        m.put("figures", figures == null ? null : figures.toMap());
        m.put("report", report);
        return m;
    }

    static Outcome fromMap(Map<?, ?> m) {
        Object f = m.get("figures");
        return new Outcome(((Number) m.get("exitCode")).intValue(), (String) m.get("message"),
                f instanceof Map<?, ?> fm ? Figures.fromMap(fm) : null, (String) m.get("report"));
    }
}
