package tetrapod.cli;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Stage "read, generate, loads" of {@code analyze} alone in a warm JVM (issue 15 item 6): the model
 * file read and checked, the tower generated, its loads built, and the wind's response factor found
 * from the tower's own first sway (a factorisation and the lowest modes). Run from the repository root.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgs = {"-Xms1g", "-Xmx4g"})
@State(Scope.Benchmark)
public class ReadBenchmark {

    @Param({"models/ridge-lookout-square.json", "models/hilltop-relay-k.json"})
    public String model;

    @Benchmark
    public LoadedModel readGenerateLoads() throws Exception {
        return LoadedModel.forAnalysis(Path.of(model));
    }
}
