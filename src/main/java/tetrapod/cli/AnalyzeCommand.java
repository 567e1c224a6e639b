package tetrapod.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import tetrapod.analysis.Analysis;
import tetrapod.analysis.AnalysisResult;
import tetrapod.analysis.NaturalModes;
import tetrapod.common.BadInputException;
import tetrapod.common.SideTask;
import tetrapod.io.DefaultedKeys;
import tetrapod.io.JsonOutput;
import tetrapod.io.OutputFolder;
import tetrapod.io.ResultsReader;
import tetrapod.io.SpecWriter;
import tetrapod.report.CsvTables;
import tetrapod.report.ReportHtml;
import tetrapod.report.SizingHistoryFile;
import tetrapod.report.Results;
import tetrapod.report.ResultsDocument;
import tetrapod.view.RenderRequest;
import tetrapod.view.RenderRoute;
import tetrapod.view.SoftwareRenderer;
import tetrapod.view.ViewData;

/** The main job: analyse a tower under its loads and write the results. */
@Command(name = "analyze", mixinStandardHelpOptions = true,
        description = "Analyse a tower: self-weight, ancillaries, ice and wind from every azimuth of the sweep, "
                + "every combination, and the movement under the serviceability wind; writes results.json, members.csv, "
                + "reactions.csv, wind.csv, requirements.csv, serviceability.csv, tower.png and "
                + "report.html into the output folder and prints a summary.%n"
                + "Results must be checked by a qualified engineer against the codes that apply locally.")
final class AnalyzeCommand implements Callable<Integer> {

    /** Size of tower.png, px. */
    static final int PICTURE_WIDTH = 1600;
    static final int PICTURE_HEIGHT = 1200;

    @Parameters(paramLabel = "MODEL.json", description = "The tower spec.")
    Path model;

    @Option(names = {"-o", "--output"}, paramLabel = "DIR",
            description = "Output folder (default: out/<model file name>/).")
    Path output;

    @Option(names = "--strict", description = "Exit with code 1 when any member or footing is overstressed.")
    boolean strict;

    @Option(names = "--timings", description = "Print the wall time of each stage and the DOF and case counts.")
    boolean timings;

    @Option(names = {"-q", "--quiet"},
            description = "No progress bar (there is none anyway when the output is not a terminal).")
    boolean quiet;

    @Option(names = "--modes", paramLabel = "N",
            description = "Natural modes to compute, at least 1 (default: 12, or fewer when the structure has fewer "
                    + "free translations that carry mass).")
    Integer modes;

    @Spec
    CommandSpec spec;

    /** Every file one run writes: an output folder is replaced by a set of exactly these (and what it held besides). */
    static final Set<String> OUTPUTS = Set.of("results.json", CsvTables.MEMBERS, CsvTables.REACTIONS, CsvTables.WIND,
            CsvTables.REQUIREMENTS, CsvTables.SERVICEABILITY, "tower.png", ReportHtml.FILE);

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        StageTimes watch = new StageTimes();
        if (modes != null && modes < 1) {
            throw BadInputException.at("--modes", "must be at least 1, was " + modes);
        }
        SideTask<Void> warming = SideTask.start("tetrapod-warm-2d", () -> {
            SoftwareRenderer.warmUp();
            return null;
        });
        LoadedModel loaded = LoadedModel.forAnalysis(model);
        Path folder = output != null ? output : OutputFolders.forModel(model);
        AnalysisResult result;
        String route;
        try (OutputFolder outputs = OutputFolder.open(folder, OUTPUTS)) {
            watch.end("read, generate, loads");
            try (ProgressBars progress = ProgressBars.forCommand(quiet)) {
                result = analyse(loaded, modes, StageTimes.both(progress, watch));
            }
            warming.await();   // its failure, if any, is met again and reported by the picture itself
            route = write(model, () -> document(model, loaded, result), loaded, result, outputs.staging(), watch);
            outputs.commit();
        }

        AnalysisSummary.print(out, loaded.spec(), result, loaded.responseFactor());
        out.println("tower.png " + route.replaceFirst("^render: ", "drawn by "));
        out.println("results written to " + folder + ": results.json, " + CsvTables.MEMBERS + ", "
                + CsvTables.REACTIONS + ", " + CsvTables.WIND + ", " + CsvTables.REQUIREMENTS + ", " + CsvTables.SERVICEABILITY
                + ", tower.png, " + ReportHtml.FILE);
        if (timings) {
            out.printf(Locale.ROOT, "timings (%d DOF, %d load cases, %d basis vectors):%n",
                    result.model().freeDofCount(), result.caseCount(), result.responses().size());
            watch.print(out);
        }
        return strict && result.maxUtilisation() > 1.0 ? ExitCode.OVERSTRESS : ExitCode.DONE;
    }

    @SuppressWarnings("unchecked")
    static Map<String, Object> plainDocument(Map<String, Object> document) {
        return (Map<String, Object>) JsonOutput.plain(document);
    }

    /**
     * The analysis of a loaded model as analyze runs it (batch runs the same); {@code modes} null
     * for the default count.
     */
    static AnalysisResult analyse(LoadedModel loaded, Integer modes, tetrapod.common.ProgressListener progress)
            throws Exception {
        AnalysisResult result = Analysis.run(loaded.tower(), loaded.loads(), loaded.spec().checks(),
                modes == null ? NaturalModes.DEFAULT_COUNT : modes, loaded.serviceability(), loaded.factored(), progress,
                Runtime.getRuntime().availableProcessors());
        if (modes != null && result.modes().size() < modes) {
            throw BadInputException.at("--modes", "asked for " + modes + " modes; the structure has only "
                    + result.modes().size() + " free translations that carry mass");
        }
        return result;
    }

    /** The results document (results.json as plain values) of {@code model}'s analysis. */
    static Map<String, Object> document(Path model, LoadedModel loaded, AnalysisResult result) throws Exception {
        ResultsDocument.Source source = new ResultsDocument.Source(model.getFileName().toString(),
                tetrapod.io.Sha256.of(model), new Version().getVersion()[0]);
        return ResultsDocument.build(loaded.spec(), result,
                DefaultedKeys.of(model, SpecWriter.toMap(loaded.spec())), source, loaded.responseFactor());
    }

    /**
     * The routes tower.png is drawn by: Java2D, chosen by measurement (issue 15 item 3,
     * docs/performance.md "The picture of analyze"): the same picture as llvmpipe's OpenGL, in a third of
     * the time and without a context to start; {@code render} and {@code view} use OpenGL.
     */
    static final List<RenderRoute> PICTURE_ROUTES = List.of(RenderRoute.JAVA2D);

    /**
     * Writes every output of the results document into {@code folder}; returns the line saying what
     * drew tower.png. The picture and the report are made on threads of their own while
     * results.json and the CSVs are written, the report taking the picture only when the rest of it
     * is written (issue 15: they share nothing but the finished results).
     */
    static String write(Path model, Callable<Map<String, Object>> documentOf, LoadedModel loaded,
                        AnalysisResult result, Path folder, StageTimes watch) throws Exception {
        Path picture = folder.resolve("tower.png");
        SideTask<String> drawing = SideTask.start("tetrapod-picture", () -> {
            ViewData view = ResultViews.envelopeOf(result).withAncillaries(ResultViews.ancillaries(loaded.spec()));
            return RenderCommand.write(view,
                    RenderRequest.of(view, PICTURE_WIDTH, PICTURE_HEIGHT).withRoutes(PICTURE_ROUTES), picture);
        });
        SideTask<Void> reporting = null;
        try {
            Map<String, Object> document = documentOf.call();
            // everything else is built from what the file holds, as 'tetrapod report' builds it from the file
            Results results = new Results(plainDocument(ResultsReader.forReport(document)));
            reporting = SideTask.start("tetrapod-report", () -> {
                ReportHtml.write(folder.resolve(ReportHtml.FILE), results, () -> {
                    drawing.result();
                    return Files.readAllBytes(picture);
                }, SizingHistoryFile.matching(folder, results));
                return null;
            });
            JsonOutput.write(folder.resolve("results.json"), document);
            CsvTables.writeAll(results, folder);
            watch.end("results.json, CSV");
            reporting.result();   // a picture that failed fails the report too, with the same error
            watch.end("picture, report (the rest)");
            return drawing.result();
        } finally {
            // nothing may still write into the folder once this returns or throws
            drawing.await();
            if (reporting != null) {
                reporting.await();
            }
        }
    }
}
