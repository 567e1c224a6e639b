package tetrapod.cli;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
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
import tetrapod.common.BadInputException;
import tetrapod.io.ModelPatches;
import tetrapod.io.Sha256;

/**
 * Issue 17's fleet benchmark: {@link #towers} generated towers of the bundled kinds
 * ({@link GeneratedFleet}) under the base scenario and the two scenario patches of models/fleet
 * (ice-20mm-en.json, steel-s275.json), as {@code tetrapod batch} with {@link #threads} threads,
 * against the same distinct analyses run independently in-process, one plain thread per core
 * each taking every {@code threads}-th model (what one batch row does: read, analyse, results
 * document, figures). The distinct analyses are the batch's: a patch that leaves a model as it was
 * (steel-s275 on the already S275 rectangular tower) is analysed once. Per-core throughput:
 * {@link #analyses} / (time × threads).
 */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
@Fork(value = 1, jvmArgs = {"-Xms1g", "-Xmx6g"})
@State(Scope.Benchmark)
public class FleetBenchmark {

    static final List<String> SCENARIOS = List.of("models/fleet/ice-20mm-en.json", "models/fleet/steel-s275.json");

    @Param({"100"})
    public int towers;

    @Param({"2"})
    public int threads;

    /** The distinct analyses of the fleet (printed at setup, for the per-core figure). */
    public int analyses;

    private Path dir;
    private Path fleet;
    private List<Path> distinct;
    private int run;

    @Setup(Level.Trial)
    public void setUp() throws IOException, BadInputException {
        dir = Files.createTempDirectory("tetrapod-fleet-bench");
        fleet = dir.resolve("towers");
        List<Object> patches = new ArrayList<>();
        for (String s : SCENARIOS) {
            patches.add(ModelPatches.readPatch(Path.of(s)));
        }
        distinct = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (Path model : GeneratedFleet.write(Path.of("models"), fleet, towers)) {
            seen.add(Sha256.of(ModelPatches.canonical(model, List.of())));
            distinct.add(model);
            for (int s = 0; s < patches.size(); s++) {
                byte[] patched = ModelPatches.canonical(model, List.of(patches.get(s)));
                if (seen.add(Sha256.of(patched))) {
                    Path file = dir.resolve("patched").resolve(String.valueOf(s)).resolve(model.getFileName());
                    Files.createDirectories(file.getParent());
                    Files.write(file, patched);
                    distinct.add(file);
                }
            }
        }
        analyses = distinct.size();
        System.out.println("\n" + towers + " towers × (base + " + SCENARIOS.size() + " scenarios) = "
                + towers * (1 + SCENARIOS.size()) + " rows, " + analyses + " distinct analyses");
    }

    @TearDown(Level.Trial)
    public void tearDown() throws IOException {
        ScratchFolders.delete(dir);
    }

    /** The whole command into a new folder. */
    @Benchmark
    public int batch() {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        List<String> args = new ArrayList<>(List.of("batch", fleet.toString(), "-o", dir.resolve("run-" + (run++)).toString(),
                "--threads", String.valueOf(threads), "--quiet"));
        for (String s : SCENARIOS) {
            args.addAll(List.of("--scenario", s));
        }
        int code = Main.commandLine(out, err).execute(args.toArray(String[]::new));
        if (code != 0) {
            throw new IllegalStateException(err.toString());
        }
        return code;
    }

    /** The same distinct analyses on {@link #threads} plain threads, each its own share one after another. */
    @Benchmark
    public int independent() throws InterruptedException, ExecutionException {
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            List<Future<Integer>> shares = new ArrayList<>();
            for (int t = 0; t < threads; t++) {
                int first = t;
                shares.add(pool.submit(() -> {
                    int done = 0;
                    for (int k = first; k < distinct.size(); k += threads) {
                        Path m = distinct.get(k);
                        Outcome o = TowerAnalysis.outcome(m, m.toString());
                        if (o.exitCode() != 0 && o.exitCode() != 2) { // 2: the ice patch is bad input for the ASCE tower
                            throw new IllegalStateException(o.message());
                        }
                        done++;
                    }
                    return done;
                }));
            }
            int done = 0;
            for (Future<Integer> f : shares) {
                done += f.get();
            }
            return done;
        } finally {
            pool.shutdownNow();
        }
    }
}
