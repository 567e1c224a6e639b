package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.model.Idealisation;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.ExplicitFrameSpec;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.LoadsSpec.NodalLoadSpec;
import tetrapod.model.spec.MaterialSpec;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.SupportType;
import tetrapod.model.spec.TowerSpec;
import tetrapod.model.spec.UserSectionSpec;

/** Reading model files: values as written in the files, defaults filled in, every problem reported. */
class SpecReaderTest {

    private static final FixtureSections CATALOGUE = new FixtureSections();

    private static TowerSpec model(String file) throws BadInputException {
        return SpecReader.read(Path.of("models", file), CATALOGUE);
    }

    private static List<Problem> problems(String json) {
        return assertThrows(BadInputException.class, () -> SpecReader.read(json, CATALOGUE)).problems();
    }

    private static final String SEGMENT = "{ \"height\": 8.0, \"topWidthX\": 3.0, \"topWidthY\": 3.0, \"panels\": 4,"
            + " \"bracing\": \"x\", \"sections\": { \"leg\": \"L100x10\", \"diagonal\": \"L60x6\", \"horizontal\": \"L60x6\" } }";

    private static String tower(String segment, String extra) {
        return "{ \"name\": \"T\", \"base\": { \"widthX\": 4.0, \"widthY\": 4.0 }, \"segments\": [" + segment + "]" + extra + " }";
    }

    @Test
    void ridgeLookoutReadsAsWritten() throws BadInputException {
        TowerSpec spec = model("ridge-lookout-square.json");
        assertEquals("Ridge lookout tower", spec.name());
        assertEquals(Idealisation.CONTINUOUS_LEGS, spec.idealisation());
        assertEquals(6.0, spec.base().widthX());
        assertEquals(6.0, spec.base().widthY());
        assertEquals(3, spec.segments().size());
        SegmentSpec s0 = spec.segments().get(0);
        assertEquals(12.0, s0.height());
        assertEquals(4.5, s0.topWidthX());
        assertEquals(4, s0.panels());
        assertEquals(Bracing.X, s0.bracing());
        assertEquals(Horizontals.ENDS, s0.horizontals());
        assertEquals(1, s0.redundants());
        assertEquals("L150x10", s0.sections().get(Role.LEG));
        assertEquals("L90x7", s0.sections().get(Role.PLAN));
        assertEquals(Map.of(Role.LEG, "L90x7", Role.DIAGONAL, "L70x6", Role.HORIZONTAL, "L90x7"),
                spec.segments().get(2).sections());
        assertEquals(MaterialSpec.grade("S355"), spec.material());
        assertEquals(SupportType.PINNED, spec.supports());
        assertEquals(0.10, spec.connectionAllowance());
        assertEquals(List.of(12.0), spec.planBracingLevels());
        assertEquals(30.0, spec.height(), 1e-12); // 12 + 10 + 8
        assertFalse(spec.isExplicit());
    }

    @Test
    void defaultsAreFilledIn() throws BadInputException {
        TowerSpec spec = model("harbour-beacon-rectangular.json");
        SegmentSpec s1 = spec.segments().get(1);
        assertEquals(0, s1.redundants(), "redundants [0]");
        assertTrue(s1.crossingConnected(), "crossingConnected [true]");
        assertEquals(List.of(), s1.panelHeights(), "equal panels");
        assertEquals(List.of(), spec.planBracingLevels());
        assertEquals(Map.of(), spec.userSections());
        assertEquals(List.of(), spec.loads().nodal());
        assertEquals("S275", spec.material().name());
        assertTrue(spec.material().isGrade());
        assertEquals(SupportType.FIXED, spec.supports());
        assertEquals(0.12, spec.connectionAllowance());

        TowerSpec minimal = read(tower(
                "{ \"height\": 8.0, \"panels\": 4, \"bracing\": \"single\", \"sections\": { \"leg\": \"L100x10\", \"diagonal\": \"L60x6\", \"horizontal\": \"L60x6\" } }",
                ""));
        assertEquals("", minimal.description());
        assertEquals(Idealisation.CONTINUOUS_LEGS, minimal.idealisation(), "the default (issue 11)");
        assertEquals(MaterialSpec.grade("S355"), minimal.material());
        assertEquals(SupportType.PINNED, minimal.supports());
        assertEquals(0.10, minimal.connectionAllowance());
        SegmentSpec only = minimal.segments().get(0);
        assertEquals(4.0, only.topWidthX(), "prismatic: top widths default to the base widths");
        assertEquals(4.0, only.topWidthY());
        assertEquals(Horizontals.ALL, only.horizontals());
    }

    @Test
    void topWidthsDefaultToTheSegmentBelowsTop() throws BadInputException {
        TowerSpec spec = model("hilltop-relay-k.json");
        SegmentSpec head = spec.segments().get(2);
        assertEquals(2.4, head.topWidthX());
        assertEquals(List.of(3.0, 3.0, 3.0, 3.0), head.panelHeights());
        TowerSpec prismatic = read(tower(SEGMENT + ", { \"height\": 4.0, \"panels\": 2, \"bracing\": \"x\","
                + " \"sections\": { \"leg\": \"L90x8\", \"diagonal\": \"L50x5\", \"horizontal\": \"L50x5\" } }", ""));
        assertEquals(3.0, prismatic.segments().get(1).topWidthX());
        assertEquals(3.0, prismatic.segments().get(1).topWidthY());
    }

    @Test
    void explicitFrameWithUserSectionsAndLoads() throws Exception {
        TowerSpec spec = SpecReader.read(Path.of("src/test/resources/good-specs/explicit-frame.json"), CATALOGUE);
        assertTrue(spec.isExplicit());
        ExplicitFrameSpec frame = spec.explicitFrame().orElseThrow();
        assertEquals(5, frame.nodes().size());
        assertEquals(new ExplicitFrameSpec.NodeSpec(5, 1.5, 1.5, 4.0), frame.nodes().get(4));
        ExplicitFrameSpec.MemberSpec m1 = frame.members().get(0);
        assertEquals(Role.LEG, m1.role());
        assertTrue(m1.continuous());
        assertEquals(List.of(0.0, 0.0, 1.0), m1.orientation());
        ExplicitFrameSpec.MemberSpec m4 = frame.members().get(3);
        assertEquals(Role.GENERAL, m4.role(), "role [general]");
        assertFalse(m4.continuous(), "continuous [false]");
        assertNull(m4.orientation());
        assertEquals("CHS 48.3x4", frame.members().get(4).section());
        assertEquals(Restraint.PINNED, frame.supports().get(0).restraint());
        assertEquals(Restraint.FIXED, frame.supports().get(1).restraint());
        assertEquals(new Restraint(false, true, true, false, false, false), frame.supports().get(2).restraint());
        assertEquals(new UserSectionSpec.Tube(48.3, 4.0), spec.userSections().get("CHS 48.3x4"));
        assertEquals(new NodalLoadSpec(5, 10.0, 0.0, -25.0, 0, 0, 0), spec.loads().nodal().get(0));
        assertEquals(new NodalLoadSpec(3, 0.0, -1.0, 0.0, 0.5, 0.0, 0.0), spec.loads().nodal().get(2));
    }

    @Test
    void everyOptionOfAGeneratedTower() throws Exception {
        TowerSpec spec = SpecReader.read(Path.of("src/test/resources/good-specs/every-option-generated.json"), CATALOGUE);
        assertEquals(new MaterialSpec("Test steel 420", 205000, 79000, 420, 520, 7860), spec.material());
        assertEquals(new UserSectionSpec.Angle(130, 130, 12, 14, 7), spec.userSections().get("ANG130"));
        UserSectionSpec.Properties wind2 = (UserSectionSpec.Properties) spec.userSections().get("WIND2");
        assertTrue(Double.isNaN(wind2.massPerMetre()), "mass from A and density when not given");
        assertFalse(wind2.flatSided());
        assertEquals(8.96, ((UserSectionSpec.Properties) spec.userSections().get("BOX1")).massPerMetre());
        assertEquals(List.of(3.5, 3.0, 2.5), spec.segments().get(0).panelHeights());
        assertFalse(spec.segments().get(0).crossingConnected());
        assertEquals(3.6, spec.segments().get(1).topWidthX(), "second segment prismatic");
        assertEquals(0.0, spec.connectionAllowance());
        assertEquals(2, spec.loads().nodal().size(), "generated towers: load node ids not checked before generation");
    }

    @Test
    void threeIndependentProblemsAreAllReported() {
        String json = """
                {
                  "name": "Three faults",
                  "base": { "widthX": 4.0, "widthY": -4.0 },
                  "segments": [
                    { "height": 8.0, "topWidthX": 3.0, "topWidthY": 3.0, "panels": 4,
                      "bracing": "w",
                      "sections": { "leg": "L100x10", "diagonal": "L60x6", "horizontal": "L60x6" } }
                  ],
                  "connectionAllowance": -0.1
                }
                """;
        List<Problem> problems = problems(json);
        assertEquals(List.of(
                new Problem("base.widthY", 3, "must be ≥ 0.1 m and ≤ 200 m, was -4.0"),
                new Problem("segments[0].bracing", 6, "unknown bracing 'w'; expected one of x, k, single"),
                new Problem("connectionAllowance", 9, "must be ≥ 0 and < 1, was -0.1")), problems);
    }

    @Test
    void problemsInSeveralSegmentsAndSectionsAreAllReported() {
        String bad = "{ \"height\": -2, \"topWidthX\": 3.0, \"topWidthY\": 3.0, \"panels\": 2.5,"
                + " \"bracing\": \"x\", \"sections\": { \"leg\": \"L100x11\", \"diagonal\": \"L60x6\" } }";
        List<Problem> problems = problems(tower(SEGMENT + ", " + bad, ""));
        List<String> paths = problems.stream().map(Problem::path).toList();
        assertEquals(List.of("segments[1].height", "segments[1].panels", "segments[1].sections.leg",
                "segments[1].sections.horizontal"), paths);
    }

    @Test
    void unknownSectionSuggestsUserSectionsFirst() {
        String json = tower("{ \"height\": 8.0, \"panels\": 4, \"bracing\": \"x\","
                        + " \"sections\": { \"leg\": \"L100x10\", \"diagonal\": \"L60x6\", \"horizontal\": \"L60x3\" } }",
                ", \"userSections\": { \"L60x3S\": { \"tube\": { \"d_mm\": 60.3, \"t_mm\": 3.2 } } }");
        List<Problem> problems = problems(json);
        assertEquals(1, problems.size(), problems::toString);
        // one edit each from L60x3: the user's L60x3S first, then the catalogue's L60x5 and L60x6
        assertEquals("unknown section 'L60x3'; nearest known: L60x3S, L60x5, L60x6", problems.get(0).message());
    }

    @Test
    void userSectionsMayBeUsedAndMayNotReuseCatalogueNames() throws BadInputException {
        String uses = tower("{ \"height\": 8.0, \"panels\": 4, \"bracing\": \"x\","
                        + " \"sections\": { \"leg\": \"BIG\", \"diagonal\": \"L60x6\", \"horizontal\": \"L60x6\" } }",
                ", \"userSections\": { \"BIG\": { \"angle\": { \"legA_mm\": 200, \"legB_mm\": 150, \"t_mm\": 16,"
                        + " \"r1_mm\": 15, \"r2_mm\": 7.5 } } }");
        assertEquals("BIG", read(uses).segments().get(0).sections().get(Role.LEG));

        String shadows = tower(SEGMENT, ", \"userSections\": { \"L60x6\": { \"tube\": { \"d_mm\": 60, \"t_mm\": 3 } } }");
        Problem p = problems(shadows).get(0);
        assertEquals("userSections.L60x6", p.path());
        assertTrue(p.message().startsWith("the catalogue already has a section named 'L60x6'"), p.message());
    }

    @Test
    void userSectionChecks() {
        String json = tower(SEGMENT, """
                , "userSections": {
                    "A": { "angle": { "legA_mm": 50, "legB_mm": 60, "t_mm": 5, "r1_mm": 6, "r2_mm": 3 } },
                    "B": { "tube": { "d_mm": 20, "t_mm": 11 } },
                    "C": { "properties": { "A_cm2": 10, "Iy_cm4": 50, "Iz_cm4": 40, "Iv_cm4": 45, "J_cm4": 1, "width_mm": 50 } },
                    "D": { "tube": { "d_mm": 20, "t_mm": 2 }, "angle": { "legA_mm": 50, "legB_mm": 50, "t_mm": 5, "r1_mm": 6, "r2_mm": 3 } },
                    "E": { "tub": { "d_mm": 20, "t_mm": 2 } }
                  }""");
        List<Problem> problems = problems(json);
        List<String> shown = problems.stream().map(p -> p.path() + ": " + p.message()).toList();
        assertEquals(List.of(
                "userSections.A.angle.legB_mm: must not exceed legA_mm (50 mm): give the longer leg as legA_mm",
                "userSections.B.tube.t_mm: must not exceed half the diameter (10 mm), was 11",
                "userSections.C.properties.flatSided: required key is missing; expected true or false",
                // Iv is the least second moment about any centroidal axis, so it cannot exceed Iz = 40
                "userSections.C.properties.Iv_cm4: the minor principal value cannot exceed Iy_cm4 or Iz_cm4 (40 cm⁴), was 45",
                "userSections.D: give the section one way only, not as angle and tube",
                "userSections.E.tub: unknown key; did you mean 'tube'?"), shown);
    }

    @Test
    void explicitFrameChecks() {
        String json = """
                { "name": "F",
                  "frame": {
                    "nodes": [ { "id": 1, "x": 0, "y": 0, "z": 0 }, { "id": 2, "x": 0, "y": 0, "z": 3 },
                               { "id": 3, "x": 0, "y": 0, "z": 3 } ],
                    "members": [ { "id": 1, "i": 1, "j": 2, "section": "L60x6", "orientation": [0, 0, 2] },
                                 { "id": 1, "i": 2, "j": 2, "section": "L60x6" },
                                 { "id": 3, "i": 2, "j": 3, "section": "L60x6" },
                                 { "id": 4, "i": 1, "j": 3 } ],
                    "supports": [ { "node": 1, "type": "fixed", "restraint": [1, 1, 1, 1, 1, 1] },
                                  { "node": 9, "type": "pinned" },
                                  { "node": 2, "restraint": [0, 0, 0, 0, 0, 0] },
                                  { "node": 3, "restraint": [1, 1, 2, 0, 0, 0] } ] },
                  "loads": { "nodal": [ { "node": 3, "F": [1, 2] } ] }
                }
                """;
        List<String> shown = problems(json).stream().map(p -> p.path() + ": " + p.message()).toList();
        assertEquals(List.of(
                "frame.members[0].orientation: is parallel to the member (node 1 to node 2); it must point across the member to fix its local y axis",
                "frame.members[1].id: member id 1 is already used by frame.members[0]",
                "frame.members[1].j: a member must join two different nodes; i is also 2",
                "frame.members[2]: nodes 2 and 3 are at the same point: the member would have no length",
                "frame.members[3].section: required key is missing; expected a section name",
                "frame.supports[0].type: give either restraint or type, not both",
                "frame.supports[1].node: node 9 does not exist",
                "frame.supports[2].restraint: holds nothing; hold at least one direction or leave the support out",
                "frame.supports[3].restraint[2]: must be a whole number from 0 to 1, was 2",
                "loads.nodal[0].F: must be [Fx, Fy, Fz] in kN or [Fx, Fy, Fz, Mx, My, Mz] in kN and kN·m; had 2 values"),
                shown);
    }

    @Test
    void missingFileIsBadInputNotACrash() {
        BadInputException e = assertThrows(BadInputException.class,
                () -> SpecReader.read(Path.of("models/no-such-model.json"), CATALOGUE));
        assertEquals("$", e.problems().get(0).path());
        assertTrue(e.problems().get(0).message().contains("no such file"), e.getMessage());
    }

    @Test
    void anyTextIsRefusedWhereANumberBelongs() {
        for (String text : List.of("\"NaN\"", "\"Infinity\"", "\"-inf\"")) {
            Problem p = problems(tower(SEGMENT, ", \"connectionAllowance\": " + text)).get(0);
            assertEquals("connectionAllowance", p.path());
            assertTrue(p.message().endsWith("a value must be a finite number"), p.message());
        }
        Problem p = problems(tower(SEGMENT, ", \"connectionAllowance\": -Infinity")).get(0);
        assertEquals("must be a finite number, was -Infinity", p.message());
    }

    private static TowerSpec read(String json) throws BadInputException {
        return SpecReader.read(json, CATALOGUE);
    }
}
