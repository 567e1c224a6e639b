package tetrapod.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.io.ResultsReader;
import tetrapod.report.ReportHtml;
import tetrapod.report.SizingHistoryFile;
import tetrapod.report.Results;

/** Rebuilds report.html from a results file. */
@Command(name = "report", mixinStandardHelpOptions = true,
        description = "Build report.html again from a results.json written by 'tetrapod analyze' (no analysis). "
                + "The 3D picture is the tower.png beside the results file, when there is one.")
final class ReportCommand implements Callable<Integer> {

    @Parameters(paramLabel = "RESULTS.json", description = "A results file written by 'tetrapod analyze'.")
    Path resultsFile;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "The HTML file to write (default: report.html beside the results file).")
    Path output;

    @Option(names = "--picture", paramLabel = "PNG",
            description = "The 3D picture to embed (default: tower.png beside the results file, if any).")
    Path picture;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        Results results = new Results(ResultsReader.forReport(resultsFile));
        Path folder = resultsFile.toAbsolutePath().getParent();
        Path png = picture != null ? picture : folder.resolve("tower.png");
        if (picture != null && !Files.isRegularFile(picture)) {
            throw new BadInputException(Problem.at("--picture", "no such file: " + picture));
        }
        Optional<byte[]> bytes = Files.isRegularFile(png) ? Optional.of(Files.readAllBytes(png)) : Optional.empty();
        Path target = output != null ? output : folder.resolve(ReportHtml.FILE);
        ReportHtml.write(target, results, bytes, SizingHistoryFile.matching(folder, results));
        PrintWriter out = spec.commandLine().getOut();
        if (bytes.isEmpty()) {
            out.println("no tower.png beside " + resultsFile + ": the report has no 3D picture "
                    + "(tetrapod render MODEL.json --colour utilisation -o tower.png draws one)");
        }
        out.println("report written to " + target);
        return ExitCode.DONE;
    }
}
