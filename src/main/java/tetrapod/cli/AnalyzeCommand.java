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
import tetrapod.analysis.Extreme;
import tetrapod.analysis.LegBaseExtremes;
import tetrapod.analysis.SolvedCase;
import tetrapod.common.ProgressListener;
import tetrapod.io.JsonOutput;
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
        AnalysisResult result = Analysis.run(loaded.tower(), loaded.loads(), ProgressListener.NONE);
        watch.lap("analyse");
        Path folder = output != null ? output : OutputFolders.forModel(model);
        Path resultsFile = folder.resolve("results.json");
        JsonOutput.write(resultsFile, ResultsDocument.build(loaded.spec(), result));
        watch.lap("report");

        Summary.print(out, result);
        out.println("results written to " + folder);
        if (timings) {
            out.printf(Locale.ROOT, "timings (%d DOF, %d load cases, %d basis vectors):%n",
                    result.model().freeDofCount(), result.caseCount(), result.responses().size());
            watch.print(out);
        }
        return ExitCode.DONE;
    }

    /** The short summary printed after an analysis. */
    static final class Summary {
        private Summary() { }

        static void print(PrintWriter out, AnalysisResult r) {
            var frame = r.tower().frame();
            out.printf(Locale.ROOT, "%s: %s, %d nodes, %d members, %d load cases (%d combinations, sweep step %s deg)%n",
                    frame.name(), frame.idealisation().jsonName(), frame.nodes().size(), frame.members().size(),
                    r.caseCount(), r.loads().combinations().size(),
                    tetrapod.load.CaseKey.degrees(r.loads().sweepStep()));
            if (!r.model().autoRestraints().isEmpty()) {
                out.printf(Locale.ROOT, "auto-restrained: %d directions where the lattice model has no stiffness "
                        + "(listed in results.json model.autoRestraints)%n", r.model().autoRestraints().size());
            }
            out.println("leg base reactions (the support on the leg; compression = support pushes up):");
            out.printf(Locale.ROOT, "  %5s  %14s  %-28s %14s  %-28s %12s  %s%n", "node", "compression kN", "case",
                    "uplift kN", "case", "shear kN", "case");
            for (LegBaseExtremes leg : r.legBases()) {
                out.printf(Locale.ROOT, "  %5d  %14s  %-28s %14s  %-28s %12s  %s%n", leg.node(),
                        kN(leg.compression()), caseOf(leg.compression()), kN(leg.uplift()), caseOf(leg.uplift()),
                        kN(leg.shear()), caseOf(leg.shear()));
            }
            double worst = 0;
            for (SolvedCase c : r.cases()) {
                worst = Math.max(worst, c.solution().equilibriumError());
            }
            out.printf(Locale.ROOT, "equilibrium: largest residual of the reported cases %.1e%n", worst);
        }

        private static String kN(Extreme e) {
            return e == null ? "none" : String.format(Locale.ROOT, "%.1f", e.value() / 1e3);
        }

        private static String caseOf(Extreme e) {
            return e == null ? "-" : e.caseId();
        }
    }
}
