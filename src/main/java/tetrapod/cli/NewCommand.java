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
import tetrapod.common.ProgressListener;
import tetrapod.model.spec.LoadsSpec;
import tetrapod.model.spec.TerrainCategory;
import tetrapod.model.spec.WindSpec;
import tetrapod.size.Sizer;
import tetrapod.size.SizingModel;
import tetrapod.size.SizingOptions;
import tetrapod.size.SizingResult;

/**
 * Prints a valid starter spec: equal segments tapering linearly from the base width to the top
 * width, EN 1991-1-4 wind at the given basic speed, sections sized by {@link Sizer} to a strength
 * utilisation of at most 0.9 with every requirement met (unless {@code --no-size}). An invented
 * starting point for the user's own site, loads and checks, not a design.
 */
@Command(name = "new", mixinStandardHelpOptions = true,
        description = "Print a starter tower spec (square base, linear taper, equal segments, EN wind) with its "
                + "sections sized to pass its own checks (strength utilisation at most 0.9, every requirement met). "
                + "An invented starting point: give the site's wind, ancillaries and checks before relying on it.")
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

    @Option(names = "--wind-speed", paramLabel = "M/S", defaultValue = "25",
            description = "EN 1991-1-4 basic wind speed v_b,0, m/s, terrain category II (default: ${DEFAULT-VALUE}).")
    double windSpeed;

    @Option(names = "--no-size", description = "Print the starting sections as they are, without sizing them.")
    boolean noSize;

    @Spec
    CommandSpec spec;

    /** Strength utilisation the starter's sections are sized to. */
    static final double TARGET = 0.9;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        TowerSpec starter = starter();
        if (!noSize) {
            SizingResult sized = Sizer.size(SizingModel.of(starter), SizingOptions.DEFAULT.withTarget(TARGET),
                    ProgressListener.NONE);
            if (sized.sizedSpec().isPresent()) {
                starter = described(sized.sizedSpec().get(), String.format(java.util.Locale.ROOT, "Starter spec from "
                        + "'tetrapod new': sections sized to a strength utilisation of at most %.2f with every "
                        + "requirement met, under the wind given here; an invented starting point, not a design for "
                        + "any site.", TARGET));
            } else {
                spec.commandLine().getErr().println("new: the starter's sections could not be sized ("
                        + sized.outcome() + "); they are printed as starting values: run 'tetrapod size' on the file");
            }
        }
        SpecWriter.write(starter).lines().forEach(out::println); // line by line: the writer escapes line breaks inside text
        out.flush();
        return ExitCode.DONE;
    }

    private static TowerSpec described(TowerSpec s, String description) {
        return new TowerSpec(s.name(), description, s.idealisation(), s.base(), s.segments(), s.material(),
                s.supports(), s.connectionAllowance(), s.planBracingLevels(), s.userSections(), s.explicitFrame()
                .orElse(null), s.loads(), s.checks());
    }

    TowerSpec starter() throws BadInputException {
        List<Problem> problems = new ArrayList<>();
        positive(problems, "--height", height);
        positive(problems, "--base-width", baseWidth);
        positive(problems, "--top-width", topWidth);
        if (!(windSpeed >= 10 && windSpeed <= 60)) {
            problems.add(Problem.at("--wind-speed", "must be a basic wind speed of 10 to 60 m/s, was " + windSpeed));
        }
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
            double top = Math.round(100 * (baseWidth + (topWidth - baseWidth) * (k + 1) / segments)) / 100.0;
            int size = Math.min(k, LEGS.length - 1);
            segs.add(new SegmentSpec(height / segments, top, top, panels, List.of(), pattern, Horizontals.ALL,
                    true, 0, Map.of(Role.LEG, LEGS[size], Role.DIAGONAL, DIAGONALS[size],
                            Role.HORIZONTAL, HORIZONTALS[size])));
        }
        LoadsSpec loads = new LoadsSpec(List.of(), new WindSpec.En1991(windSpeed, TerrainCategory.CAT_II, List.of(),
                1.0, 1.0, Double.NaN, 1.0, WindSpec.En1991.DEFAULT_AIR_DENSITY), List.of(), null, List.of(), 15.0);
        return new TowerSpec(name, "Starter spec from 'tetrapod new': sections are starting values, not a design.",
                ideal, new BaseSpec(baseWidth, baseWidth), segs, MaterialSpec.grade(material), SupportType.PINNED,
                0.10, List.of(), Map.of(), null, loads, null);
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
