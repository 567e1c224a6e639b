package tetrapod.solve;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.Vec3;

/**
 * Finds the pin-ended bracing members that run straight through a node: two collinear axial-only
 * members of the same bracing role on opposite sides of a node that no leg reaches (a diagonal split where
 * redundants join it or where it crosses the other diagonal, a horizontal split at a K-node, plan
 * diagonals at their centre). Each such line gets a {@link ContinuityElement}: the real member is
 * continuous there and holds the node across its line by bending, where the pin-jointed model has
 * no stiffness (a redundant chain would sway; a crossing or K-node would have none out of its
 * plane, so that its own weight would go straight to the ground). Legs are left out: a leg node
 * is held by the bracing of its two faces.
 */
final class ContinuityFinder {

    /** Cosine beyond which two member directions count as opposite (about 0.1°). */
    private static final double COLLINEAR = 1 - 1.5e-6;

    private ContinuityFinder() { }

    /** @param memberIsBeam per member index, true for a beam-column (its own bending holds the node) */
    static List<ContinuityElement> find(Frame frame, Map<Integer, Integer> nodeIndex, boolean[] memberIsBeam) {
        int nodes = frame.nodes().size();
        List<List<Member>> atNode = new ArrayList<>(nodes);
        for (int n = 0; n < nodes; n++) {
            atNode.add(new ArrayList<>());
        }
        for (int k = 0; k < frame.members().size(); k++) {
            Member m = frame.members().get(k);
            if (!memberIsBeam[k] || m.role() == Role.LEG) { // a beam leg still marks its nodes as leg nodes
                atNode.get(nodeIndex.get(m.i())).add(m);
                atNode.get(nodeIndex.get(m.j())).add(m);
            }
        }
        List<ContinuityElement> out = new ArrayList<>();
        for (int n = 0; n < nodes; n++) {
            List<Member> members = atNode.get(n);
            if (members.stream().anyMatch(m -> m.role() == Role.LEG)) {
                continue;
            }
            for (int x = 0; x < members.size(); x++) {
                for (int y = x + 1; y < members.size(); y++) {
                    ContinuityElement c = line(frame, nodeIndex, n, members.get(x), members.get(y));
                    if (c != null) {
                        out.add(c);
                    }
                }
            }
        }
        return out;
    }

    /** The continuity of members {@code m1} and {@code m2} through node index {@code n}, or null. */
    private static ContinuityElement line(Frame frame, Map<Integer, Integer> nodeIndex, int n, Member m1, Member m2) {
        if (m1.role() != m2.role() || !isBracing(m1.role())) {
            return null;
        }
        int id = frame.nodes().get(n).id();
        Vec3 here = frame.nodes().get(n).position();
        int p = nodeIndex.get(m1.i() == id ? m1.j() : m1.i());
        int q = nodeIndex.get(m2.i() == id ? m2.j() : m2.i());
        Vec3 toP = frame.nodes().get(p).position().minus(here);
        Vec3 toQ = frame.nodes().get(q).position().minus(here);
        double a = toP.norm();
        double b = toQ.norm();
        if (toP.dot(toQ) / (a * b) > -COLLINEAR) {
            return null;
        }
        double ei = frame.material().e() * Math.min(m1.section().properties().iv(), m2.section().properties().iv());
        double length = a + b;
        return new ContinuityElement(p, n, q, a / length, 3 * ei * length / (a * a * b * b), toQ.minus(toP).unit());
    }

    private static boolean isBracing(Role role) {
        return role == Role.DIAGONAL || role == Role.HORIZONTAL || role == Role.PLAN || role == Role.REDUNDANT;
    }
}
