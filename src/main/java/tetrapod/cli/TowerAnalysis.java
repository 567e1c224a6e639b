package tetrapod.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tetrapod.analysis.AnalysisResult;
import tetrapod.batch.Outcome;
import tetrapod.batch.ResultFigures;
import tetrapod.common.ProgressListener;
import tetrapod.io.OutputFolder;
import tetrapod.report.Results;

/**
 * One tower × scenario of a fleet run analysed exactly as {@code analyze} does it, for the plain
 * batch and its Spark job alike; every end becomes an {@link Outcome} with analyze's exit code and
 * first error line.
 */
public final class TowerAnalysis {

    private TowerAnalysis() { }

    /**
     * Analyses {@code model} without writing anything; a failure's message names the model as
     * {@code shown} (the file the row stands for, wherever its bytes were analysed).
     */
    public static Outcome outcome(Path model, String shown) {
        return analyse(model, shown, Optional.empty(), null);
    }

    /** As {@link #outcome}, also writing analyze's outputs into {@code reportFolder} when given ({@code link} names it). */
    static Outcome analyse(Path model, String shown, Optional<Path> reportFolder, String link) {
        try {
            LoadedModel loaded = LoadedModel.forAnalysis(model);
            AnalysisResult result = AnalyzeCommand.analyse(loaded, null, ProgressListener.NONE);
            Map<String, Object> document = AnalyzeCommand.document(model, loaded, result);
            if (reportFolder.isPresent()) {
                try (OutputFolder outputs = OutputFolder.open(reportFolder.get(), AnalyzeCommand.OUTPUTS)) {
                    AnalyzeCommand.write(model, () -> document, loaded, result, outputs.staging(), new StageTimes());
                    outputs.commit();
                }
            }
            return Outcome.done(ResultFigures.of(new Results(AnalyzeCommand.plainDocument(document))),
                    reportFolder.isPresent() ? link : null);
        } catch (Throwable t) {
            StringWriter text = new StringWriter();
            int code = Failures.report(t, new PrintWriter(text), false);
            List<String> lines = text.toString().lines().filter(l -> l.startsWith("error: ") || l.startsWith("internal"))
                    .toList();
            String first = lines.isEmpty() ? t.toString() : lines.get(0).replaceFirst("^error: ", "");
            return Outcome.failed(code, shown + ": " + first + Outcome.moreProblems(lines.size() - 1));
        }
    }
}
