package tetrapod.cli;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import tetrapod.batch.Outcome;

/**
 * Fleet throughput (issue 17): {@code tetrapod batch} over {@link #TOWERS} generated towers (the
 * invented 6 m tower of the batch tests at {@link #TOWERS} different basic wind speeds, so that no
 * two share a hash), base scenario only, with 1 or 2 threads, against the same analyses run one
 * after another in-process (what one batch row does: read, analyse, results document, figures).
 * The batch adds hashing, the work records, the thread pool and the summary files. Per-core
 * throughput: towers / (time × threads).
 */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3)
@Measurement(iterations = 8)
@Fork(value = 1, jvmArgs = {"-Xms1g", "-Xmx3g"})
@State(Scope.Benchmark)
public class BatchBenchmark {

    static final int TOWERS = 16;
    static final String SMALL = """
            { "name": "benchmark tower %d",
              "base": { "widthX": 3.0, "widthY": 3.0 },
              "segments": [ { "height": 6.0, "topWidthX": 2.0, "topWidthY": 2.0, "panels": 2, "bracing": "x",
                  "sections": { "leg": "L100x10", "diagonal": "L60x6", "horizontal": "L60x6" } },
                { "height": 6.0, "topWidthX": 1.5, "topWidthY": 1.5, "panels": 3, "bracing": "x",
                  "sections": { "leg": "L90x8", "diagonal": "L50x5", "horizontal": "L50x5" } } ],
              "loads": { "wind": { "method": "en1991", "basicSpeed": %d.0, "terrain": "II" }, "sweepStep": 10 },
              "checks": { "method": "en1993" } }
            """;

    @Param({"1", "2"})
    public int threads;

    private Path dir;
    private Path towers;
    private List<Path> models;
    private int run;

    @Setup(Level.Trial)
    public void setUp() throws IOException {
        dir = Files.createTempDirectory("tetrapod-batch-bench");
        towers = Files.createDirectories(dir.resolve("towers"));
        models = new ArrayList<>();
        for (int k = 0; k < TOWERS; k++) {
            Path m = towers.resolve(String.format("t%02d.json", k));
            Files.writeString(m, String.format(SMALL, k, 20 + k));
            models.add(m);
        }
    }

    @TearDown(Level.Trial)
    public void tearDown() throws IOException {
        ScratchFolders.delete(dir);
    }

    /** The batch over every tower into a new folder. */
    @Benchmark
    public int batch() {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine(out, err).execute("batch", towers.toString(), "-o",
                dir.resolve("run-" + (run++)).toString(), "--threads", String.valueOf(threads), "--quiet");
        if (code != 0) {
            throw new IllegalStateException(err.toString());
        }
        return code;
    }

    /** The same analyses, one after another on this thread (the threads parameter is not used). */
    @Benchmark
    public int independent() {
        int done = 0;
        for (Path m : models) {
            Outcome o = TowerAnalysis.outcome(m, m.toString());
            if (o.exitCode() != 0) {
                throw new IllegalStateException(o.message());
            }
            done++;
        }
        return done;
    }
}
