package tetrapod.solve;

import tetrapod.model.NodeForce;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/** The bending continuity of a diagonal through a node that only redundants join (truss idealisation). */
class ContinuityTest {

    private static final Section DIAGONAL = TestFrames.section("diagonal", 1.2e-3, 1.1e-6, 0.45e-6, 2e-8);
    private static final Section REDUNDANT = TestFrames.section("redundant", 0.5e-3, 0.3e-6, 0.12e-6, 1e-8);

    /**
     * A diagonal P(0,0,0)–a(1,0,0)–Q(4,0,0) pinned at P and Q, a redundant from a to a pinned R(1,2,0),
     * a force F along z at a: only the diagonal's bending holds a in z. Closed form for a simply
     * supported span L with a point load at a from one end and b from the other: δ = F a² b²/(3EIL),
     * support forces F·b/L and F·a/L.
     */
    @Test
    void aNodeOnADiagonalDeflectsAsASimplySupportedSpanUnderAPointLoad() throws Exception {
        Frame frame = new Frame("continuity", Idealisation.TRUSS, TestFrames.STEEL,
                List.of(new Node(1, 0, 0, 0), new Node(2, 1, 0, 0), new Node(3, 4, 0, 0), new Node(4, 1, 2, 0)),
                List.of(member(1, 1, 2, Role.DIAGONAL, DIAGONAL), member(2, 2, 3, Role.DIAGONAL, DIAGONAL),
                        member(3, 2, 4, Role.REDUNDANT, REDUNDANT)),
                List.of(new Support(1, Restraint.PINNED), new Support(3, Restraint.PINNED),
                        new Support(4, Restraint.PINNED)));
        StructuralModel model = StructuralModel.of(frame);
        assertEquals(List.of(2), model.continuityNodes().stream().map(ContinuityNode::node).toList());
        assertTrue(model.autoRestraints().stream().noneMatch(r -> r.node() == 2), "held by the diagonal, not restrained");

        double f = 10e3;
        Solution s = Solver.factor(model).solve(new LoadVector("F", List.of(NodeForce.force(2, 0, 0, -f))));
        double e = TestFrames.STEEL.e();
        double iv = 0.45e-6;
        double a = 1;
        double b = 3;
        double span = 4;
        assertEquals(-f * a * a * b * b / (3 * e * iv * span), s.displacement(2).uz(), 1e-12);
        assertEquals(f * b / span, s.reaction(1).fz(), 1e-6 * f);
        assertEquals(f * a / span, s.reaction(3).fz(), 1e-6 * f);
        assertEquals(0, s.reaction(4).fz(), 1e-6 * f);
        assertTrue(s.equilibriumError() < 1e-9);
    }

    @Test
    void rigidMotionOfTheLineStrainsNothing() {
        // Translation and rotation of P, a, Q together (u = c + ω × r) give w = 0: no force.
        Vec3 p = new Vec3(0, 0, 0);
        Vec3 q = new Vec3(3, 1, 2);
        double t = 0.3;
        Vec3 a = p.lerp(q, t);
        ContinuityElement element = new ContinuityElement(0, 1, 2, t, 5e5, q.minus(p).unit());
        NodeConstraints global = new NodeConstraints(new double[3][], new double[3][], new byte[3][6], List.of());
        double[] k = element.assemblyMatrix(global);
        Vec3 c = new Vec3(0.1, -0.2, 0.3);
        Vec3 omega = new Vec3(0.02, 0.05, -0.01);
        double[] u = new double[9];
        Vec3[] points = {p, a, q};
        for (int n = 0; n < 3; n++) {
            Vec3 d = c.plus(omega.cross(points[n]));
            u[3 * n] = d.x();
            u[3 * n + 1] = d.y();
            u[3 * n + 2] = d.z();
        }
        for (int r = 0; r < 9; r++) {
            double force = 0;
            for (int col = 0; col < 9; col++) {
                force += k[9 * r + col] * u[col];
            }
            assertEquals(0, force, 1e-9 * 5e5, "row " + r);
        }
    }

    @Test
    void beamColumnBracingNeedsNoContinuityButPinEndedBracingKeepsItWithSixDofs() {
        List<Node> nodes = List.of(new Node(1, 0, 0, 0), new Node(2, 1, 0, 0), new Node(3, 4, 0, 0), new Node(4, 1, 2, 0));
        List<Support> supports = List.of(new Support(1, Restraint.FIXED), new Support(3, Restraint.FIXED),
                new Support(4, Restraint.FIXED));
        Frame beams = new Frame("beams", Idealisation.FRAME, TestFrames.STEEL, nodes,
                List.of(diagonalBeam(1, 1, 2), diagonalBeam(2, 2, 3),
                        member(3, 2, 4, Role.REDUNDANT, REDUNDANT)), supports);
        assertFalse(StructuralModel.of(beams).continuityNodes().iterator().hasNext(), "the diagonal bends by itself");
        Frame pinned = new Frame("pin-ended", Idealisation.CONTINUOUS_LEGS, TestFrames.STEEL, nodes,
                List.of(member(1, 1, 2, Role.DIAGONAL, DIAGONAL), member(2, 2, 3, Role.DIAGONAL, DIAGONAL),
                        member(3, 2, 4, Role.REDUNDANT, REDUNDANT)), supports);
        assertEquals(List.of(2), StructuralModel.of(pinned).continuityNodes().stream().map(ContinuityNode::node).toList());
    }

    private static Member diagonalBeam(int id, int i, int j) {
        return new Member(id, i, j, Role.DIAGONAL, 0, 0, Face.NONE, DIAGONAL, false, Vec3.Z);
    }

    private static Member member(int id, int i, int j, Role role, Section s) {
        return new Member(id, i, j, role, 0, 0, Face.NONE, s, true, Vec3.Z);
    }
}
