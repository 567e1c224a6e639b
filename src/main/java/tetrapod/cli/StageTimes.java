package tetrapod.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import tetrapod.common.ProgressListener;

/**
 * Wall time of each stage of a run for {@code --timings}, from the progress the stages report: a
 * stage lasts from the end of the one before it (or the start) to its own last report.
 */
final class StageTimes implements ProgressListener {

    private final Map<String, Long> lastReport = new LinkedHashMap<>();
    private final long start = System.nanoTime();

    @Override
    public void progress(String task, long done, long total) {
        lastReport.put(task, System.nanoTime());
    }

    /** Marks the end of a stage that reports no progress of its own. */
    void end(String stage) {
        lastReport.put(stage, System.nanoTime());
    }

    void print(PrintWriter out) {
        int width = lastReport.keySet().stream().mapToInt(String::length).reduce(22, Math::max);
        String line = "  %-" + width + "s %8.3f s%n";
        long previous = start;
        for (Map.Entry<String, Long> e : lastReport.entrySet()) {
            out.printf(Locale.ROOT, line, e.getKey(), (e.getValue() - previous) / 1e9);
            previous = e.getValue();
        }
        out.printf(Locale.ROOT, line, "total", (previous - start) / 1e9);
    }

    /** A listener that tells both {@code a} and {@code b}. */
    static ProgressListener both(ProgressListener a, ProgressListener b) {
        return (task, done, total) -> {
            a.progress(task, done, total);
            b.progress(task, done, total);
        };
    }
}
