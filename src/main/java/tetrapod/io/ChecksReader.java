package tetrapod.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import tetrapod.model.Role;
import tetrapod.model.spec.BoltGrade;
import tetrapod.model.spec.BucklingOverride;
import tetrapod.model.spec.CheckMethod;
import tetrapod.model.spec.ChecksSpec;
import tetrapod.model.spec.ConnectedLeg;
import tetrapod.model.spec.ConnectionSpec;
import tetrapod.model.spec.DesignBasis;
import tetrapod.model.spec.CrossingRule;
import tetrapod.model.spec.FoundationSpec;
import tetrapod.model.spec.PartialFactors;

/**
 * Reads {@code checks}: which published rules members, connections and foundations are checked
 * against, the partial factors, buckling-length overrides and connections per role and segment,
 * and the footing of the legs. Defaults are filled in (see docs/tower-spec.schema.json).
 */
final class ChecksReader {

    static final List<String> CHECKS_KEYS = List.of("method", "partialFactors", "bucklingLengths", "connections",
            "foundation");
    static final List<String> FACTOR_KEYS = List.of("gammaM0", "gammaM1", "gammaM2");
    static final List<String> BUCKLING_KEYS = List.of("role", "segments", "minorAxisFactor", "geometricAxisFactor",
            "crossing");
    static final List<String> CONNECTION_KEYS = List.of("role", "segments", "bolts", "diameter_mm", "grade",
            "holeClearance_mm", "endDistance_mm", "edgeDistance_mm", "pitch_mm", "shearPlanes", "threadsInShearPlane",
            "holesInSection", "connectedLeg");
    static final List<String> FOUNDATION_KEYS = List.of("block", "concreteUnitWeight", "soilUnitWeight",
            "frustumHalfAngle", "uplift", "allowableBearing", "friction", "slidingFactorOfSafety", "anchorRods");
    static final List<String> BLOCK_KEYS = List.of("widthX", "widthY", "height", "depth");
    static final List<String> UPLIFT_KEYS = List.of("factorOfSafety", "gammaStabilising");
    static final List<String> ROD_KEYS = List.of("count", "diameter_mm", "grade", "allowableTension", "allowableShear");

    /** Reinforced concrete, EN 1991-1-1 Table A.1, kN/m³. */
    static final double DEFAULT_CONCRETE_UNIT_WEIGHT = 25.0;
    /** Factor of safety against uplift and against sliding when none is given (common practice). */
    static final double DEFAULT_FACTOR_OF_SAFETY = 1.5;

    private static final List<String> GRADES = BoltGrade.names();
    /** Anchor rod grades: EN 1993-1-8 6.2.2 (7) gives their shear resistance for 235 ≤ f_yb ≤ 640 MPa. */
    private static final List<BoltGrade> ROD_GRADES = List.of(BoltGrade.G4_6, BoltGrade.G5_6, BoltGrade.G8_8);
    private static final List<String> ROD_GRADE_NAMES = ROD_GRADES.stream().map(BoltGrade::jsonName).toList();
    private static final List<String> CROSSINGS = List.of(CrossingRule.values()).stream().map(CrossingRule::jsonName).toList();
    private static final List<String> LEGS = List.of(ConnectedLeg.values()).stream().map(ConnectedLeg::jsonName).toList();
    private static final Bound HALF_ANGLE = new Bound(0, true, 90, false);

    /** EN 1990 Table A1.2(A) EQU, γ_G,inf on a stabilising permanent action (recommended value). */
    static final double DEFAULT_GAMMA_STABILISING = 0.9;

    private final Problems problems;
    private final int segmentCount;
    private final DesignBasis basis;

    /**
     * @param segmentCount the number of segments of a generated tower; 0 for an explicit frame; −1
     *                     when the segments could not be read (their numbers are then not checked)
     * @param basis        the model's design basis, whose check method and uplift rule are the defaults
     */
    ChecksReader(Problems problems, int segmentCount, DesignBasis basis) {
        this.problems = problems;
        this.segmentCount = segmentCount;
        this.basis = basis;
    }

    /** The checks, or null (reported). */
    ChecksSpec read(Fields checks) {
        int before = problems.count();
        checks.allowOnly(CHECKS_KEYS);
        CheckMethod method = Choices.CHECK_METHOD.optional(checks, "method", ChecksSpec.defaultFor(basis).method());
        PartialFactors factors = PartialFactors.RECOMMENDED;
        Fields factorFields = checks.object("partialFactors", false);
        if (factorFields != null) {
            if (method == CheckMethod.ASCE10) {
                problems.add(checks.path("partialFactors"), "applies to method en1993 only; ASCE 10 has no partial"
                        + " factors on resistance");
            } else {
                factors = partialFactors(factorFields);
            }
        }
        List<BucklingOverride> buckling = list(checks, "bucklingLengths", BUCKLING_KEYS, this::bucklingOverride);
        List<ConnectionSpec> connections = list(checks, "connections", CONNECTION_KEYS, this::connection);
        Fields foundationFields = checks.object("foundation", false);
        FoundationSpec foundation = foundationFields == null ? null : foundation(foundationFields);
        if (buckling != null) {
            overlaps(checks.path("bucklingLengths"), buckling.stream().map(b -> new Cover(b.role(), b.segments())).toList());
        }
        if (connections != null) {
            overlaps(checks.path("connections"), connections.stream().map(c -> new Cover(c.role(), c.segments())).toList());
        }
        if (problems.count() != before) {
            return null;
        }
        return new ChecksSpec(method, factors, buckling, connections, foundation);
    }

    private PartialFactors partialFactors(Fields f) {
        int before = problems.count();
        f.allowOnly(FACTOR_KEYS);
        PartialFactors r = PartialFactors.RECOMMENDED;
        double m0 = f.optionalNumber("gammaM0", PhysicalLimits.PARTIAL_FACTOR, "", r.gammaM0());
        double m1 = f.optionalNumber("gammaM1", PhysicalLimits.PARTIAL_FACTOR, "", r.gammaM1());
        double m2 = f.optionalNumber("gammaM2", PhysicalLimits.PARTIAL_FACTOR, "", r.gammaM2());
        return problems.count() == before ? new PartialFactors(m0, m1, m2) : null;
    }

    /** Reads one entry of a list of objects. */
    private interface EntryReader<T> {
        T read(Fields entry);
    }

    private <T> List<T> list(Fields parent, String key, List<String> keys, EntryReader<T> reader) {
        JsonNode array = parent.array(key, false);
        if (array == null) {
            return List.of();
        }
        int before = problems.count();
        List<T> out = new ArrayList<>();
        for (int k = 0; k < array.size(); k++) {
            Fields f = Fields.of(array.get(k), JsonPaths.index(parent.path(key), k), problems);
            if (f == null) {
                continue;
            }
            f.allowOnly(keys);
            T value = reader.read(f);
            if (value != null) {
                out.add(value);
            }
        }
        return problems.count() == before ? out : null;
    }

    private BucklingOverride bucklingOverride(Fields f) {
        int before = problems.count();
        Role role = Choices.ROLE.required(f, "role");
        List<Integer> segments = segments(f);
        double minor = f.optionalNumber("minorAxisFactor", PhysicalLimits.BUCKLING_FACTOR, "", 1.0);
        double geometric = f.optionalNumber("geometricAxisFactor", PhysicalLimits.BUCKLING_FACTOR, "", 1.0);
        CrossingRule crossing = f.optionalChoice("crossing", "crossing rule", CROSSINGS, List.of(CrossingRule.values()),
                CrossingRule.AUTO);
        if (problems.count() != before) {
            return null;
        }
        return new BucklingOverride(role, segments, minor, geometric, crossing);
    }

    private ConnectionSpec connection(Fields f) {
        int before = problems.count();
        Role role = Choices.ROLE.required(f, "role");
        List<Integer> segments = segments(f);
        Integer bolts = f.requiredWhole("bolts", 1, 1000);
        double d = metricDiameter(f);
        BoltGrade grade = f.requiredChoice("grade", "bolt grade", GRADES, List.of(BoltGrade.values()));
        double clearance = f.optionalNumber("holeClearance_mm", PhysicalLimits.HOLE_CLEARANCE_MM, "mm",
                Double.isNaN(d) ? 0 : ConnectionSpec.assumedHoleClearance(d));
        double d0 = (Double.isNaN(d) ? 0 : d) + (Double.isNaN(clearance) ? 0 : clearance);
        double e1 = f.optionalNumber("endDistance_mm", PhysicalLimits.BOLT_DISTANCE_MM, "mm", ConnectionSpec.ASSUMED_DISTANCE_PER_HOLE * d0);
        double e2 = f.optionalNumber("edgeDistance_mm", PhysicalLimits.BOLT_DISTANCE_MM, "mm", ConnectionSpec.ASSUMED_DISTANCE_PER_HOLE * d0);
        double p1 = f.optionalNumber("pitch_mm", PhysicalLimits.BOLT_DISTANCE_MM, "mm", ConnectionSpec.ASSUMED_PITCH_PER_HOLE * d0);
        Integer planes = f.optionalWhole("shearPlanes", 1, 2, 1);
        Boolean threads = f.optionalBool("threadsInShearPlane", true);
        Integer holes = f.optionalWhole("holesInSection", 0, 4, role == null ? 1 : ConnectionSpec.assumedHolesInSection(role));
        ConnectedLeg leg = f.optionalChoice("connectedLeg", "connected leg", LEGS, List.of(ConnectedLeg.values()),
                ConnectedLeg.LONG);
        if (problems.count() != before) {
            return null;
        }
        return new ConnectionSpec(role, segments, bolts, d, grade, clearance, e1, e2, p1, planes, threads, holes, leg);
    }

    /** A bolt diameter that is a metric coarse size, mm; NaN (reported) otherwise. */
    private double metricDiameter(Fields f) {
        double d = f.requiredNumber("diameter_mm", PhysicalLimits.BOLT_DIAMETER_MM, "mm");
        if (Double.isNaN(d)) {
            return d;
        }
        if (d != Math.rint(d) || !ConnectionSpec.METRIC_SIZES_MM.contains((int) d)) {
            problems.add(f.path("diameter_mm"), "must be a metric coarse thread size from M12 to M72 ("
                    + String.join(", ", ConnectionSpec.METRIC_SIZES_MM.stream().map(String::valueOf).toList())
                    + " mm), was " + Numbers.format(d));
            return Double.NaN;
        }
        return d;
    }

    /** The segment numbers of an entry (empty: every segment); null (reported) when wrong. */
    private List<Integer> segments(Fields f) {
        if (!f.has("segments")) {
            return List.of();
        }
        String path = f.path("segments");
        if (segmentCount == 0) {
            problems.add(path, "an explicit frame has no segments; leave segments out");
            return null;
        }
        JsonNode array = f.array("segments", false);
        if (array == null) {
            return null;
        }
        if (array.isEmpty()) {
            problems.add(path, "must list at least one segment number; leave segments out for every segment");
            return null;
        }
        int before = problems.count();
        List<Integer> numbers = new ArrayList<>();
        int max = segmentCount > 0 ? segmentCount : Integer.MAX_VALUE;
        for (int k = 0; k < array.size(); k++) {
            String at = JsonPaths.index(path, k);
            Integer n = Values.whole(array.get(k), at, 1, max, problems);
            if (n != null && numbers.contains(n)) {
                problems.add(at, "segment " + n + " is listed twice");
            } else if (n != null) {
                numbers.add(n);
            }
        }
        return problems.count() == before ? numbers : null;
    }

    /** Which members an entry covers. */
    private record Cover(Role role, List<Integer> segments) {
        boolean overlaps(Cover o) {
            if (role != o.role) {
                return false;
            }
            if (segments.isEmpty() || o.segments.isEmpty()) {
                return true;
            }
            return segments.stream().anyMatch(o.segments::contains);
        }
    }

    /** At most one entry may cover a member: reports each entry that repeats an earlier one's role and segment. */
    private void overlaps(String path, List<Cover> covers) {
        for (int k = 1; k < covers.size(); k++) {
            for (int j = 0; j < k; j++) {
                if (covers.get(k).overlaps(covers.get(j))) {
                    problems.add(JsonPaths.index(path, k), "covers " + covers.get(k).role().jsonName()
                            + " members already covered by " + JsonPaths.index(path, j) + "; give each role and segment once");
                    break;
                }
            }
        }
    }

    private FoundationSpec foundation(Fields f) {
        int before = problems.count();
        f.allowOnly(FOUNDATION_KEYS);
        FoundationSpec.Block block = null;
        Fields b = f.object("block", true);
        if (b != null) {
            b.allowOnly(BLOCK_KEYS);
            double wx = b.requiredNumber("widthX", PhysicalLimits.BLOCK_SIZE, "m");
            double wy = b.requiredNumber("widthY", PhysicalLimits.BLOCK_SIZE, "m");
            double h = b.requiredNumber("height", PhysicalLimits.BLOCK_SIZE, "m");
            double depth = b.requiredNumber("depth", PhysicalLimits.BLOCK_DEPTH, "m");
            if (problems.count() == before) {
                block = new FoundationSpec.Block(wx, wy, h, depth);
            }
        }
        double concrete = f.optionalNumber("concreteUnitWeight", PhysicalLimits.CONCRETE_UNIT_WEIGHT, "kN/m³", DEFAULT_CONCRETE_UNIT_WEIGHT);
        double soil = f.requiredNumber("soilUnitWeight", PhysicalLimits.SOIL_UNIT_WEIGHT, "kN/m³");
        double angle = f.requiredNumber("frustumHalfAngle", HALF_ANGLE, "degrees");
        FoundationSpec.UpliftRule uplift = basis == DesignBasis.EN
                ? new FoundationSpec.PartialFactor(DEFAULT_GAMMA_STABILISING)
                : new FoundationSpec.FactorOfSafety(DEFAULT_FACTOR_OF_SAFETY);
        Fields u = f.object("uplift", false);
        if (u != null) {
            uplift = uplift(u);
        }
        double bearing = f.requiredNumber("allowableBearing", PhysicalLimits.BEARING, "kPa");
        double friction = f.requiredNumber("friction", PhysicalLimits.FRICTION, "");
        double sliding = f.optionalNumber("slidingFactorOfSafety", PhysicalLimits.FACTOR_OF_SAFETY, "", DEFAULT_FACTOR_OF_SAFETY);
        Fields r = f.object("anchorRods", false);
        FoundationSpec.AnchorRodSpec rods = r == null ? null : anchorRods(r);
        if (problems.count() != before) {
            return null;
        }
        return new FoundationSpec(block, concrete, soil, angle, uplift, bearing, friction, sliding, rods);
    }

    private FoundationSpec.UpliftRule uplift(Fields u) {
        u.allowOnly(UPLIFT_KEYS);
        boolean fs = u.has("factorOfSafety");
        boolean gamma = u.has("gammaStabilising");
        if (fs == gamma) {
            problems.add(u.path(), "give either factorOfSafety (uplift × FS ≤ weights) or gammaStabilising"
                    + " (EN 1997 UPL), " + (fs ? "not both" : "one of them"));
            return null;
        }
        if (fs) {
            double v = u.requiredNumber("factorOfSafety", PhysicalLimits.FACTOR_OF_SAFETY, "");
            return Double.isNaN(v) ? null : new FoundationSpec.FactorOfSafety(v);
        }
        double v = u.requiredNumber("gammaStabilising", PhysicalLimits.PARTIAL_FACTOR, "");
        return Double.isNaN(v) ? null : new FoundationSpec.PartialFactor(v);
    }

    private FoundationSpec.AnchorRodSpec anchorRods(Fields r) {
        int before = problems.count();
        r.allowOnly(ROD_KEYS);
        Integer count = r.requiredWhole("count", 1, 1000);
        boolean byGrade = r.has("grade");
        boolean byStress = r.has("allowableTension") || r.has("allowableShear");
        if (byGrade && byStress) {
            problems.add(r.path(), "give either grade (EN 1993-1-8 resistances) or allowableTension and allowableShear"
                    + " (allowable stresses), not both");
            return null;
        }
        if (!byGrade && !byStress) {
            problems.add(r.path(), "give either grade (" + String.join(", ", ROD_GRADE_NAMES)
                    + ") or allowableTension and allowableShear in MPa");
            return null;
        }
        if (byGrade) {
            double d = metricDiameter(r);
            if (BoltGrade.G10_9.jsonName().equals(r.get("grade").asText())) {
                problems.add(r.path("grade"), "anchor rods of grade 10.9 (f_yb = 900 MPa) are outside EN 1993-1-8 6.2.2 (7),"
                        + " which gives the shear resistance of anchor bolts for 235 ≤ f_yb ≤ 640 MPa; expected one of "
                        + String.join(", ", ROD_GRADE_NAMES));
                return null;
            }
            BoltGrade grade = r.requiredChoice("grade", "anchor rod grade", ROD_GRADE_NAMES, ROD_GRADES);
            return problems.count() == before ? new FoundationSpec.RodsByGrade(count, d, grade) : null;
        }
        double d = r.requiredNumber("diameter_mm", PhysicalLimits.ROD_DIAMETER_MM, "mm");
        double tension = r.requiredNumber("allowableTension", PhysicalLimits.ALLOWABLE_STRESS, "MPa");
        double shear = r.requiredNumber("allowableShear", PhysicalLimits.ALLOWABLE_STRESS, "MPa");
        return problems.count() == before ? new FoundationSpec.RodsByAllowableStress(count, d, tension, shear) : null;
    }
}
