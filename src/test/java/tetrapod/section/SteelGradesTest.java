package tetrapod.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.model.Material;
import tetrapod.model.spec.MaterialSpec;

/**
 * EN grades against BS EN 10025-2:2004 Table 7 "Mechanical properties of non-alloy structural
 * steels", as reproduced at readle.co.uk/references/steel-grades-eurocodes.php (the 2019 edition
 * keeps these values); S460 against EN 10025-2:2019 Table 7 (recalled from memory).
 */
class SteelGradesTest {

    private static final double MPA = 1e6;
    private static final double MM = 1e-3;

    private static void yieldAndTensile(Material m, double tMm, double fy, double fu) {
        assertEquals(fy * MPA, m.fy(tMm * MM), 1e-6, m.name() + " fy at " + tMm + " mm");
        assertEquals(fu * MPA, m.fu(tMm * MM), 1e-6, m.name() + " fu at " + tMm + " mm");
    }

    @Test
    void s355BandsOfTable7() throws BadInputException {
        Material s355 = SteelGrades.grade("S355");
        yieldAndTensile(s355, 2, 355, 510);    // fu for t < 3 mm
        yieldAndTensile(s355, 3, 355, 470);    // 3 ≤ t ≤ 100 mm
        yieldAndTensile(s355, 16, 355, 470);
        yieldAndTensile(s355, 16.5, 345, 470);
        yieldAndTensile(s355, 40, 345, 470);
        yieldAndTensile(s355, 63, 335, 470);
        yieldAndTensile(s355, 80, 325, 470);
        yieldAndTensile(s355, 100, 315, 470);
        yieldAndTensile(s355, 150, 295, 450);
        yieldAndTensile(s355, 200, 285, 450);
        yieldAndTensile(s355, 250, 275, 450);
        assertThrows(IllegalArgumentException.class, () -> s355.fy(0.26));
    }

    @Test
    void s235AndS275BandsOfTable7() throws BadInputException {
        Material s235 = SteelGrades.grade("S235");
        yieldAndTensile(s235, 10, 235, 360);
        yieldAndTensile(s235, 30, 225, 360);
        yieldAndTensile(s235, 70, 215, 360);
        yieldAndTensile(s235, 120, 195, 350);
        yieldAndTensile(s235, 180, 185, 340);
        Material s275 = SteelGrades.grade("S275");
        yieldAndTensile(s275, 2, 275, 430);
        yieldAndTensile(s275, 10, 275, 410);
        yieldAndTensile(s275, 30, 265, 410);
        yieldAndTensile(s275, 50, 255, 410);
        yieldAndTensile(s275, 70, 245, 410);
        yieldAndTensile(s275, 90, 235, 410);
        yieldAndTensile(s275, 120, 225, 400);
        yieldAndTensile(s275, 240, 205, 380);
    }

    @Test
    void s460RecalledFromMemory() throws BadInputException {
        Material s460 = SteelGrades.grade("S460");
        yieldAndTensile(s460, 10, 460, 540);
        yieldAndTensile(s460, 30, 440, 540);
        yieldAndTensile(s460, 50, 420, 540);
        yieldAndTensile(s460, 70, 400, 540);
        yieldAndTensile(s460, 90, 390, 540);
    }

    @Test
    void elasticConstants() throws BadInputException {
        Material s355 = SteelGrades.grade("S355");
        assertEquals(210_000 * MPA, s355.e(), 1e-3);   // EN 1993-1-1 3.2.6
        assertEquals(81_000 * MPA, s355.g(), 1e-3);
        assertEquals(7850, s355.density(), 1e-12);
        assertTrue(s355.source().contains("EN 1993-1-1 3.2.6"));
        Material a36 = SteelGrades.grade("ASTM A36");
        assertEquals(200_000 * MPA, a36.e(), 1e-3);    // AISC 360: 29 000 ksi
        assertEquals(77_200 * MPA, a36.g(), 1e-3);     // AISC 360: 11 200 ksi
        yieldAndTensile(a36, 25, 250, 400);            // ASTM A36: 36 ksi, 58 ksi
        assertTrue(a36.source().contains("AISC 360"));
        yieldAndTensile(SteelGrades.grade("A572 Gr 50"), 25, 345, 450);   // 50 ksi, 65 ksi
        yieldAndTensile(SteelGrades.grade("a572-50"), 25, 345, 450);
        yieldAndTensile(SteelGrades.grade("ASTM A572 Grade 50"), 25, 345, 450);
    }

    @Test
    void qualitiesShareTheirGradesStrengths() throws BadInputException {
        Material j2 = SteelGrades.grade("s355 j2+n");
        assertEquals("S355J2", j2.name());
        assertEquals(SteelGrades.grade("S355").bands(), j2.bands());
        assertEquals("S275JR", SteelGrades.grade("S275JR").name());
    }

    @Test
    void unknownGradeSuggestsNearNames() {
        BadInputException e = assertThrows(BadInputException.class, () -> SteelGrades.grade("S356"));
        Problem p = e.problems().get(0);
        assertEquals("material", p.path());
        assertTrue(p.message().contains("did you mean S355"), p.message());
        assertThrows(BadInputException.class, () -> SteelGrades.fromSpec(MaterialSpec.grade("S500")));
        assertTrue(SteelGrades.find("S500").isEmpty());
    }

    @Test
    void materialGivenInFull() throws BadInputException {
        Material m = SteelGrades.fromSpec(new MaterialSpec("Tower steel", 205_000, Double.NaN, 350, 450, Double.NaN));
        assertEquals("Tower steel", m.name());
        assertEquals(205_000 * MPA, m.e(), 1e-3);
        assertEquals(205_000 * MPA / 2.6, m.g(), 1e-3);   // E / (2 (1 + 0.3))
        assertEquals(7850, m.density(), 1e-12);
        yieldAndTensile(m, 5, 350, 450);
        yieldAndTensile(m, 500, 350, 450);

        Material full = SteelGrades.fromSpec(new MaterialSpec(null, 200_000, 80_000, 300, 400, 7800), "grades[1]");
        assertEquals(80_000 * MPA, full.g(), 1e-3);
        assertEquals(7800, full.density(), 1e-12);
        assertEquals(SteelGrades.grade("S275").bands(), SteelGrades.fromSpec(MaterialSpec.grade("S275")).bands());
    }

    @Test
    void badMaterialReportsEachField() {
        BadInputException e = assertThrows(BadInputException.class,
                () -> SteelGrades.fromSpec(new MaterialSpec("x", -1, 0, Double.POSITIVE_INFINITY, 400, -5)));
        assertEquals(List.of("material.e", "material.g", "material.fy", "material.density"),
                e.problems().stream().map(Problem::path).toList());
        BadInputException low = assertThrows(BadInputException.class,
                () -> SteelGrades.fromSpec(new MaterialSpec("x", 210_000, 81_000, 400, 300, 7850)));
        assertEquals("material.fu", low.problems().get(0).path());
    }
}
