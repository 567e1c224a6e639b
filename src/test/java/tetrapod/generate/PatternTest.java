package tetrapod.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.Vec3;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.Horizontals;

/** Where each bracing pattern puts its members, checked on one face by coordinates worked by hand. */
class PatternTest {

    private static final double TOL = 1e-9;

    private static boolean hasMember(Frame frame, Role role, Vec3 a, Vec3 b) {
        return frame.members().stream().anyMatch(m -> m.role() == role && joins(frame, m, a, b));
    }

    private static boolean joins(Frame frame, Member m, Vec3 a, Vec3 b) {
        Vec3 p = FrameChecks.at(frame, m.i());
        Vec3 q = FrameChecks.at(frame, m.j());
        return p.distanceTo(a) < TOL && q.distanceTo(b) < TOL || p.distanceTo(b) < TOL && q.distanceTo(a) < TOL;
    }

    /**
     * Single bracing, two segments of 2 and 3 panels, prismatic 4 m square, 3 m panels. On face
     * Y_MINUS (y = −2, leg 0 at x = −2, leg 1 at x = +2): segment 1 panel 1 from leg 0 bottom to
     * leg 1 top, panel 2 from leg 1 bottom to leg 0 top; segment 2 restarts: its panel 1 (z 6..9)
     * again from leg 0 bottom to leg 1 top.
     */
    @Test
    void singleDiagonalsAlternateAndRestartPerSegment() throws Exception {
        Frame frame = Specs.generate(Specs.tower(4.0, 4.0, List.of(
                Specs.segment(6.0, 4.0, 4.0, 2, Bracing.SINGLE, Horizontals.ALL, false, 0),
                Specs.segment(9.0, 4.0, 4.0, 3, Bracing.SINGLE, Horizontals.ALL, false, 0)), List.of())).frame();
        assertTrue(hasMember(frame, Role.DIAGONAL, new Vec3(-2, -2, 0), new Vec3(2, -2, 3)));
        assertTrue(hasMember(frame, Role.DIAGONAL, new Vec3(2, -2, 3), new Vec3(-2, -2, 6)));
        assertTrue(hasMember(frame, Role.DIAGONAL, new Vec3(-2, -2, 6), new Vec3(2, -2, 9)));
        assertTrue(hasMember(frame, Role.DIAGONAL, new Vec3(2, -2, 9), new Vec3(-2, -2, 12)));
        assertTrue(hasMember(frame, Role.DIAGONAL, new Vec3(-2, -2, 12), new Vec3(2, -2, 15)));
        // face X_PLUS runs from leg 1 (y = −2) to leg 2 (y = +2): panel 1 from leg 1 bottom to leg 2 top
        assertTrue(hasMember(frame, Role.DIAGONAL, new Vec3(2, -2, 0), new Vec3(2, 2, 3)));
        Member first = frame.members().stream()
                .filter(m -> joins(frame, m, new Vec3(-2, -2, 6), new Vec3(2, -2, 9))).findFirst().orElseThrow();
        assertEquals(2, first.segment());
        assertEquals(1, first.panel());
        assertEquals(Face.Y_MINUS, first.face());
    }

    /**
     * K bracing, 1 panel 4 m square prismatic, 4 m high, horizontals all: diagonals from (−2, −2, 0)
     * and (2, −2, 0) to the apex (0, −2, 4); the top horizontal of face Y_MINUS split into
     * (−2, −2, 4)–(0, −2, 4) and (0, −2, 4)–(2, −2, 4); the bottom one whole.
     */
    @Test
    void kDiagonalsMeetAtTheSplitTopHorizontal() throws Exception {
        Frame frame = Specs.generate(Specs.tower(4.0, 4.0, List.of(
                Specs.segment(4.0, 4.0, 4.0, 1, Bracing.K, Horizontals.ALL, false, 0)), List.of())).frame();
        Vec3 apex = new Vec3(0, -2, 4);
        assertTrue(hasMember(frame, Role.DIAGONAL, new Vec3(-2, -2, 0), apex));
        assertTrue(hasMember(frame, Role.DIAGONAL, new Vec3(2, -2, 0), apex));
        assertTrue(hasMember(frame, Role.HORIZONTAL, new Vec3(-2, -2, 4), apex));
        assertTrue(hasMember(frame, Role.HORIZONTAL, apex, new Vec3(2, -2, 4)));
        assertTrue(hasMember(frame, Role.HORIZONTAL, new Vec3(-2, -2, 0), new Vec3(2, -2, 0)));
    }

    /**
     * X not connected, 1 panel, 4 m square, 4 m high, one redundant level at z = 2 with a taper to
     * 2 m so the crossing (z = 4·2/3 = 2.667) is off the level. Face Y_MINUS at z = 2: leg nodes at
     * x = ∓1.5 (half-width 2 − 0.5), y = −1.5; diagonal from (−2, −2, 0) to (1, −1, 4) at z = 2 is at
     * (−0.5, −1.5, 2), the other at (0.5, −1.5, 2). Redundants: (−1.5) → (−0.5) → (0.5) → (1.5).
     */
    @Test
    void redundantsRunLegToDiagonalsToLeg() throws Exception {
        Frame frame = Specs.generate(Specs.tower(4.0, 4.0, List.of(
                Specs.segment(4.0, 2.0, 2.0, 1, Bracing.X, Horizontals.NONE, false, 1)), List.of())).frame();
        assertTrue(hasMember(frame, Role.REDUNDANT, new Vec3(-1.5, -1.5, 2), new Vec3(-0.5, -1.5, 2)));
        assertTrue(hasMember(frame, Role.REDUNDANT, new Vec3(-0.5, -1.5, 2), new Vec3(0.5, -1.5, 2)));
        assertTrue(hasMember(frame, Role.REDUNDANT, new Vec3(0.5, -1.5, 2), new Vec3(1.5, -1.5, 2)));
        assertTrue(hasMember(frame, Role.DIAGONAL, new Vec3(-2, -2, 0), new Vec3(-0.5, -1.5, 2)));
        assertTrue(hasMember(frame, Role.DIAGONAL, new Vec3(-0.5, -1.5, 2), new Vec3(1, -1, 4)));
        assertTrue(hasMember(frame, Role.LEG, new Vec3(-2, -2, 0), new Vec3(-1.5, -1.5, 2)));
    }

    /** Plan bracing: four members from the legs to the centre node, all at the level. */
    @Test
    void planBracingMeetsAtTheCentre() throws Exception {
        Frame frame = Specs.generate(Specs.tower(6.0, 4.0, List.of(
                Specs.segment(8.0, 4.0, 2.0, 2, Bracing.X, Horizontals.ALL, true, 0)), List.of(4.0))).frame();
        Vec3 centre = new Vec3(0, 0, 4);
        for (Vec3 leg : List.of(new Vec3(-2.5, -1.5, 4), new Vec3(2.5, -1.5, 4), new Vec3(2.5, 1.5, 4),
                new Vec3(-2.5, 1.5, 4))) {
            assertTrue(hasMember(frame, Role.PLAN, leg, centre), "plan member from " + leg);
        }
        frame.members().stream().filter(m -> m.role() == Role.PLAN)
                .forEach(m -> assertEquals(Face.NONE, m.face()));
    }
}
