package tetrapod.spark;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.sql.SparkSession;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import tetrapod.batch.FleetPlan;
import tetrapod.batch.FleetPlan.Work;
import tetrapod.batch.Manifest;
import tetrapod.batch.Outcome;
import tetrapod.batch.RunFolder;
import tetrapod.batch.Scenario;
import tetrapod.batch.SummaryPage;
import tetrapod.batch.SummaryParquet;
import tetrapod.batch.SummaryRow;
import tetrapod.batch.SummaryTable;
import tetrapod.cli.ExitCode;
import tetrapod.cli.Failures;
import tetrapod.cli.TowerAnalysis;
import tetrapod.cli.Version;
import tetrapod.common.BadInputException;
import tetrapod.common.OutputException;

/**
 * {@code tetrapod batch} as an Apache Spark job, for spark-submit: the driver reads the manifest and
 * the scenario patches and plans the work ({@link FleetPlan}: patched models written into the run's
 * folder, the same model twice analysed once); the executors get each model's bytes and analyse it
 * as analyze does ({@link TowerAnalysis}); the driver writes summary.csv, summary.html (the plain
 * batch's writers, the same rows in the same order) and summary.parquet (with Spark). The manifest
 * and its models must be on a file system the driver reads, the output folder on one that the driver
 * and the executors share (an executor writes summary.parquet). No reports, no resume: Spark runs a
 * failed task again, a failed job is run again whole.
 */
@Command(name = "tetrapod.spark.FleetJob", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Analyse every tower of a manifest unpatched ('base'), under its manifest row's parameters and"
                + " under each scenario patch (RFC 7386) on a Spark cluster; writes summary.csv, summary.parquet and"
                + " summary.html into DIR. A model that cannot be analysed is a row with its exit class and message.%n"
                + "Results must be checked by a qualified engineer against the codes that apply locally.")
public final class FleetJob implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "MANIFEST", description = "A folder of model files (*.json) or a CSV manifest.")
    Path manifest;

    @Parameters(index = "1..*", paramLabel = "PATCH.json",
            description = "Scenario patches (JSON Merge Patch), each tried on every tower, named by its file name.")
    List<Path> scenarios = new ArrayList<>();

    @Option(names = {"-o", "--output"}, paramLabel = "DIR", required = true, description = "A new or empty folder.")
    Path output;

    private PrintWriter out;

    public static void main(String[] args) {
        int code = execute(new PrintWriter(System.out, true), new PrintWriter(System.err, true), args);
        scala.Option<SparkSession> session = SparkSession.getDefaultSession();
        if (session.isDefined()) {
            session.get().stop();
        }
        System.exit(code);
    }

    /** Runs the job on the Spark session spark-submit (or the caller) set up; returns the exit code. */
    static int execute(PrintWriter out, PrintWriter err, String... args) {
        FleetJob job = new FleetJob();
        job.out = out;
        CommandLine cl = new CommandLine(job).setOut(out).setErr(err);
        // every failure as the tetrapod commands report it: one line per problem, analyze's exit codes
        cl.setExecutionExceptionHandler((e, line, parsed) -> Failures.report(e, err, false));
        return cl.execute(args);
    }

    @Override
    public Integer call() throws BadInputException, OutputException, IOException {
        List<SummaryRow> rows = run(SparkSession.builder().getOrCreate(), manifest, scenarios, output);
        out.println(rows.size() + " towers × scenarios written to " + output + ": " + SummaryTable.FILE + ", "
                + SummaryParquet.FILE + ", " + SummaryPage.FILE);
        out.println("Results must be checked by a qualified engineer against the codes that apply locally.");
        return ExitCode.DONE;
    }

    /** The fleet run of {@code manifest} under {@code scenarioFiles} on {@code spark}, its summary written into {@code output}. */
    public static List<SummaryRow> run(SparkSession spark, Path manifest, List<Path> scenarioFiles, Path output)
            throws BadInputException, OutputException, IOException {
        Manifest towers = Manifest.read(manifest);
        List<Scenario> scenarios = Scenario.fromFiles(scenarioFiles);
        String program = new Version().getVersion()[0];
        try (RunFolder folder = RunFolder.open(output, false, manifest, program)) {
            FleetPlan plan = FleetPlan.of(towers, scenarios, folder, program);

            Map<Work, Outcome> outcomes = new HashMap<>();
            List<Work> shipped = new ArrayList<>();
            List<ShippedModel> models = new ArrayList<>();
            for (Work w : plan.works()) {
                String shown = FleetPlan.shown(output, w.model());
                if (w.hash() == null) {
                    // the model cannot be read (no such file, no JSON): its analysis fails at reading, here
                    outcomes.put(w, TowerAnalysis.outcome(w.model(), shown));
                } else {
                    shipped.add(w);
                    models.add(new ShippedModel(w.model().getFileName().toString(), shown, Files.readAllBytes(w.model())));
                }
            }
            if (!models.isEmpty()) {
                JavaSparkContext sc = JavaSparkContext.fromSparkContext(spark.sparkContext());
                // a few tasks per core, so that a slow tower does not hold up a whole share of the work
                int slices = Math.min(models.size(), Math.max(1, sc.defaultParallelism() * 4));
                List<Outcome> analysed = sc.parallelize(models, slices).map(ShippedModel::analyse).collect();
                for (int k = 0; k < shipped.size(); k++) {
                    outcomes.put(shipped.get(k), analysed.get(k));
                }
            }
            List<SummaryRow> rows = plan.rows(outcomes);
            SummaryTable.write(output.resolve(SummaryTable.FILE), rows);
            SummaryFrame.write(spark, rows, output.resolve(SummaryParquet.FILE));
            SummaryPage.write(output.resolve(SummaryPage.FILE), rows, manifest.toString());
            return rows;
        }
    }
}
