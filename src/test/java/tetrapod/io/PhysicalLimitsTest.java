package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.section.SectionCatalogue;

/**
 * The model file's physical limits (issue 13 item 1): the reader refuses a value beyond each one
 * with its path, the value and the range, and docs/tower-spec.schema.json states the same range.
 */
class PhysicalLimitsTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final Path RIDGE = Path.of("models/ridge-lookout-square.json");
    private static final Path TRUSS = Path.of("models/benchmark-25-bar-space-truss.json");

    /** Schema pointer → the reader's bound for it. */
    private static final Map<String, Bound> SCHEMA = Map.ofEntries(
            Map.entry("/properties/base/properties/widthX", PhysicalLimits.LEG_SPACING),
            Map.entry("/properties/base/properties/widthY", PhysicalLimits.LEG_SPACING),
            Map.entry("/$defs/segment/properties/height", PhysicalLimits.SEGMENT_HEIGHT),
            Map.entry("/$defs/segment/properties/topWidthX", PhysicalLimits.LEG_SPACING),
            Map.entry("/$defs/segment/properties/panelHeights/items", PhysicalLimits.PANEL_HEIGHT),
            Map.entry("/properties/planBracingLevels/items", PhysicalLimits.HEIGHT_ON_TOWER),
            Map.entry("/$defs/material/properties/E", PhysicalLimits.YOUNGS_MODULUS),
            Map.entry("/$defs/material/properties/G", PhysicalLimits.SHEAR_MODULUS),
            Map.entry("/$defs/material/properties/fy", PhysicalLimits.STRENGTH),
            Map.entry("/$defs/material/properties/fu", PhysicalLimits.STRENGTH),
            Map.entry("/$defs/material/properties/density", PhysicalLimits.DENSITY),
            Map.entry("/$defs/userSection/properties/tube/properties/d_mm", PhysicalLimits.SECTION_MM),
            Map.entry("/$defs/userSection/properties/angle/properties/r1_mm", PhysicalLimits.RADIUS_MM),
            Map.entry("/$defs/userSection/properties/properties/properties/A_cm2", PhysicalLimits.AREA_CM2),
            Map.entry("/$defs/userSection/properties/properties/properties/J_cm4", PhysicalLimits.SECOND_MOMENT_CM4),
            Map.entry("/$defs/userSection/properties/properties/properties/mass_kg_per_m", PhysicalLimits.MASS_PER_LENGTH),
            Map.entry("/$defs/frame/properties/nodes/items/properties/z", PhysicalLimits.COORDINATE),
            Map.entry("/$defs/frame/properties/members/items/properties/orientation/items", PhysicalLimits.ORIENTATION),
            Map.entry("/properties/loads/properties/nodal/items/properties/F/items", PhysicalLimits.NODAL_FORCE),
            Map.entry("/$defs/windEn1991/properties/orography", PhysicalLimits.OROGRAPHY),
            Map.entry("/$defs/windEn1991/properties/structuralDamping", PhysicalLimits.LOG_DECREMENT),
            Map.entry("/$defs/windAsce7/properties/dampingRatio", PhysicalLimits.DAMPING_RATIO),
            Map.entry("/$defs/pointItem/properties/weight", PhysicalLimits.ANCILLARY_WEIGHT),
            Map.entry("/$defs/pointItem/properties/area", PhysicalLimits.ANCILLARY_AREA),
            Map.entry("/$defs/linearItem/properties/weight", PhysicalLimits.LINEAR_WEIGHT),
            Map.entry("/$defs/linearItem/properties/width", PhysicalLimits.LINEAR_WIDTH),
            Map.entry("/properties/checks/properties/partialFactors/properties/gammaM1", PhysicalLimits.PARTIAL_FACTOR),
            Map.entry("/properties/checks/properties/connections/items/properties/pitch_mm", PhysicalLimits.BOLT_DISTANCE_MM),
            Map.entry("/properties/checks/properties/foundation/properties/block/properties/height", PhysicalLimits.BLOCK_SIZE),
            Map.entry("/properties/checks/properties/foundation/properties/friction", PhysicalLimits.FRICTION),
            Map.entry("/properties/checks/properties/foundation/properties/anchorRods/properties/allowableTension",
                    PhysicalLimits.ALLOWABLE_STRESS));

    @Test
    void theSchemaStatesTheReadersRanges() throws IOException {
        JsonNode schema = MAPPER.readTree(Path.of("docs/tower-spec.schema.json").toFile());
        SCHEMA.forEach((pointer, bound) -> {
            JsonNode p = schema.at(pointer);
            assertFalse(p.isMissingNode(), pointer);
            String lower = bound.minInclusive() ? "minimum" : "exclusiveMinimum";
            assertEquals(bound.min(), p.path(lower).asDouble(Double.NaN), pointer + " " + lower);
            assertEquals(bound.max(), p.path("maximum").asDouble(Double.NaN), pointer + " maximum");
        });
        assertEquals(PhysicalLimits.MAX_SEGMENTS, schema.at("/properties/segments/maxItems").asInt());
        assertEquals(PhysicalLimits.MAX_PANELS, schema.at("/$defs/segment/properties/panels/maximum").asInt());
        assertEquals(PhysicalLimits.MAX_ANCILLARIES, schema.at("/properties/loads/properties/ancillaries/maxItems").asInt());
        assertEquals(PhysicalLimits.MAX_FRAME_NODES, schema.at("/$defs/frame/properties/nodes/maxItems").asInt());
    }

    static Stream<Arguments> valuesBeyondALimit() {
        return Stream.of(
                Arguments.of(RIDGE, "/base/widthX", 1e6, "must be ≥ 0.1 m and ≤ 200 m, was 1000000.0"),
                Arguments.of(RIDGE, "/base/widthY", 1e-6, "must be ≥ 0.1 m and ≤ 200 m"),
                Arguments.of(RIDGE, "/segments/1/height", 1e-12, "must be ≥ 0.1 m and ≤ 1000 m"),
                Arguments.of(RIDGE, "/segments/0/height", 1e100, "must be ≥ 0.1 m and ≤ 1000 m"),
                Arguments.of(RIDGE, "/segments/2/topWidthX", 1e-300, "must be ≥ 0.1 m and ≤ 200 m"),
                Arguments.of(RIDGE, "/segments/0/panels", 1e9, "must be a whole number from 1 to 5000"),
                Arguments.of(TRUSS, "/material/E", 1e300, "must be ≥ 50000 MPa and ≤ 300000 MPa"),
                Arguments.of(TRUSS, "/material/density", 5e-324, "must be ≥ 2000 kg/m³ and ≤ 10000 kg/m³"),
                Arguments.of(TRUSS, "/frame/nodes/3/y", 1.7976931348623157e308, "must be ≥ -10000 m and ≤ 10000 m"),
                Arguments.of(TRUSS, "/loads/nodal/0/F/1", 1.7e308, "must be ≥ -100000 kN and ≤ 100000 kN"),
                Arguments.of(RIDGE, "/loads/ancillaries/0/area", 1.7e308, "must be ≥ 0 m² and ≤ 1000 m²"),
                Arguments.of(Path.of("models/hilltop-relay-k.json"), "/checks/foundation/anchorRods/allowableTension",
                        1e-308, "must be ≥ 1 MPa and ≤ 2000 MPa"),
                Arguments.of(RIDGE, "/checks/foundation/friction", 0, "must be ≥ 0.05 and ≤ 2"));
    }

    @ParameterizedTest(name = "{1} = {2}")
    @MethodSource("valuesBeyondALimit")
    void aValueBeyondItsLimitIsRefusedWithPathValueAndRange(Path model, String pointer, double value, String message)
            throws Exception {
        ObjectNode root = (ObjectNode) MAPPER.readTree(model.toFile());
        set(root, pointer, value);
        List<Problem> problems = problems(root);
        String path = pointer.substring(1).replaceAll("/(\\d+)", "[$1]").replace('/', '.');
        assertTrue(problems.stream().anyMatch(p -> p.path().equals(path) && p.message().contains(message)),
                path + " " + message + " not in " + problems);
    }

    @Test
    void aShearModulusGivingAPoissonsRatioOutside0To0Point5IsRefused() throws Exception {
        ObjectNode root = (ObjectNode) MAPPER.readTree(TRUSS.toFile());
        ((ObjectNode) root.get("material")).put("E", 210_000).put("G", 120_000);    // ν = −0.125
        List<Problem> problems = problems(root);
        assertTrue(problems.stream().anyMatch(p -> p.path().equals("material.G")
                && p.message().contains("Poisson's ratio E/2G − 1 = -0.125")
                && p.message().contains("70000 to 105000 MPa")), problems.toString());
        ((ObjectNode) root.get("material")).put("G", 81_000);                         // ν = 0.296, steel
        SpecReader.read(MAPPER.writeValueAsString(root), SectionCatalogue.standard());
    }

    @Test
    void legsLeaningMoreThan60DegreesAreRefused() throws Exception {
        ObjectNode root = (ObjectNode) MAPPER.readTree(RIDGE.toFile());
        // segment 2 is 8 m high from 3 m: a 200 m top leans atan(98.5 / 8) = 85.4° from the vertical
        ((ObjectNode) root.at("/segments/2")).put("topWidthX", 200);
        assertTrue(problems(root).stream().anyMatch(p -> p.path().equals("segments[2].topWidthX")
                && p.message().contains("leaning 85.4° from the vertical; at most 60° is allowed")));
    }

    @Test
    void panelsShorterThan50MmAreRefused() throws Exception {
        ObjectNode root = (ObjectNode) MAPPER.readTree(RIDGE.toFile());
        ((ObjectNode) root.at("/segments/2")).put("panels", 400);                     // 8 m / 400 = 20 mm
        assertTrue(problems(root).stream().anyMatch(p -> p.path().equals("segments[2].panels")
                && p.message().contains("0.02 m high; a panel must be at least 0.05 m high")));
    }

    @Test
    void theWholeTowerIsLimitedInHeightAndPanels() throws Exception {
        ObjectNode root = (ObjectNode) MAPPER.readTree(RIDGE.toFile());
        root.remove("planBracingLevels");
        ArrayNode segments = (ArrayNode) root.get("segments");
        for (int k = 0; k < 3; k++) {
            ((ObjectNode) segments.get(k)).put("height", 400).put("panels", 2000).put("topWidthX", 6).put("topWidthY", 6);
        }
        List<Problem> problems = problems(root);
        assertTrue(problems.stream().anyMatch(p -> p.message().contains("a tower 1200 m high; at most 1000 m")), problems.toString());
        assertTrue(problems.stream().anyMatch(p -> p.message().contains("6000 panels in all; at most 5000")), problems.toString());
    }

    @Test
    void anExplicitMemberShorterThan1MmIsRefused() throws Exception {
        ObjectNode root = (ObjectNode) MAPPER.readTree(TRUSS.toFile());
        JsonNode member = root.at("/frame/members/0");
        int i = member.get("i").asInt();
        int j = member.get("j").asInt();
        ObjectNode a = null;
        ObjectNode b = null;
        for (JsonNode n : root.at("/frame/nodes")) {
            a = n.get("id").asInt() == i ? (ObjectNode) n : a;
            b = n.get("id").asInt() == j ? (ObjectNode) n : b;
        }
        b.put("x", a.get("x").asDouble() + 1e-4).put("y", a.get("y").asDouble()).put("z", a.get("z").asDouble());
        List<Problem> problems = problems(root);
        assertTrue(problems.stream().anyMatch(p -> p.path().equals("frame.members[0]")
                && p.message().contains("0.1 mm apart; a member must be at least 1 mm long")), problems.toString());
    }

    @Test
    void aMomentOnATrussIsRefusedAtItsLoad() throws Exception {
        ObjectNode root = (ObjectNode) MAPPER.readTree(TRUSS.toFile());
        assertEquals("truss", root.get("idealisation").asText());
        ArrayNode f = (ArrayNode) root.at("/loads/nodal/0/F");
        f.add(0).add(1).add(0);
        List<Problem> problems = problems(root);
        assertTrue(problems.stream().anyMatch(p -> p.path().equals("loads.nodal[0].F")
                && p.message().contains("the truss idealisation has no rotations")), problems.toString());
    }

    private static List<Problem> problems(JsonNode root) throws IOException {
        String json = MAPPER.writeValueAsString(root);
        return assertThrows(BadInputException.class, () -> SpecReader.read(json, SectionCatalogue.standard()))
                .problems();
    }

    private static void set(ObjectNode root, String pointer, double value) {
        int slash = pointer.lastIndexOf('/');
        JsonNode parent = root.at(pointer.substring(0, slash));
        String key = pointer.substring(slash + 1);
        assertFalse(parent.at("/" + key).isMissingNode(), pointer + " is not in the model");
        if (parent instanceof ArrayNode array) {
            array.set(Integer.parseInt(key), MAPPER.getNodeFactory().numberNode(value));
        } else {
            ((ObjectNode) parent).put(key, value);
        }
    }

    static {
        assertTrue(Files.exists(RIDGE) && Files.exists(TRUSS));
    }
}
