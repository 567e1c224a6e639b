package tetrapod.size;

import java.nio.file.Path;
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
import org.openjdk.jmh.annotations.Warmup;
import tetrapod.analysis.Analysis;
import tetrapod.analysis.AnalysisResult;
import tetrapod.common.ProgressListener;
import tetrapod.io.SpecReader;
import tetrapod.section.SectionCatalogue;

/**
 * Sizing an example tower (default: the largest, hilltop-relay-k, 5° sweep, 288 cases), and the
 * two ways to get its member envelopes: the full sweep of {@code Analysis.run} (every member at
 * every case) and {@link FastEnvelope} (only the cases that can govern). Run from the repository
 * root (the model is read from models/). Target: sizing converges in under 10 s.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgs = {"-Xms1g", "-Xmx4g"})
@State(Scope.Benchmark)
public class SizingBenchmark {

    @Param({"models/hilltop-relay-k.json", "models/harbour-beacon-rectangular.json"})
    public String model;

    /** Where sizing starts: the spec's sections, or the heaviest allowed (more iterations). */
    @Param({"SPEC", "HEAVIEST"})
    public SizingOptions.Start start;

    private SizingModel sizing;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        sizing = SizingModel.of(SpecReader.read(Path.of(model), SectionCatalogue.standard()));
        SizingResult r = Sizer.size(sizing, SizingOptions.DEFAULT.withStart(start), ProgressListener.NONE);
        Evaluation e = FastEnvelope.evaluate(sizing.tower(), sizing.loads(), sizing.spec().checks());
        System.out.printf("%n[setup] %s, start %s: %d members, %d cases; sizing %s in %d iterations, %.0f kg -> %.0f kg;"
                        + " fast envelope %d member checks instead of %d%n", sizing.spec().name(), start,
                sizing.tower().frame().members().size(), e.caseCount(), r.outcome().jsonName(), r.history().size(),
                r.massBefore(), r.massAfter(), e.checkCount(),
                (long) e.caseCount() * sizing.tower().frame().members().size());
    }

    /** The whole sizing run: every iteration (rebuild, loads, factorise, solve the basis, envelope, choice). */
    @Benchmark
    public SizingResult size() throws Exception {
        return Sizer.size(sizing, SizingOptions.DEFAULT.withStart(start), ProgressListener.NONE);
    }

    /** One design's member envelopes, checking only the cases that can govern. */
    @Benchmark
    public Evaluation fastEnvelope() throws Exception {
        return FastEnvelope.evaluate(sizing.tower(), sizing.loads(), sizing.spec().checks());
    }

    /** The same envelopes by the full analysis (every member at every case, reported cases solved in full). */
    @Benchmark
    public AnalysisResult fullAnalysis() throws Exception {
        return Analysis.run(sizing.tower(), sizing.loads(), sizing.spec().checks(), ProgressListener.NONE);
    }
}
