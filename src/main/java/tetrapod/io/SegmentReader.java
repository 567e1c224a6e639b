package tetrapod.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import tetrapod.model.Role;
import tetrapod.model.spec.BaseSpec;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.SegmentSpec;

/** Reads {@code base} and {@code segments}: the parameters of a generated tower. */
final class SegmentReader {

    static final List<String> BASE_KEYS = List.of("widthX", "widthY");
    static final List<String> SEGMENT_KEYS = List.of("height", "topWidthX", "topWidthY", "panels", "panelHeights",
            "bracing", "horizontals", "crossingConnected", "redundants", "sections");
    static final List<String> SECTION_KEYS = List.of(Role.LEG, Role.DIAGONAL, Role.HORIZONTAL, Role.REDUNDANT, Role.PLAN)
            .stream().map(Role::jsonName).toList();
    /** Panel heights must add up to the segment height within 1 mm. */
    static final double PANEL_SUM_TOLERANCE = 1e-3;
    private static final int MAX_REDUNDANTS = 2;

    private final Problems problems;
    private final SectionNames sectionNames;

    SegmentReader(Problems problems, SectionNames sectionNames) {
        this.problems = problems;
        this.sectionNames = sectionNames;
    }

    /** The base, or null (reported). */
    BaseSpec base(Fields base) {
        base.allowOnly(BASE_KEYS);
        double x = width(base, "widthX", null, "the four legs would start from one point");
        double y = width(base, "widthY", null, "the four legs would start from one point");
        return Double.isNaN(x) || Double.isNaN(y) ? null : new BaseSpec(x, y);
    }

    /**
     * The segments bottom to top, or null when any has a problem (reported).
     *
     * @param base the base read before, or null when it had problems (then bottom widths are unknown)
     */
    List<SegmentSpec> segments(JsonNode array, String path, BaseSpec base) {
        if (array.isEmpty()) {
            problems.add(path, "must list at least one segment");
            return null;
        }
        if (array.size() > PhysicalLimits.MAX_SEGMENTS) {
            problems.add(path, "lists " + array.size() + " segments; at most " + PhysicalLimits.MAX_SEGMENTS
                    + " are allowed (give a segment more panels instead)");
            return null;
        }
        int before = problems.count();
        List<SegmentSpec> segments = new ArrayList<>();
        double bottomX = base == null ? Double.NaN : base.widthX();
        double bottomY = base == null ? Double.NaN : base.widthY();
        for (int k = 0; k < array.size(); k++) {
            String segmentPath = JsonPaths.index(path, k);
            Fields fields = Fields.of(array.get(k), segmentPath, problems);
            if (fields == null) {
                bottomX = Double.NaN;
                bottomY = Double.NaN;
                continue;
            }
            boolean top = k == array.size() - 1;
            String above = top ? "" : JsonPaths.index(path, k + 1);
            SegmentSpec segment = segment(fields, bottomX, bottomY, above);
            segments.add(segment);
            bottomX = segment == null ? Double.NaN : segment.topWidthX();
            bottomY = segment == null ? Double.NaN : segment.topWidthY();
        }
        if (problems.count() == before) {
            wholeTower(segments, path);
        }
        return problems.count() == before ? segments : null;
    }

    /** Limits on the sum of the segments: the tower's height and its number of panels. */
    private void wholeTower(List<SegmentSpec> segments, String path) {
        double height = segments.stream().mapToDouble(SegmentSpec::height).sum();
        if (height > PhysicalLimits.MAX_TOWER_HEIGHT) {
            problems.add(path, "the segments add up to a tower " + Numbers.format(height) + " m high; at most "
                    + Numbers.format(PhysicalLimits.MAX_TOWER_HEIGHT) + " m is allowed");
        }
        long panels = segments.stream().mapToLong(SegmentSpec::panels).sum();
        if (panels > PhysicalLimits.MAX_PANELS) {
            problems.add(path, "the segments have " + panels + " panels in all; at most " + PhysicalLimits.MAX_PANELS
                    + " are allowed (about " + PhysicalLimits.MAX_PANELS * 24 + " degrees of freedom)");
        }
    }

    private SegmentSpec segment(Fields f, double bottomX, double bottomY, String above) {
        int before = problems.count();
        f.allowOnly(SEGMENT_KEYS);
        double height = f.requiredNumber("height", PhysicalLimits.SEGMENT_HEIGHT, "m");
        String meet = above.isEmpty()
                ? "the four legs would meet in a point at the top; give the top a width"
                : "the four legs would meet in a point at this level, and " + above + " above stands on it";
        double topX = width(f, "topWidthX", bottomX, meet);
        double topY = width(f, "topWidthY", bottomY, meet);
        legSlope(f, "topWidthX", bottomX, topX, height);
        legSlope(f, "topWidthY", bottomY, topY, height);
        Integer panels = f.requiredWhole("panels", 1, PhysicalLimits.MAX_PANELS);
        List<Double> panelHeights = panelHeights(f, height, panels);
        if (panels != null && panelHeights != null && panelHeights.isEmpty()
                && height / panels < PhysicalLimits.MIN_PANEL_HEIGHT) {
            problems.add(f.path("panels"), panels + " equal panels in " + Numbers.format(height) + " m are "
                    + Numbers.format(roundMm(height / panels)) + " m high; a panel must be at least "
                    + Numbers.format(PhysicalLimits.MIN_PANEL_HEIGHT) + " m high");
        }
        Bracing bracing = Choices.BRACING.required(f, "bracing");
        Horizontals horizontals = Choices.HORIZONTALS.optional(f, "horizontals", Horizontals.ALL);
        Boolean crossingConnected = f.optionalBool("crossingConnected", true);
        Integer redundants = f.optionalWhole("redundants", 0, MAX_REDUNDANTS, 0);
        Map<Role, String> sections = sections(f, bracing, horizontals, redundants);
        if (problems.count() > before) {
            return null;
        }
        return new SegmentSpec(height, topX, topY, panels, panelHeights, bracing, horizontals,
                crossingConnected, redundants, sections);
    }

    /** A leg may lean at most {@link PhysicalLimits#MAX_LEG_LEAN_DEGREES} from the vertical in a face. */
    private void legSlope(Fields f, String key, double bottom, double top, double height) {
        double lean = Math.toDegrees(Math.atan(Math.abs(top - bottom) / 2 / height));
        if (lean > PhysicalLimits.MAX_LEG_LEAN_DEGREES) {
            problems.add(f.has(key) ? f.path(key) : f.path("height"), "the legs go from " + Numbers.format(bottom)
                    + " m to " + Numbers.format(top) + " m apart in " + Numbers.format(height) + " m of height, leaning "
                    + Numbers.format(Math.round(lean * 10) / 10.0) + "° from the vertical; at most "
                    + Numbers.format(PhysicalLimits.MAX_LEG_LEAN_DEGREES) + "° is allowed");
        }
    }

    /** A leg spacing in {@link PhysicalLimits#LEG_SPACING}; required when {@code byDefault} is null. */
    private double width(Fields f, String key, Double byDefault, String whyZeroIsWrong) {
        if (!f.has(key)) {
            if (byDefault == null) {
                f.missing(key, "a number > 0 m");
                return Double.NaN;
            }
            return byDefault;
        }
        double value = f.optionalNumber(key, Bound.ANY, "m", Double.NaN);
        if (value == 0) {
            problems.add(f.path(key), "must be > 0 m, was " + Numbers.shown(f.get(key)) + ": " + whyZeroIsWrong);
            return Double.NaN;
        }
        if (!Double.isNaN(value) && !PhysicalLimits.LEG_SPACING.contains(value)) {
            problems.add(f.path(key), "must be " + PhysicalLimits.LEG_SPACING.describe("m") + ", was "
                    + Numbers.shown(f.get(key)));
            return Double.NaN;
        }
        return value;
    }

    private List<Double> panelHeights(Fields f, double height, Integer panels) {
        if (!f.has("panelHeights")) {
            return List.of();
        }
        String path = f.path("panelHeights");
        List<Double> heights = Values.numbers(f.get("panelHeights"), path, PhysicalLimits.PANEL_HEIGHT, "m", problems);
        if (heights == null || panels == null) {
            return null;
        }
        if (heights.size() != panels) {
            problems.add(path, "has " + heights.size() + " heights but panels is " + panels
                    + (heights.isEmpty() ? "; leave panelHeights out for equal panels" : ""));
            return null;
        }
        double sum = heights.stream().mapToDouble(Double::doubleValue).sum();
        if (!Double.isNaN(height) && Math.abs(sum - height) > PANEL_SUM_TOLERANCE) {
            problems.add(path, "the panel heights add up to " + Numbers.format(roundMm(sum))
                    + " m but the segment height is " + Numbers.format(height) + " m; they must agree within 1 mm");
            return null;
        }
        return heights;
    }

    private static double roundMm(double metres) {
        return Math.round(metres * 1e4) / 1e4;
    }

    private Map<Role, String> sections(Fields segment, Bracing bracing, Horizontals horizontals, Integer redundants) {
        Fields f = segment.object("sections", true);
        if (f == null) {
            return null;
        }
        f.allowOnly(SECTION_KEYS);
        Map<Role, String> sections = new EnumMap<>(Role.class);
        for (String key : SECTION_KEYS) {
            if (f.has(key)) {
                String name = sectionNames.check(f.get(key), f.path(key), problems);
                if (name != null) {
                    sections.put(Role.fromJsonName(key), name);
                }
            }
        }
        require(f, "leg", "the section of the legs");
        require(f, "diagonal", "the section of the diagonals");
        if (bracing == Bracing.K) {
            require(f, "horizontal", "the section of the horizontals (K bracing needs them)");
        } else if (horizontals != null && horizontals != Horizontals.NONE) {
            require(f, "horizontal", "the section of the horizontals (horizontals is '" + horizontals.jsonName() + "')");
        }
        if (redundants != null && redundants > 0) {
            require(f, "redundant", "the section of the redundants (redundants is " + redundants + ")");
        }
        return sections;
    }

    private static void require(Fields f, String key, String what) {
        if (!f.has(key)) {
            f.missing(key, what);
        }
    }
}
