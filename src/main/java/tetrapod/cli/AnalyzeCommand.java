package tetrapod.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import tetrapod.analysis.Analysis;
import tetrapod.analysis.AnalysisResult;
import tetrapod.common.ProgressListener;
import tetrapod.io.DefaultedKeys;
import tetrapod.io.JsonOutput;
import tetrapod.io.SpecWriter;
import tetrapod.report.ResultsDocument;

/** The main job: analyse a tower under its loads and write the results. */
@Command(name = "analyze", mixinStandardHelpOptions = true,
        description = "Analyse a tower: self-weight, ancillaries, ice and wind from every azimuth of the sweep, "
                + "every combination; writes results.json into the output folder and prints a summary.%n"
                + "Results must be checked by a qualified engineer against the codes that apply locally.")
final class AnalyzeCommand implements Callable<Integer> {

    @Parameters(paramLabel = "MODEL.json", description = "The tower spec.")
    Path model;

    @Option(names = {"-o", "--output"}, paramLabel = "DIR",
            description = "Output folder (default: out/<model file name>/).")
    Path output;

    @Option(names = "--strict", description = "Exit with code 1 when any member or footing is overstressed.")
    boolean strict;

    @Option(names = "--timings", description = "Print the wall time of each stage and the DOF and case counts.")
    boolean timings;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        Stopwatch watch = new Stopwatch();
        LoadedModel loaded = LoadedModel.read(model);
        watch.lap("read+generate+loads");
        AnalysisResult result = Analysis.run(loaded.tower(), loaded.loads(), loaded.spec().checks(), ProgressListener.NONE);
        watch.lap("analyse");
        Path folder = output != null ? output : OutputFolders.forModel(model);
        Path resultsFile = folder.resolve("results.json");
        JsonOutput.write(resultsFile, ResultsDocument.build(loaded.spec(), result,
                DefaultedKeys.of(model, SpecWriter.toMap(loaded.spec()))));
        watch.lap("report");

        AnalysisSummary.print(out, result);
        out.println("results written to " + folder);
        if (timings) {
            out.printf(Locale.ROOT, "timings (%d DOF, %d load cases, %d basis vectors):%n",
                    result.model().freeDofCount(), result.caseCount(), result.responses().size());
            watch.print(out);
        }
        return strict && result.maxUtilisation() > 1.0 ? ExitCode.OVERSTRESS : ExitCode.DONE;
    }

}
