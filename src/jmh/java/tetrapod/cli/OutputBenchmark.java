package tetrapod.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
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
import tetrapod.analysis.AnalysisResult;
import tetrapod.common.ProgressListener;
import tetrapod.io.JsonOutput;
import tetrapod.io.ResultsReader;
import tetrapod.report.CsvTables;
import tetrapod.report.ReportHtml;
import tetrapod.report.Results;
import tetrapod.view.PictureRenderer;
import tetrapod.view.RenderRequest;
import tetrapod.view.RenderRoute;
import tetrapod.view.ViewData;

/**
 * The output stages of {@code analyze} after the analysis (issue 15 item 6), each alone in a warm
 * JVM, on a bundled example analysed once in setup: the results document, results.json with the
 * CSVs, tower.png by OpenGL (when the machine has it; software Mesa here) and by the built-in 2D
 * renderer, and report.html. Run from the repository root (the models are read from models/).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgs = {"-Xms1g", "-Xmx4g", "-Djava.awt.headless=true"})
@State(Scope.Benchmark)
public class OutputBenchmark {

    @Param({"models/ridge-lookout-square.json", "models/hilltop-relay-k.json"})
    public String model;

    private Path dir;
    private LoadedModel loaded;
    private AnalysisResult result;
    private Map<String, Object> document;
    private Results results;
    private ViewData view;
    private byte[] png;
    private PictureRenderer openGl;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        dir = Files.createTempDirectory("tetrapod-output-bench");
        loaded = LoadedModel.forAnalysis(Path.of(model));
        result = AnalyzeCommand.analyse(loaded, null, ProgressListener.NONE);
        document = AnalyzeCommand.document(Path.of(model), loaded, result);
        results = new Results(AnalyzeCommand.plainDocument(ResultsReader.forReport(document)));
        view = ResultViews.of(result, loaded.spec().checks()).withAncillaries(ResultViews.ancillaries(loaded.spec()));
        openGl = PictureRenderer.start(RenderRequest.ALL_ROUTES);
        Path picture = dir.resolve("tower.png");
        String route = RenderCommand.write(openGl, view, request(), picture);
        png = Files.readAllBytes(picture);
        System.out.printf("%n[setup] %s: %d members, %d cases; tower.png %s%n", loaded.spec().name(),
                loaded.tower().frame().members().size(), result.caseCount(), route);
    }

    @TearDown(Level.Trial)
    public void tearDown() throws IOException {
        openGl.close();
        ScratchFolders.delete(dir);
    }

    private RenderRequest request() {
        return RenderRequest.of(view, AnalyzeCommand.PICTURE_WIDTH, AnalyzeCommand.PICTURE_HEIGHT);
    }

    /** The results document as boxed values (what results.json is written from). */
    @Benchmark
    public Map<String, Object> resultsDocument() throws Exception {
        return AnalyzeCommand.document(Path.of(model), loaded, result);
    }

    /** Stage "results.json, CSV": the file written, its values read back in memory, the five CSVs. */
    @Benchmark
    public Results resultsJsonAndCsv() throws Exception {
        JsonOutput.write(dir.resolve("results.json"), document);
        Results read = new Results(AnalyzeCommand.plainDocument(ResultsReader.forReport(document)));
        CsvTables.writeAll(read, dir);
        return read;
    }

    /** Stage "picture" by the renderer analyze uses (OpenGL when there is a context), PNG included. */
    @Benchmark
    public String pictureByFirstRoute() throws Exception {
        return RenderCommand.write(openGl, view, request(), dir.resolve("tower.png"));
    }

    /** The same picture by the built-in 2D renderer, PNG included. */
    @Benchmark
    public String pictureByJava2d() throws Exception {
        return RenderCommand.write(view, request().withRoutes(List.of(RenderRoute.JAVA2D)), dir.resolve("tower2d.png"));
    }

    /** Stage "report": report.html with its charts and the picture. */
    @Benchmark
    public Path report() throws Exception {
        Path file = dir.resolve(ReportHtml.FILE);
        ReportHtml.write(file, results, Optional.of(png));
        return file;
    }
}
