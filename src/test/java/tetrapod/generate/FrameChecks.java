package tetrapod.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Role;
import tetrapod.model.Vec3;

/** Structural invariants every generated frame must satisfy, checked independently of the generator. */
final class FrameChecks {

    private FrameChecks() { }

    static Map<Role, Integer> countByRole(Frame frame) {
        Map<Role, Integer> counts = new EnumMap<>(Role.class);
        for (Member m : frame.members()) {
            counts.merge(m.role(), 1, Integer::sum);
        }
        return counts;
    }

    static Vec3 at(Frame frame, int id) {
        Node n = frame.nodes().get(id - 1);
        assertEquals(id, n.id(), "node ids run 1..n in list order");
        return n.position();
    }

    static void assertSound(Frame frame) {
        List<Node> nodes = frame.nodes();
        for (int k = 0; k < nodes.size(); k++) {
            assertEquals(k + 1, nodes.get(k).id(), "node ids are 1..n in order");
            if (k > 0) {
                assertTrue(nodes.get(k - 1).z() <= nodes.get(k).z(),
                        "node numbering monotone in z at node " + (k + 1));
            }
        }
        Set<List<Integer>> pairs = new HashSet<>();
        for (int k = 0; k < frame.members().size(); k++) {
            Member m = frame.members().get(k);
            assertEquals(k + 1, m.id(), "member ids are 1..m in order");
            assertTrue(m.i() < m.j(), "member " + m.id() + " runs from the lower to the upper node id");
            if (k > 0) {
                Member previous = frame.members().get(k - 1);
                assertTrue(previous.i() < m.i() || previous.i() == m.i() && previous.j() < m.j(),
                        "members ordered by (lower node, upper node)");
            }
            assertTrue(pairs.add(List.of(m.i(), m.j())), "duplicate member " + m.id());
            Vec3 axis = at(frame, m.j()).minus(at(frame, m.i()));
            assertTrue(axis.norm() > 1e-6, "zero-length member " + m.id());
            assertEquals(1.0, m.orientation().norm(), 1e-12, "orientation is a unit vector");
            assertEquals(0.0, m.orientation().dot(axis.unit()), 1e-9, "orientation perpendicular to member " + m.id());
        }
        assertTrue(connected(frame), "every node is connected");
    }

    /** Breadth-first search from node 1 reaches every node. */
    static boolean connected(Frame frame) {
        Map<Integer, List<Integer>> adjacent = new java.util.HashMap<>();
        for (Member m : frame.members()) {
            adjacent.computeIfAbsent(m.i(), k -> new ArrayList<>()).add(m.j());
            adjacent.computeIfAbsent(m.j(), k -> new ArrayList<>()).add(m.i());
        }
        Set<Integer> reached = new HashSet<>();
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        queue.add(frame.nodes().get(0).id());
        reached.add(frame.nodes().get(0).id());
        while (!queue.isEmpty()) {
            for (int next : adjacent.getOrDefault(queue.poll(), List.of())) {
                if (reached.add(next)) {
                    queue.add(next);
                }
            }
        }
        return reached.size() == frame.nodes().size();
    }
}
