package tetrapod.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/** Wall time of each stage of a run, for {@code --timings}. */
final class Stopwatch {

    private final Map<String, Long> nanos = new LinkedHashMap<>();
    private long last = System.nanoTime();

    /** Ends the stage {@code name}, started when the previous one ended. */
    void lap(String name) {
        long now = System.nanoTime();
        nanos.merge(name, now - last, Long::sum);
        last = now;
    }

    void print(PrintWriter out) {
        nanos.forEach((name, ns) -> out.printf(Locale.ROOT, "  %-12s %9.3f s%n", name, ns / 1e9));
    }
}
