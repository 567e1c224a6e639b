package tetrapod.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import tetrapod.batch.FleetPlan;
import tetrapod.batch.FleetRun;
import tetrapod.batch.Manifest;
import tetrapod.batch.RunFolder;
import tetrapod.batch.Scenario;
import tetrapod.batch.SummaryPage;
import tetrapod.batch.SummaryParquet;
import tetrapod.batch.SummaryRow;
import tetrapod.batch.SummaryTable;
import tetrapod.common.BadInputException;

/** Fleet re-checks: many towers under many scenarios, each analysed exactly as analyze does it. */
@Command(name = "batch", mixinStandardHelpOptions = true,
        description = "Analyse every tower of a manifest (a folder of model files, or a CSV file with a 'model' column of "
                + "paths relative to it and optional parameter columns) unpatched ('base') and under each scenario "
                + "(a JSON Merge Patch file, RFC 7386), on every core; writes summary.csv, summary.parquet and "
                + "summary.html into DIR. A model that cannot be analysed is a row with its exit class and message; "
                + "the run goes on.%n"
                + "Results must be checked by a qualified engineer against the codes that apply locally.")
final class BatchCommand implements Callable<Integer> {

    @Parameters(paramLabel = "MANIFEST", description = "A folder of model files (*.json) or a CSV manifest.")
    Path manifest;

    @Option(names = {"-o", "--output"}, paramLabel = "DIR", required = true,
            description = "Folder of the run: new or empty, or an earlier run's with --resume.")
    Path output;

    @Option(names = "--scenario", paramLabel = "PATCH.json",
            description = "A JSON Merge Patch applied to every tower; named by its file name. Repeatable.")
    List<Path> scenarios = new ArrayList<>();

    @Option(names = "--resume", description = "Continue an earlier run in DIR: work it finished is not done again.")
    boolean resume;

    @Option(names = "--threads", paramLabel = "N",
            description = "Analyses run at once (default: the number of processors).")
    Integer threads;

    @Option(names = "--reports", description = "Also write each tower's full analyze output (report.html, results.json,"
            + " CSV tables, tower.png) under DIR/reports/<tower>/<scenario>/, linked from summary.html.")
    boolean reports;

    @Option(names = {"-q", "--quiet"}, description = "No progress bar (there is none anyway when the output is not a"
            + " terminal).")
    boolean quiet;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        int pool = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (pool < 1) {
            throw BadInputException.at("--threads", "must be at least 1, was " + pool);
        }
        Manifest towers = Manifest.read(manifest);
        List<Scenario> patches = Scenario.fromFiles(scenarios);
        String program = new Version().getVersion()[0];
        List<SummaryRow> rows;
        try (RunFolder folder = RunFolder.open(output, resume, manifest, program)) {
            try (ProgressBars progress = ProgressBars.forCommand(quiet)) {
                rows = FleetRun.run(towers, patches, folder, pool, reports, program,
                        (model, reportFolder, link) -> TowerAnalysis.analyse(model, FleetPlan.shown(output, model),
                                reportFolder, link),
                        progress);
            }
            SummaryTable.write(output.resolve(SummaryTable.FILE), rows);
            SummaryParquet.write(output.resolve(SummaryParquet.FILE), rows, program);
            SummaryPage.write(output.resolve(SummaryPage.FILE), rows, manifest.toString());
        }
        Map<String, Integer> statuses = new TreeMap<>();
        rows.forEach(r -> statuses.merge(r.outcome().status(), 1, Integer::sum));
        out.println(rows.size() + " towers × scenarios (" + towers.towers().size() + " towers): " + statuses.entrySet()
                .stream().map(e -> e.getValue() + " " + e.getKey()).reduce((a, b) -> a + ", " + b).orElse(""));
        out.println("summary written to " + output + ": " + SummaryTable.FILE + ", " + SummaryParquet.FILE + ", "
                + SummaryPage.FILE);
        out.println("Results must be checked by a qualified engineer against the codes that apply locally.");
        return ExitCode.DONE;
    }
}
