package tetrapod.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;

class TubePropertiesTest {

    /** Annulus D = 88.9 mm, t = 4 mm (d = 80.9 mm): A = π(D² − d²)/4, I = π(D⁴ − d⁴)/64, J = 2I. */
    @Test
    void annulusClosedForm() {
        double outside = 88.9e-3;
        double inside = 80.9e-3;
        double area = Math.PI / 4 * (outside * outside - inside * inside);
        double i = Math.PI / 64 * (Math.pow(outside, 4) - Math.pow(inside, 4));

        SectionProperties p = TubeProperties.of(new SectionShape.Tube(88.9e-3, 4e-3));

        assertEquals(area, p.area(), 1e-12 * area);
        assertEquals(i, p.iy(), 1e-12 * i);
        assertEquals(i, p.iz(), 1e-12 * i);
        assertEquals(i, p.iu(), 1e-12 * i);
        assertEquals(i, p.iv(), 1e-12 * i);
        assertEquals(2 * i, p.torsion(), 1e-12 * i);
        assertEquals(area * 7850, p.massPerMetre(), 1e-12);
        // thin-ring check, independent of the formula above: A ≈ π D_m t, I ≈ π D_m³ t / 8
        double mean = 84.9e-3;
        assertEquals(Math.PI * mean * 4e-3, area, 1e-12);
        assertEquals(Math.PI * Math.pow(mean, 3) * 4e-3 / 8, i, 0.01 * i);
    }

    @Test
    void solidBarIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> TubeProperties.of(new SectionShape.Tube(0.02, 0.01)));
        assertThrows(IllegalArgumentException.class, () -> TubeProperties.of(new SectionShape.Tube(0.02, 0)));
    }
}
