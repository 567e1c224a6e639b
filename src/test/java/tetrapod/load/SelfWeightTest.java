package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.NodeForce;
import tetrapod.model.Node;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;
import tetrapod.model.Support;
import tetrapod.model.Restraint;
import tetrapod.model.Vec3;

class SelfWeightTest {

    private static final Section TEN_KG_PER_M = new Section("test",
            new SectionShape.Given(0.05, true),
            new SectionProperties(10 / 7850.0, 1e-6, 1e-6, 1e-6, 1e-6, 1e-8, 0, 0, 0, 10.0));
    private static final Material STEEL = new Material("test", 210e9, 81e9, 7850,
            List.of(new Material.StrengthBand(Double.POSITIVE_INFINITY, 355e6, 470e6)), "test");

    @Test
    void halfOfEachMembersWeightGoesToEachEnd() {
        // Node 1 at the origin, node 2 3 m up, node 3 4 m along x from node 2: members of 3 m and 4 m.
        Frame frame = new Frame("two members", Idealisation.TRUSS, STEEL,
                List.of(new Node(1, 0, 0, 0), new Node(2, 0, 0, 3), new Node(3, 4, 0, 3)),
                List.of(member(1, 1, 2), member(2, 2, 3)),
                List.of(new Support(1, Restraint.PINNED)));

        List<NodeForce> loads = SelfWeight.of(frame, 0.10);

        // Worked by hand: w = 10 kg/m × 9.80665 m/s² × 1.10 = 107.87315 N/m.
        double w = 107.87315;
        assertEquals(3, loads.size());
        assertEquals(-w * 3 / 2, loads.get(0).fz(), 1e-9);
        assertEquals(-(w * 3 / 2 + w * 4 / 2), loads.get(1).fz(), 1e-9);
        assertEquals(-w * 4 / 2, loads.get(2).fz(), 1e-9);
        assertEquals(0, loads.get(1).fx());
        assertEquals(0, loads.get(1).fy());
    }

    @Test
    void negativeAllowanceIsRefused() {
        Frame frame = new Frame("one member", Idealisation.TRUSS, STEEL,
                List.of(new Node(1, 0, 0, 0), new Node(2, 0, 0, 3)), List.of(member(1, 1, 2)),
                List.of(new Support(1, Restraint.FIXED)));
        assertThrows(IllegalArgumentException.class, () -> SelfWeight.of(frame, -0.1));
    }

    private static Member member(int id, int i, int j) {
        return new Member(id, i, j, Role.GENERAL, 0, 0, Face.NONE, TEN_KG_PER_M, true, Vec3.Y);
    }
}
