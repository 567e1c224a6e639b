package tetrapod.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.Vec3;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.TowerSpec;

/** Leg positions follow the linear taper of each segment; levels fall where the spec puts them. */
class TaperGeometryTest {

    private static final double TOL = 1e-9;

    /** Leg spacing of a multi-segment spec at height z, interpolated here from the spec itself. */
    private static double[] widthsAt(TowerSpec spec, double z) {
        double zb = 0;
        double wx = spec.base().widthX();
        double wy = spec.base().widthY();
        for (SegmentSpec s : spec.segments()) {
            if (z <= zb + s.height() + 1e-12) {
                double f = (z - zb) / s.height();
                return new double[] {wx + (s.topWidthX() - wx) * f, wy + (s.topWidthY() - wy) * f};
            }
            zb += s.height();
            wx = s.topWidthX();
            wy = s.topWidthY();
        }
        throw new AssertionError("z above the tower");
    }

    /** Every end of every leg member, redundant-level nodes included, lies on the tapered leg lines. */
    private static void assertLegsOnTaper(TowerSpec spec, Frame frame) {
        int[] sx = {-1, 1, 1, -1};
        int[] sy = {-1, -1, 1, 1};
        for (Member m : frame.members()) {
            if (m.role() != Role.LEG) {
                continue;
            }
            for (int id : List.of(m.i(), m.j())) {
                Vec3 p = FrameChecks.at(frame, id);
                double[] w = widthsAt(spec, p.z());
                int leg = p.y() < 0 ? (p.x() < 0 ? 0 : 1) : (p.x() > 0 ? 2 : 3);
                assertEquals(sx[leg] * w[0] / 2, p.x(), TOL, "x of leg " + leg + " at z = " + p.z());
                assertEquals(sy[leg] * w[1] / 2, p.y(), TOL, "y of leg " + leg + " at z = " + p.z());
            }
        }
    }

    @Test
    void rectangularTaperedTowerLegsFollowTheTaper() throws Exception {
        TowerSpec spec = Specs.tower(7.0, 5.0, List.of(
                Specs.segment(12.0, 4.0, 3.0, 4, Bracing.X, Horizontals.ALL, true, 2),
                Specs.segment(6.0, 2.0, 1.5, 3, Bracing.K, Horizontals.ALL, false, 1)), List.of());
        Tower tower = Specs.generate(spec);
        assertLegsOnTaper(spec, tower.frame());
        for (PanelLevel level : tower.levels()) {
            double[] w = widthsAt(spec, level.z());
            assertEquals(w[0], level.widthX(), TOL);
            assertEquals(w[1], level.widthY(), TOL);
        }
        // the top of segment 1 (z = 12) has exactly the top widths 4 × 3 m
        PanelLevel boundary = tower.levels().get(4);
        assertEquals(12.0, boundary.z(), TOL);
        assertEquals(new Vec3(-2.0, -1.5, 12.0), FrameChecks.at(tower.frame(), boundary.legNodes().get(0)));
        assertEquals(new Vec3(1.0, 0.75, 18.0),
                FrameChecks.at(tower.frame(), tower.levels().get(7).legNodes().get(2)));
    }

    @Test
    void rectangularBaseNodesAreLegsZeroToThreeFirst() throws Exception {
        TowerSpec spec = Specs.tower(8.0, 3.0, List.of(
                Specs.segment(10.0, 6.0, 2.0, 2, Bracing.X, Horizontals.ALL, true, 1)), List.of(0.0));
        Frame frame = Specs.generate(spec).frame();
        assertEquals(new Vec3(-4, -1.5, 0), FrameChecks.at(frame, 1));
        assertEquals(new Vec3(4, -1.5, 0), FrameChecks.at(frame, 2));
        assertEquals(new Vec3(4, 1.5, 0), FrameChecks.at(frame, 3));
        assertEquals(new Vec3(-4, 1.5, 0), FrameChecks.at(frame, 4));
        // the plan bracing centre on the axis comes after the four legs of its level
        assertEquals(new Vec3(0, 0, 0), FrameChecks.at(frame, 5));
        assertEquals(List.of(1, 2, 3, 4), frame.supports().stream().map(s -> s.node()).toList());
        FrameChecks.assertSound(frame);
    }

    @Test
    void prismaticTopSegmentKeepsItsWidth() throws Exception {
        TowerSpec spec = Specs.tower(6.0, 6.0, List.of(
                Specs.segment(10.0, 3.0, 3.0, 3, Bracing.X, Horizontals.ENDS, true, 0),
                Specs.segment(6.0, 3.0, 3.0, 3, Bracing.SINGLE, Horizontals.ALL, false, 2)), List.of());
        Tower tower = Specs.generate(spec);
        assertLegsOnTaper(spec, tower.frame());
        for (Member m : tower.frame().members()) {
            Vec3 a = FrameChecks.at(tower.frame(), m.i());
            Vec3 b = FrameChecks.at(tower.frame(), m.j());
            if (m.role() == Role.LEG && m.segment() == 2) {
                assertEquals(a.x(), b.x(), TOL, "top-segment legs are vertical");
                assertEquals(a.y(), b.y(), TOL, "top-segment legs are vertical");
                assertEquals(1.5, Math.abs(a.x()), TOL);
            }
        }
    }

    @Test
    void explicitPanelHeightsSetTheLevels() throws Exception {
        SegmentSpec seg = new SegmentSpec(9.0, 3.0, 3.0, 3, List.of(2.0, 3.0, 4.0), Bracing.X, Horizontals.ALL,
                true, 0, Specs.allSections());
        TowerSpec spec = Specs.tower(5.0, 5.0, List.of(seg), List.of());
        Tower tower = Specs.generate(spec);
        assertEquals(List.of(0.0, 2.0, 5.0, 9.0), tower.levels().stream().map(PanelLevel::z).toList());
        assertLegsOnTaper(spec, tower.frame());
        // widths at 2 m and 5 m: 5 − 2·(2/9) and 5 − 2·(5/9)
        assertEquals(5 - 4.0 / 9, tower.levels().get(1).widthX(), TOL);
        assertEquals(5 - 10.0 / 9, tower.levels().get(2).widthY(), TOL);
    }

    @Test
    void panelHeightsWithinOneMillimetreAreAccepted() throws Exception {
        SegmentSpec seg = new SegmentSpec(9.0, 3.0, 3.0, 2, List.of(4.0, 4.9995), Bracing.X, Horizontals.ALL,
                true, 0, Specs.allSections());
        Tower tower = Specs.generate(Specs.tower(5.0, 5.0, List.of(seg), List.of()));
        assertEquals(9.0, tower.height(), 0.0, "the top level is the segment top exactly");
    }

    /**
     * In a tapered face the diagonals of a trapezoid with half-widths a (bottom) and b (top) and
     * height h cross on the centre line at z = h·a/(a + b) (similar triangles).
     */
    @Test
    void xCrossingIsTheTrueIntersectionOfATaperedFace() throws Exception {
        TowerSpec spec = Specs.tower(6.0, 4.0, List.of(
                Specs.segment(5.0, 2.0, 2.0, 1, Bracing.X, Horizontals.NONE, true, 0)), List.of());
        Frame frame = Specs.generate(spec).frame();
        Set<Vec3> crossings = new HashSet<>();
        frame.nodes().stream().filter(n -> n.z() > 0 && n.z() < 5).forEach(n -> crossings.add(n.position()));
        assertEquals(4, crossings.size());
        // face Y_MINUS spans x: a = 3, b = 1 → z = 5·3/4 = 3.75; y = −Y(z)/2 = −(4 − 2·0.75)/2 = −1.25
        assertTrue(contains(crossings, new Vec3(0, -1.25, 3.75)));
        // face X_PLUS spans y: a = 2, b = 1 → z = 5·2/3; x = X(z)/2 = (6 − 4·(2/3))/2 = 5/3
        assertTrue(contains(crossings, new Vec3(5.0 / 3, 0, 10.0 / 3)));
    }

    @Test
    void redundantNodesLieAtEqualHeightFractions() throws Exception {
        TowerSpec spec = Specs.tower(6.0, 6.0, List.of(
                Specs.segment(9.0, 3.0, 3.0, 1, Bracing.SINGLE, Horizontals.ENDS, false, 2)), List.of());
        Frame frame = Specs.generate(spec).frame();
        Set<Double> heights = new java.util.TreeSet<>();
        frame.nodes().forEach(n -> heights.add(n.z()));
        assertEquals(Set.of(0.0, 3.0, 6.0, 9.0), heights);
        // single diagonal of face Y_MINUS, panel 1: from leg 0 bottom (−3, −3, 0) to leg 1 top (1.5, −1.5, 9);
        // at z = 3 it is one third of the way: (−1.5, −2.5, 3)
        assertTrue(frame.nodes().stream().anyMatch(n -> n.position().distanceTo(new Vec3(-1.5, -2.5, 3)) < TOL));
    }

    private static boolean contains(Set<Vec3> points, Vec3 p) {
        return points.stream().anyMatch(q -> q.distanceTo(p) < TOL);
    }
}
