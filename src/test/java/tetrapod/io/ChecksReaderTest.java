package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.model.Role;
import tetrapod.model.spec.BoltGrade;
import tetrapod.model.spec.BucklingOverride;
import tetrapod.model.spec.CheckMethod;
import tetrapod.model.spec.ChecksSpec;
import tetrapod.model.spec.ConnectedLeg;
import tetrapod.model.spec.ConnectionSpec;
import tetrapod.model.spec.CrossingRule;
import tetrapod.model.spec.FoundationSpec;
import tetrapod.model.spec.PartialFactors;

/** Reading {@code checks}: every key, the defaults filled in, and what is refused. */
class ChecksReaderTest {

    private static final FixtureSections CATALOGUE = new FixtureSections();
    private static final String TOWER = """
            { "name": "T", "base": { "widthX": 4, "widthY": 4 },
              "segments": [ { "height": 8, "panels": 4, "bracing": "x",
                              "sections": { "leg": "L100x10", "diagonal": "L60x6", "horizontal": "L60x6" } },
                            { "height": 6, "panels": 3, "bracing": "x",
                              "sections": { "leg": "L90x9", "diagonal": "L50x5", "horizontal": "L50x5" } } ]
              %s }""";

    private static ChecksSpec read(String checks) throws BadInputException {
        return SpecReader.read(String.format(TOWER, checks.isEmpty() ? "" : ", \"checks\": " + checks), CATALOGUE).checks();
    }

    @Test
    void everyKeyOfTheTestModel() throws BadInputException {
        ChecksSpec c = SpecReader.read(Path.of("src/test/resources/good-specs/every-option-generated.json"), CATALOGUE)
                .checks();
        assertEquals(CheckMethod.EN1993, c.method());
        assertEquals(new PartialFactors(1.05, 1.1, 1.3), c.partialFactors());
        assertEquals(new BucklingOverride(Role.DIAGONAL, List.of(1, 3), 0.9, 1.2, CrossingRule.UNSUPPORTED),
                c.bucklingLengths().get(0));
        assertEquals(new ConnectionSpec(Role.LEG, List.of(1), 12, 24, BoltGrade.G10_9, 2, 40, 45, 75, 2, false, 2,
                ConnectedLeg.LONG), c.connections().get(0));
        FoundationSpec f = c.foundation();
        assertEquals(new FoundationSpec.Block(2.0, 1.6, 1.5, 1.2), f.block());
        assertEquals(new FoundationSpec.PartialFactor(0.9), f.uplift());
        assertEquals(new FoundationSpec.RodsByAllowableStress(3, 120, 60, 35), f.anchorRods());
        assertEquals(23.5, f.concreteUnitWeight());
        assertEquals(1.3, f.slidingFactorOfSafety());
    }

    /**
     * A connection with only bolts, size and grade: an M12 hole is 1 mm over (EN 1090-2), so d0 = 13 mm,
     * e1 = e2 = 1.5 · 13 = 19.5 mm and p1 = 3 · 13 = 39 mm (assumed); one shear plane, threads in it,
     * one hole for a diagonal, two for a leg; the long leg connected.
     */
    @Test
    void connectionDefaultsAreFilledIn() throws BadInputException {
        ChecksSpec c = read("""
                { "connections": [ { "role": "diagonal", "bolts": 1, "diameter_mm": 12, "grade": "4.6" },
                                   { "role": "leg", "bolts": 6, "diameter_mm": 20, "grade": "8.8" } ] }""");
        assertEquals(new ConnectionSpec(Role.DIAGONAL, List.of(), 1, 12, BoltGrade.G4_6, 1, 19.5, 19.5, 39, 1, true, 1,
                ConnectedLeg.LONG), c.connections().get(0));
        assertEquals(2, c.connections().get(1).holesInSection());
        assertEquals(2.0, c.connections().get(1).holeClearance());
    }

    @Test
    void foundationDefaults() throws BadInputException {
        ChecksSpec c = read("""
                { "method": "asce10", "foundation": { "block": { "widthX": 2, "widthY": 2, "height": 1, "depth": 2 },
                  "soilUnitWeight": 18, "frustumHalfAngle": 20, "allowableBearing": 200, "friction": 0.4 } }""");
        FoundationSpec f = c.foundation();
        assertEquals(25.0, f.concreteUnitWeight());                       // EN 1991-1-1 Table A.1
        assertEquals(new FoundationSpec.FactorOfSafety(1.5), f.uplift()); // common practice
        assertEquals(1.5, f.slidingFactorOfSafety());
        assertNull(f.anchorRods());
        assertEquals(PartialFactors.RECOMMENDED, c.partialFactors());
    }

    @Test
    void absentChecksAreTheDefault() throws BadInputException {
        assertEquals(ChecksSpec.DEFAULT, read(""));
        assertEquals(ChecksSpec.DEFAULT, read("{ }"));
        assertEquals(new PartialFactors(1.0, 1.0, 1.25), ChecksSpec.DEFAULT.partialFactors());
    }

    @Test
    void everyProblemAtOnce() {
        BadInputException e = assertThrows(BadInputException.class, () -> read("""
                { "partialFactors": { "gammaM0": 0, "gamaM1": 1 },
                  "connections": [ { "role": "diagonals", "bolts": 0, "diameter_mm": 16, "grade": "8.8" } ],
                  "foundation": { "block": { "widthX": 2, "widthY": 2, "height": 1 }, "soilUnitWeight": 18,
                                  "frustumHalfAngle": 20, "allowableBearing": 200, "friction": 0.4,
                                  "anchorRods": { "count": 4, "diameter_mm": 24, "grade": "8.8", "allowableTension": 100 } } }"""));
        List<String> paths = e.problems().stream().map(Problem::path).toList();
        assertTrue(paths.containsAll(List.of("checks.partialFactors.gammaM0", "checks.partialFactors.gamaM1",
                "checks.connections[0].role", "checks.connections[0].bolts", "checks.foundation.block.depth",
                "checks.foundation.anchorRods")), paths.toString());
    }

    @Test
    void explicitFramesHaveNoSegments() {
        String frame = """
                { "name": "F", "frame": { "nodes": [ { "id": 1, "x": 0, "y": 0, "z": 0 }, { "id": 2, "x": 0, "y": 0, "z": 3 } ],
                  "members": [ { "id": 1, "i": 1, "j": 2, "section": "L60x6" } ], "supports": [ { "node": 1, "type": "fixed" } ] },
                  "checks": { "connections": [ { "role": "general", "segments": [1], "bolts": 2, "diameter_mm": 16, "grade": "8.8" } ] } }""";
        BadInputException e = assertThrows(BadInputException.class, () -> SpecReader.read(frame, CATALOGUE));
        assertEquals("checks.connections[0].segments", e.problems().get(0).path());
        assertTrue(e.problems().get(0).message().contains("an explicit frame has no segments"));
    }

    @Test
    void withoutSegmentsKeepsTheFirstEntryOfEachRole() throws BadInputException {
        ChecksSpec c = read("""
                { "connections": [ { "role": "diagonal", "segments": [1], "bolts": 2, "diameter_mm": 16, "grade": "8.8" },
                                   { "role": "diagonal", "segments": [2], "bolts": 1, "diameter_mm": 12, "grade": "8.8" } ] }""");
        ChecksSpec flat = c.withoutSegments();
        assertEquals(1, flat.connections().size());
        assertEquals(2, flat.connections().get(0).bolts());
        assertTrue(flat.connections().get(0).segments().isEmpty());
    }
}
