package tetrapod.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.model.Section;
import tetrapod.model.SectionShape;
import tetrapod.model.spec.UserSectionSpec;

class SectionCatalogueTest {

    private final SectionCatalogue standard = SectionCatalogue.standard();

    @Test
    void theUsualRangeIsThere() {
        List<String> required = List.of("L40x4", "L40x5", "L45x4.5", "L50x5", "L50x6", "L60x6", "L60x8", "L65x7",
                "L70x7", "L75x6", "L75x8", "L80x8", "L80x10", "L90x7", "L90x8", "L90x9", "L90x10", "L100x8",
                "L100x10", "L100x12", "L120x10", "L120x12", "L120x15", "L130x12", "L150x10", "L150x12", "L150x15",
                "L150x18", "L160x15", "L180x16", "L180x18", "L200x16", "L200x18", "L200x20", "L200x24", "L250x25",
                "L250x28", "L60x40x5", "L65x50x5", "L75x50x6", "L75x50x8", "L80x40x6", "L80x60x7", "L100x50x6",
                "L100x65x7", "L100x75x8", "L120x80x8", "L125x75x8", "L150x75x9", "L150x90x10", "L200x100x10");
        for (String name : required) {
            assertEquals(name, standard.find(name).orElseThrow(() -> new AssertionError(name)).name());
        }
        assertTrue(standard.names().containsAll(required));
    }

    @Test
    void namesAreForgivingAndAliasesFold() {
        Section l90 = standard.find("L90x8").orElseThrow();
        assertSame(l90, standard.find("L90x90x8").orElseThrow());
        assertSame(l90, standard.find(" l 90 × 8 ").orElseThrow());
        assertSame(l90, standard.find("L90.0x8.0").orElseThrow());
        Section unequal = standard.find("L100x65x7").orElseThrow();
        assertSame(unequal, standard.find("L65x100x7").orElseThrow());
        var shape = assertInstanceOf(SectionShape.Angle.class, unequal.shape());
        assertEquals(0.100, shape.legA(), 1e-12);
        assertEquals(0.065, shape.legB(), 1e-12);
        assertTrue(standard.find("L91x8").isEmpty());
        assertTrue(standard.find("").isEmpty());
        assertTrue(standard.find(null).isEmpty());
    }

    @Test
    void namesRunFromLightestToHeaviest() {
        List<String> names = standard.names();
        assertEquals("L40x4", names.get(0));
        double previous = 0;
        for (String n : names) {
            double mass = standard.find(n).orElseThrow().massPerMetre();
            assertTrue(mass >= previous, n);
            previous = mass;
        }
    }

    @Test
    void anyTubeByName() {
        Section chs = standard.find("chs 88.90 x 4.0").orElseThrow();
        assertEquals("CHS88.9x4", chs.name());
        var tube = assertInstanceOf(SectionShape.Tube.class, chs.shape());
        assertEquals(0.0889, tube.d(), 1e-12);
        assertEquals(0.004, tube.t(), 1e-12);
        // π (D² − d²)/4 with D = 88.9 mm, d = 80.9 mm
        assertEquals(Math.PI / 4 * (88.9 * 88.9 - 80.9 * 80.9) * 1e-6, chs.area(), 1e-12);
        assertTrue(standard.find("CHS10x5").isEmpty(), "D = 2t is a solid bar");
        assertTrue(standard.find("CHS10x0").isEmpty());
        assertTrue(!standard.names().contains("CHS88.9x4"), "tubes are not enumerated");
    }

    @Test
    void suggestionsForMisspeltNames() {
        assertEquals(List.of("L75x8", "L90x8"), standard.nearest("L95x8", 2));
        assertEquals("L100x65x7", standard.nearest("L100x65x7x", 1).get(0));
        assertEquals(List.of(), standard.nearest("L95x8", 0));
        BadInputException e = assertThrows(BadInputException.class,
                () -> standard.require("L95x8", "segments[0].sections.leg"));
        Problem p = e.problems().get(0);
        assertEquals("segments[0].sections.leg", p.path());
        assertTrue(p.message().contains("did you mean L75x8, L90x8"), p.message());
        BadInputException tube = assertThrows(BadInputException.class, () -> standard.require("CHS20x10", "x"));
        assertTrue(tube.problems().get(0).message().contains("D > 2t"));
    }

    @Test
    void userSectionsAddAndShadowWithoutChangingTheStandardCatalogue() throws BadInputException {
        Map<String, UserSectionSpec> user = new LinkedHashMap<>();
        user.put("LEG-A", new UserSectionSpec.Angle(110, 110, 10, 12, 6));
        user.put("L90x8", new UserSectionSpec.Properties(13.9, 104, 104, 43.1, 3.0, 90, true, Double.NaN));
        user.put("Pipe", new UserSectionSpec.Tube(60.3, 3.2));

        SectionCatalogue mine = standard.with(user);

        Section legA = mine.find("leg-a").orElseThrow();
        assertEquals(AngleProperties.of(new SectionShape.Angle(0.110, 0.110, 0.010, 0.012, 0.006)).area(),
                legA.area(), 1e-15);
        Section shadow = mine.find("L90x90x8").orElseThrow();
        var given = assertInstanceOf(SectionShape.Given.class, shadow.shape());
        assertEquals(0.090, given.windWidth(), 1e-12);
        assertEquals(13.9e-4, shadow.area(), 1e-12);
        // cm⁴ → m⁴; Iu from Iu + Iv = Iy + Iz; mass from A × 7850 kg/m³
        assertEquals(104e-8, shadow.properties().iy(), 1e-15);
        assertEquals((104 + 104 - 43.1) * 1e-8, shadow.properties().iu(), 1e-15);
        assertEquals(13.9e-4 * 7850, shadow.massPerMetre(), 1e-9);
        assertInstanceOf(SectionShape.Tube.class, mine.find("PIPE").orElseThrow().shape());
        assertTrue(mine.names().contains("LEG-A") && mine.names().contains("Pipe"));
        assertEquals(standard.names().size() + 2, mine.names().size());

        assertInstanceOf(SectionShape.Angle.class, standard.find("L90x8").orElseThrow().shape());
        assertTrue(standard.find("LEG-A").isEmpty());
    }

    @Test
    void badUserSectionsReportEveryProblemAtItsPath() {
        Map<String, UserSectionSpec> user = new LinkedHashMap<>();
        user.put("THIN", new UserSectionSpec.Angle(60, 40, 45, 6, 3));
        user.put("NEG", new UserSectionSpec.Angle(-60, 40, 5, 6, 3));
        user.put("BAR", new UserSectionSpec.Tube(20, 10));
        user.put("PROPS", new UserSectionSpec.Properties(10, 50, 40, 60, 0, 80, true, Double.NaN));
        user.put("bar", new UserSectionSpec.Tube(30, 2));

        BadInputException e = assertThrows(BadInputException.class, () -> standard.with(user));

        assertEquals(List.of("userSections.BAR.t", "userSections.NEG.legA", "userSections.PROPS.torsion",
                        "userSections.THIN.t", "userSections.bar"),
                e.problems().stream().map(Problem::path).toList());
    }

    @Test
    void propertiesSectionWithImpossibleMinorAxisIsRejected() {
        var user = Map.of("P", new UserSectionSpec.Properties(10, 50, 40, 60, 1, 80, true, Double.NaN));
        BadInputException e = assertThrows(BadInputException.class, () -> standard.with(user));
        assertEquals("userSections.P.iv", e.problems().get(0).path());
    }
}
