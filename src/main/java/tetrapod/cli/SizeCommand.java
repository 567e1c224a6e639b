package tetrapod.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.common.ProgressListener;
import tetrapod.common.Units;
import tetrapod.io.JsonOutput;
import tetrapod.io.OutputFiles;
import tetrapod.io.SpecReader;
import tetrapod.io.SpecWriter;
import tetrapod.model.Role;
import tetrapod.section.SectionCatalogue;
import tetrapod.size.GroupResult;
import tetrapod.size.Iteration;
import tetrapod.size.Outcome;
import tetrapod.size.Shortfall;
import tetrapod.size.Sizer;
import tetrapod.size.SizingHistory;
import tetrapod.size.SizingModel;
import tetrapod.size.SizingOptions;
import tetrapod.size.SizingResult;
import tetrapod.size.SizingRules;

/** Sizes the members: the lightest allowed section per role and segment that passes every check. */
@Command(name = "size", mixinStandardHelpOptions = true,
        description = "Size the members of a generated tower: for each role in each segment the lightest allowed "
                + "section that keeps every member at or below the target utilisation over every load case, "
                + "re-analysing until no group changes. Writes the sized spec (only sections change) and "
                + "size-history.json; prints each group before and after.%n"
                + "Results must be checked by a qualified engineer against the codes that apply locally.")
final class SizeCommand implements Callable<Integer> {

    /** The roles {@code bracing} stands for in the minimum options. */
    private static final List<Role> BRACING = List.of(Role.DIAGONAL, Role.HORIZONTAL, Role.REDUNDANT, Role.PLAN);

    @Parameters(paramLabel = "SPEC", description = "The tower spec to size.")
    Path model;

    @Option(names = {"-o", "--output"}, paramLabel = "SPEC_OUT",
            description = "The sized spec (default: out/<model>/<model>-sized.json). size-history.json goes into the "
                    + "folder that 'analyze SPEC_OUT' writes to (out/<SPEC_OUT name>/).")
    Path output;

    @Option(names = "--history-dir", paramLabel = "DIR",
            description = "Folder for size-history.json (default: out/<SPEC_OUT name>/, where 'analyze SPEC_OUT' writes).")
    Path historyDir;

    @Option(names = "--target", paramLabel = "U", description = "Largest utilisation allowed (default: ${DEFAULT-VALUE}).",
            defaultValue = "1.0")
    double target;

    @Option(names = "--max-iterations", paramLabel = "N", defaultValue = "20",
            description = "Analyses at most (default: ${DEFAULT-VALUE}).")
    int maxIterations;

    @Option(names = "--allowed", paramLabel = "SECTIONS", split = ",",
            description = "Sections to choose from, e.g. L50x5,L60x6,L70x7 (default: every equal angle of the catalogue).")
    List<String> allowed = new ArrayList<>();

    @Option(names = "--min-thickness", paramLabel = "ROLE=MM", mapFallbackValue = "",
            description = "Minimum thickness per role in mm (leg, diagonal, horizontal, redundant, plan, or bracing for "
                    + "all but legs); default leg=5, others 4 (assumed, common practice).")
    Map<String, String> minThickness = new LinkedHashMap<>();

    @Option(names = "--min-width", paramLabel = "ROLE=MM", mapFallbackValue = "",
            description = "Minimum leg width per role in mm (the narrower leg of an angle); default leg=50, others 40 "
                    + "(assumed, common practice).")
    Map<String, String> minWidth = new LinkedHashMap<>();

    @Option(names = "--start", paramLabel = "FROM", defaultValue = "spec",
            description = "Start from the spec's sections (spec), the lightest (lightest) or the heaviest (heaviest) "
                    + "allowed section of each group (default: ${DEFAULT-VALUE}).")
    String start;

    @Option(names = "--timings", description = "Print the wall time of each iteration.")
    boolean timings;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        SizingOptions options = options();
        SizingModel sizingModel = SizingModel.of(SpecReader.read(model, SectionCatalogue.standard()));
        Path sizedFile = output != null ? output : defaultOutput(model);
        Path historyFile = (historyDir != null ? historyDir : OutputFolders.forModel(sizedFile)).resolve("size-history.json");
        OutputFiles.check(sizedFile);
        OutputFiles.check(historyFile);
        long t0 = System.nanoTime();
        SizingResult result = Sizer.size(sizingModel, options, ProgressListener.NONE);
        long nanos = System.nanoTime() - t0;

        out.printf(Locale.ROOT, "sizing %s: %d groups, target utilisation %.3f, %s%n", sizingModel.spec().name(),
                result.groups().size(), options.target(), allowed.isEmpty() ? "equal angles of the catalogue"
                        : "sections " + String.join(", ", allowed));
        history(out, result);
        out.flush();
        if (result.outcome() == Outcome.INFEASIBLE) {
            err.println("infeasible: " + result.outcome().explanation() + "; no sized spec written");
            for (Shortfall s : result.shortfalls()) {
                err.println("  " + s.message());
            }
            return ExitCode.INFEASIBLE;
        }
        if (result.sizedSpec().isEmpty()) {
            err.printf(Locale.ROOT, "no design at or below %.3f within %d iterations (%s); no sized spec written%n",
                    options.target(), options.maxIterations(), result.outcome().explanation());
            return ExitCode.INFEASIBLE;
        }
        out.printf(Locale.ROOT, "%s after %d iterations: %s%n", result.outcome() == Outcome.ITERATION_LIMIT
                ? "stopped at the iteration limit" : "converged", result.history().size(), result.outcome().explanation());
        if (result.outcome() == Outcome.ITERATION_LIMIT) {
            out.println("returning the lightest analysed design that passes");
        }
        groups(out, result);
        double change = result.massBefore() > 0 ? 100 * (result.massAfter() / result.massBefore() - 1) : 0;
        double allowance = result.connectionAllowance();
        out.printf(Locale.ROOT, "steel mass (bare): %.0f kg before, %.0f kg after (%+.1f %%); with the %.0f %% "
                + "connection allowance %.0f kg and %.0f kg%n", result.massBefore(), result.massAfter(), change,
                100 * allowance, result.massBefore() * (1 + allowance), result.massAfter() * (1 + allowance));
        out.printf(Locale.ROOT, "largest utilisation after sizing: %.3f (target %.3f); foundations are not sized: "
                + "run analyze on the sized spec for them%n", result.maxUtilisationAfter(), options.target());

        SpecWriter.write(sizedFile, result.sizedSpec().get());
        JsonOutput.write(historyFile, SizingHistory.document(sizingModel.spec().name(), result));
        out.println("sized spec written to " + sizedFile);
        out.println("history written to " + historyFile);
        out.println("Results must be checked by a qualified engineer against the codes that apply locally.");
        if (timings) {
            out.printf(Locale.ROOT, "timings: %.3f s for %d iterations, %.3f s per iteration%n", nanos / 1e9,
                    result.history().size(), nanos / 1e9 / result.history().size());
        }
        return ExitCode.DONE;
    }

    private void history(PrintWriter out, SizingResult result) {
        out.printf(Locale.ROOT, "  %9s %12s %9s %8s%s%n", "iteration", "mass kg", "max util", "changed",
                timings ? "   time s" : "");
        for (Iteration i : result.history()) {
            out.printf(Locale.ROOT, "  %9d %12.0f %9.3f %8d%s%n", i.number(), i.steelMass(), i.maxUtilisation(),
                    i.changedGroups(), timings ? String.format(Locale.ROOT, " %8.3f", i.nanos() / 1e9) : "");
        }
    }

    private static void groups(PrintWriter out, SizingResult result) {
        out.printf(Locale.ROOT, "  %-22s %-10s %6s   %-10s %6s  %-20s %s%n", "group", "before", "util", "after", "util",
                "mode", "governing case");
        for (GroupResult g : result.groups()) {
            out.printf(Locale.ROOT, "  %-22s %-10s %6.3f %s %-10s %6.3f  %-20s %s%n", g.group().label(),
                    g.before().section(), g.before().utilisation(), g.changed() ? "->" : "  ", g.after().section(),
                    g.after().utilisation(), g.after().governing().mode().jsonName(), g.after().where().caseId());
        }
    }

    private SizingOptions options() throws BadInputException {
        List<Problem> problems = new ArrayList<>();
        if (!(target > 0) || !Double.isFinite(target)) {
            problems.add(Problem.at("--target", "must be a utilisation > 0, was " + target));
        }
        if (maxIterations < 1) {
            problems.add(Problem.at("--max-iterations", "must be >= 1, was " + maxIterations));
        }
        SizingOptions.Start from = switch (start.toLowerCase(Locale.ROOT)) {
            case "spec" -> SizingOptions.Start.SPEC;
            case "lightest" -> SizingOptions.Start.LIGHTEST;
            case "heaviest" -> SizingOptions.Start.HEAVIEST;
            default -> {
                problems.add(Problem.at("--start", "unknown value '" + start + "'; one of spec, lightest, heaviest"));
                yield SizingOptions.Start.SPEC;
            }
        };
        Map<Role, Double> thickness = minima("--min-thickness", minThickness, problems);
        Map<Role, Double> width = minima("--min-width", minWidth, problems);
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        SizingRules rules = SizingRules.DEFAULT.withMinima(thickness, width).withAllowed(allowed.stream()
                .map(String::trim).filter(s -> !s.isEmpty()).toList());
        return new SizingOptions(target, maxIterations, rules, from);
    }

    private static Map<Role, Double> minima(String option, Map<String, String> given, List<Problem> problems) {
        Map<Role, Double> out = new EnumMap<>(Role.class);
        given.forEach((key, value) -> {
            List<Role> roles;
            if (key.equals("bracing")) {
                roles = BRACING;
            } else {
                try {
                    roles = List.of(Role.fromJsonName(key));
                } catch (IllegalArgumentException e) {
                    problems.add(Problem.at(option, "unknown role '" + key
                            + "'; one of leg, diagonal, horizontal, redundant, plan, bracing"));
                    return;
                }
            }
            double mm;
            try {
                mm = Double.parseDouble(value);
            } catch (NumberFormatException e) {
                mm = Double.NaN;
            }
            if (!(mm >= 0) || !Double.isFinite(mm)) {
                problems.add(Problem.at(option, key + ": must be a size >= 0 mm, was '" + value + "'"));
                return;
            }
            for (Role r : roles) {
                out.put(r, mm * Units.MM);
            }
        });
        return out;
    }

    private static Path defaultOutput(Path model) {
        return OutputFolders.forModel(model).resolve(OutputFolders.stem(model) + "-sized.json");
    }
}
