package tetrapod.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.common.Problem;
import tetrapod.model.SectionShape;

class AnglePropertiesTest {

    private static final double MM = 1e-3;
    private static final double MM2 = 1e-6;
    private static final double MM4 = 1e-12;

    private static SectionShape.Angle angle(double a, double b, double t, double r1, double r2) {
        return new SectionShape.Angle(a * MM, b * MM, t * MM, r1 * MM, r2 * MM);
    }

    private static double sq(double x) {
        return x * x;
    }

    /**
     * 100 × 50 × 10 with sharp corners, worked by hand as two rectangles: leg A 100 × 10 along y
     * (centroid 50, 5), leg B 10 × 40 above it (centroid 5, 30); parallel-axis theorem.
     */
    @Test
    void sharpCorneredUnequalAngleByHand() {
        double area = 1000 + 400;
        double yBar = (1000 * 50 + 400 * 5) / area;   // 37.142857 mm
        double zBar = (1000 * 5 + 400 * 30) / area;   // 12.142857 mm
        double iy = 100 * 1000 / 12.0 + 1000 * sq(5 - zBar) + 10 * 64000 / 12.0 + 400 * sq(30 - zBar);
        double iz = 10 * 1e6 / 12.0 + 1000 * sq(50 - yBar) + 40 * 1000 / 12.0 + 400 * sq(5 - yBar);
        double iyz = 1000 * (50 - yBar) * (5 - zBar) + 400 * (5 - yBar) * (30 - zBar);

        AngleProperties p = AngleProperties.of(angle(100, 50, 10, 0, 0));

        assertEquals(area * MM2, p.area(), 1e-12 * area * MM2);
        assertEquals(yBar * MM, p.centroidY(), 1e-12);
        assertEquals(zBar * MM, p.centroidZ(), 1e-12);
        assertEquals(iy * MM4, p.iy(), 1e-9 * iy * MM4);
        assertEquals(iz * MM4, p.iz(), 1e-9 * iz * MM4);
        assertEquals(iyz * MM4, p.iyz(), 1e-9 * Math.abs(iyz) * MM4);
        assertTrue(p.iyz() < 0, "material lies along +y and +z of the centroid in opposite quadrants");
        // principal values: invariants of the inertia tensor (trace and determinant)
        assertEquals((iy + iz) * MM4, p.iu() + p.iv(), 1e-9 * (iy + iz) * MM4);
        assertEquals((iy * iz - iyz * iyz), p.iu() * p.iv() / (MM4 * MM4), 1e-9 * iy * iz);
        // tan 2α = 2|Iyz| / (Iz − Iy), α measured from z–z
        assertEquals(Math.tan(0.5 * Math.atan(2 * Math.abs(iyz) / (iz - iy))), p.tanAlpha(), 1e-12);
        assertEquals(0.2557, p.tanAlpha(), 5e-4); // by hand: α = 14.34°
        assertEquals(area * MM2 * 7850, p.massPerMetre(), 1e-12);
    }

    /** 100 × 100 × 10 sharp-cornered: 1900 mm², c = 54500/1900 mm, symmetric about y = z. */
    @Test
    void sharpCorneredEqualAngleByHand() {
        double c = (1000 * 50 + 900 * 5) / 1900.0;
        double i = 100 * 1000 / 12.0 + 1000 * sq(5 - c) + 10 * 729000 / 12.0 + 900 * sq(55 - c);
        double iyz = 1000 * (50 - c) * (5 - c) + 900 * (5 - c) * (55 - c);

        AngleProperties p = AngleProperties.of(angle(100, 100, 10, 0, 0));

        assertEquals(1900 * MM2, p.area(), 1e-15);
        assertEquals(c * MM, p.centroidY(), 1e-12);
        assertEquals(c * MM, p.centroidZ(), 1e-12);
        assertEquals(i * MM4, p.iy(), 1e-9 * i * MM4);
        assertEquals(i * MM4, p.iz(), 1e-9 * i * MM4);
        // on the axis of symmetry and across it: I ± |Iyz|
        assertEquals((i - iyz) * MM4, p.iu(), 1e-9 * i * MM4);
        assertEquals((i + iyz) * MM4, p.iv(), 1e-9 * i * MM4);
        assertEquals(1.0, p.tanAlpha(), 1e-12);
    }

    /** The root fillet adds r1²(1 − π/4), each toe rounding takes away r2²(1 − π/4). */
    @Test
    void filletAndToeAreasAreExact() {
        double sharp = AngleProperties.of(angle(100, 65, 7, 0, 0)).area();
        double rounded = AngleProperties.of(angle(100, 65, 7, 10, 5)).area();
        double spandrel = 1 - Math.PI / 4;
        assertEquals((10 * 10 - 2 * 5 * 5) * spandrel * MM2, rounded - sharp, 1e-15);
    }

    @Test
    void equalAngleIsSymmetric() {
        AngleProperties p = AngleProperties.of(angle(90, 90, 8, 11, 5.5));
        assertEquals(p.iy(), p.iz(), 1e-12 * p.iy());
        assertEquals(p.centroidY(), p.centroidZ(), 1e-15);
        assertEquals(1.0, p.tanAlpha(), 1e-9);
        assertTrue(p.iv() < p.iy() && p.iy() < p.iu());
    }

    /**
     * Thin-walled limit: for legs much longer than thick, J → Σ b t³/3 over the centre lines,
     * (a + b − t) t³/3 (Saint-Venant theory of thin open sections).
     */
    @Test
    void torsionConstantTendsToThinWalledValue() {
        double a = 1000, b = 600, t = 1;
        double thin = (a + b - t) * t * t * t / 3;
        double j = AngleProperties.of(angle(a, b, t, 0, 0)).torsion() / MM4;
        assertEquals(thin, j, 1e-3 * thin);
    }

    @Test
    void torsionConstantOfRolledAngleIsNearThinWalledEstimate() {
        // L100x10, r1 = 12: the root fillet stiffens the corner, so J exceeds (a + b − t) t³/3
        // somewhat, but far less than by the size of the fillet's own inscribed circle.
        double thin = (100 + 100 - 10) * 1000 / 3.0;
        double j = AngleProperties.of(angle(100, 100, 10, 12, 6)).torsion() / MM4;
        assertTrue(j > thin && j < 1.2 * thin, "J = " + j + " mm⁴, thin-walled " + thin);
    }

    @Test
    void badDimensionsAreReportedAtTheirKeys() {
        List<Problem> negative = AngleProperties.problems(angle(90, 90, -1, 11, 5.5), "s");
        assertEquals(List.of("s.t"), negative.stream().map(Problem::path).toList());

        List<Problem> tooThick = AngleProperties.problems(angle(60, 40, 40, 6, 3), "s");
        assertEquals(List.of("s.t"), tooThick.stream().map(Problem::path).toList());

        List<Problem> swapped = AngleProperties.problems(angle(40, 60, 5, 6, 3), "s");
        assertEquals(List.of("s.legB"), swapped.stream().map(Problem::path).toList());

        List<Problem> radii = AngleProperties.problems(angle(60, 40, 5, 30, 6), "s");
        assertEquals(List.of("s.r1", "s.r2"), radii.stream().map(Problem::path).toList());

        assertTrue(AngleProperties.problems(angle(60, 40, 5, 6, 3), "s").isEmpty());
        assertThrows(IllegalArgumentException.class, () -> AngleProperties.of(angle(60, 40, 5, 30, 6)));
    }
}
