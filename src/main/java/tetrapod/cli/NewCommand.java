package tetrapod.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.io.SpecWriter;
import tetrapod.model.Idealisation;
import tetrapod.model.Role;
import tetrapod.model.spec.BaseSpec;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.MaterialSpec;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.SupportType;
import tetrapod.model.spec.TowerSpec;

/**
 * Prints a valid starter spec: equal segments tapering linearly from the base width to the top
 * width. Its sections are starting values only, lighter going up; size them before relying on them.
 */
@Command(name = "new", mixinStandardHelpOptions = true,
        description = "Print a starter tower spec (square base, linear taper, equal segments). "
                + "Its sections are starting values to be checked and sized, not a design.")
final class NewCommand implements Callable<Integer> {

    private static final String[] LEGS = {"L150x15", "L120x12", "L100x10", "L90x9", "L80x8", "L70x7"};
    private static final String[] DIAGONALS = {"L90x8", "L75x8", "L70x7", "L60x6", "L50x5", "L45x4.5"};
    private static final String[] HORIZONTALS = {"L80x8", "L70x7", "L65x7", "L60x6", "L50x5", "L45x4.5"};

    @Option(names = "--name", description = "Tower name (default: ${DEFAULT-VALUE}).", defaultValue = "New tower")
    String name;

    @Option(names = "--height", paramLabel = "M", description = "Total height, m (default: ${DEFAULT-VALUE}).",
            defaultValue = "30")
    double height;

    @Option(names = "--base-width", paramLabel = "M",
            description = "Leg spacing at the base, m (default: ${DEFAULT-VALUE}).", defaultValue = "6")
    double baseWidth;

    @Option(names = "--top-width", paramLabel = "M",
            description = "Leg spacing at the top, m (default: ${DEFAULT-VALUE}).", defaultValue = "1.5")
    double topWidth;

    @Option(names = "--segments", description = "Number of segments (default: ${DEFAULT-VALUE}).",
            defaultValue = "3")
    int segments;

    @Option(names = "--panels", description = "Panels per segment (default: ${DEFAULT-VALUE}).", defaultValue = "4")
    int panels;

    @Option(names = "--bracing", description = "x, k or single (default: ${DEFAULT-VALUE}).", defaultValue = "x")
    String bracing;

    @Option(names = "--idealisation", description = "continuous-legs, truss or frame (default: ${DEFAULT-VALUE}).",
            defaultValue = "continuous-legs")
    String idealisation;

    @Option(names = "--material", description = "Steel grade (default: ${DEFAULT-VALUE}).", defaultValue = "S355")
    String material;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        SpecWriter.write(starter()).lines().forEach(out::println); // line by line: the writer escapes line breaks inside text
        out.flush();
        return ExitCode.DONE;
    }

    TowerSpec starter() throws BadInputException {
        List<Problem> problems = new ArrayList<>();
        positive(problems, "--height", height);
        positive(problems, "--base-width", baseWidth);
        positive(problems, "--top-width", topWidth);
        if (segments < 1) {
            problems.add(Problem.at("--segments", "must be at least 1, was " + segments));
        }
        if (panels < 1) {
            problems.add(Problem.at("--panels", "must be at least 1, was " + panels));
        }
        Bracing pattern = parse(Bracing.class, bracing, "--bracing", problems);
        Idealisation ideal = parse(Idealisation.class, idealisation, "--idealisation", problems);
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        List<SegmentSpec> segs = new ArrayList<>();
        for (int k = 0; k < segments; k++) {
            double top = baseWidth + (topWidth - baseWidth) * (k + 1) / segments;
            int size = Math.min(k, LEGS.length - 1);
            segs.add(new SegmentSpec(height / segments, top, top, panels, List.of(), pattern, Horizontals.ALL,
                    true, 0, Map.of(Role.LEG, LEGS[size], Role.DIAGONAL, DIAGONALS[size],
                            Role.HORIZONTAL, HORIZONTALS[size])));
        }
        return new TowerSpec(name, "Starter spec from 'tetrapod new': sections are starting values, not a design.",
                ideal, new BaseSpec(baseWidth, baseWidth), segs, MaterialSpec.grade(material), SupportType.PINNED,
                0.10, List.of(), Map.of(), null, null);
    }

    private static void positive(List<Problem> problems, String option, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            problems.add(Problem.at(option, "must be > 0 m, was " + value));
        }
    }

    private static <E extends Enum<E>> E parse(Class<E> type, String text, String option, List<Problem> problems) {
        List<String> names = new ArrayList<>();
        for (E e : type.getEnumConstants()) {
            String name = e.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
            if (name.equalsIgnoreCase(text)) {
                return e;
            }
            names.add(name);
        }
        problems.add(Problem.at(option, "unknown value '" + text + "'; expected one of " + String.join(", ", names)));
        return null;
    }
}
