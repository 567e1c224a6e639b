package tetrapod.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.Support;
import tetrapod.model.Vec3;
import tetrapod.model.spec.BaseSpec;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.MaterialSpec;
import tetrapod.model.spec.SupportType;
import tetrapod.model.spec.TowerSpec;

/** Idealisation flags, supports and member orientations. */
class MemberPropertiesTest {

    private static final double TOL = 1e-12;

    private static Frame prismatic(Idealisation idealisation) throws Exception {
        return Specs.generate(Specs.tower(idealisation, 4.0, 4.0, List.of(
                Specs.segment(6.0, 4.0, 4.0, 2, Bracing.SINGLE, Horizontals.ALL, false, 1)), List.of(3.0))).frame();
    }

    @Test
    void generationIsDeterministic() throws Exception {
        TowerSpec spec = ThreeSegments.spec();
        assertEquals(Specs.generate(spec), Specs.generate(spec));
    }

    @Test
    void trussMembersAreAllAxial() throws Exception {
        assertTrue(prismatic(Idealisation.TRUSS).members().stream().allMatch(Member::axialOnly));
    }

    @Test
    void continuousLegsAreBeamColumnsAndBracingIsAxial() throws Exception {
        for (Member m : prismatic(Idealisation.CONTINUOUS_LEGS).members()) {
            assertEquals(m.role() != Role.LEG, m.axialOnly(), m.role() + " member " + m.id());
        }
    }

    @Test
    void inAFrameEveryMemberIsABeamColumn() throws Exception {
        assertTrue(prismatic(Idealisation.FRAME).members().stream().noneMatch(Member::axialOnly));
    }

    @Test
    void fourBaseSupportsPinnedOrFixed() throws Exception {
        for (SupportType type : SupportType.values()) {
            TowerSpec spec = new TowerSpec("t", "", Idealisation.FRAME, new BaseSpec(4, 4),
                    List.of(Specs.segment(6.0, 3.0, 3.0, 2, Bracing.X, Horizontals.ALL, true, 0)),
                    MaterialSpec.grade("S355"), type, 0, List.of(0.0), Map.of(), null, null);
            Frame frame = Specs.generate(spec).frame();
            Restraint expected = type == SupportType.FIXED ? Restraint.FIXED : Restraint.PINNED;
            assertEquals(List.of(new Support(1, expected), new Support(2, expected), new Support(3, expected),
                    new Support(4, expected)), frame.supports());
            for (Support s : frame.supports()) {
                assertEquals(0.0, FrameChecks.at(frame, s.node()).z());
            }
        }
    }

    private static Member between(Frame frame, Vec3 a, Vec3 b) {
        return frame.members().stream().filter(m -> FrameChecks.at(frame, m.i()).distanceTo(a) < 1e-9
                && FrameChecks.at(frame, m.j()).distanceTo(b) < 1e-9).findFirst().orElseThrow();
    }

    private static void assertVec(Vec3 expected, Vec3 actual) {
        assertEquals(expected.x(), actual.x(), TOL);
        assertEquals(expected.y(), actual.y(), TOL);
        assertEquals(expected.z(), actual.z(), TOL);
    }

    @Test
    void prismaticLegPointsToTheAxis() throws Exception {
        Frame frame = prismatic(Idealisation.FRAME);
        double s = Math.sqrt(0.5);
        assertVec(new Vec3(s, s, 0), between(frame, new Vec3(-2, -2, 0), new Vec3(-2, -2, 1.5)).orientation());
        assertVec(new Vec3(-s, s, 0), between(frame, new Vec3(2, -2, 0), new Vec3(2, -2, 1.5)).orientation());
    }

    /**
     * Tapered leg 0 from (−3, −3, 0) to (−2, −2, 10): axis d = (1, 1, 10), inward u = (1, 1, 0).
     * u − (u·d/|d|²) d ∝ 102·(1, 1, 0) − 2·(1, 1, 10) = (100, 100, −20) → (5, 5, −1)/√51.
     */
    @Test
    void taperedLegOrientationIsTheInwardDirectionPerpendicularToTheLeg() throws Exception {
        Frame frame = Specs.generate(Specs.tower(6.0, 6.0, List.of(
                Specs.segment(10.0, 4.0, 4.0, 1, Bracing.X, Horizontals.ALL, true, 0)), List.of())).frame();
        double n = Math.sqrt(51);
        assertVec(new Vec3(5 / n, 5 / n, -1 / n),
                between(frame, new Vec3(-3, -3, 0), new Vec3(-2, -2, 10)).orientation());
    }

    /** Other members: Z × x. A horizontal along +x gives +y; along +y gives −x; the −y face diagonal +y. */
    @Test
    void bracingOrientationIsLevelAndPerpendicular() throws Exception {
        Frame frame = prismatic(Idealisation.TRUSS);
        assertVec(Vec3.Y, between(frame, new Vec3(-2, -2, 0), new Vec3(2, -2, 0)).orientation());
        assertVec(new Vec3(-1, 0, 0), between(frame, new Vec3(2, -2, 0), new Vec3(2, 2, 0)).orientation());
        // single diagonal of face −y, panel 1: (−2, −2, 0) → redundant node (0, −2, 1.5); x = (4, 0, 3)/5
        assertVec(Vec3.Y, between(frame, new Vec3(-2, -2, 0), new Vec3(0, -2, 1.5)).orientation());
        // plan member from leg 0 (−2, −2, 3) to the centre: x = (1, 1, 0)/√2, Z × x = (−1, 1, 0)/√2
        double s = Math.sqrt(0.5);
        assertVec(new Vec3(-s, s, 0), between(frame, new Vec3(-2, -2, 3), new Vec3(0, 0, 3)).orientation());
    }
}
