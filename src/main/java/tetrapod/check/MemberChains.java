package tetrapod.check;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Role;
import tetrapod.model.Vec3;

/**
 * The collinear lines of members of a frame: members of one role that continue each other in a
 * straight line through their shared nodes (a diagonal split at its crossing and at redundant
 * levels, a horizontal split at a K node, a plan diagonal split at its centre node). Each member
 * lies in exactly one chain; a member with no collinear neighbour is a chain of one.
 */
final class MemberChains {

    /** Directions closer than this (sine of the angle between them) are collinear. */
    private static final double COLLINEAR_SINE = 1e-6;

    /**
     * One line of members.
     *
     * @param members member ids from one end to the other
     * @param nodes   node ids, one more than members: nodes.get(k) and nodes.get(k+1) bound members.get(k)
     * @param along   distance of each node from the first, m
     */
    record Chain(int index, Role role, List<Integer> members, List<Integer> nodes, List<Double> along) {
        Chain {
            members = List.copyOf(members);
            nodes = List.copyOf(nodes);
            along = List.copyOf(along);
        }

        double length() {
            return along.get(along.size() - 1);
        }

        int positionOf(int memberId) {
            return members.indexOf(memberId);
        }

        boolean isInterior(int nodeId) {
            int k = nodes.indexOf(nodeId);
            return k > 0 && k < nodes.size() - 1;
        }
    }

    private final List<Chain> chains = new ArrayList<>();
    private final Map<Integer, Chain> chainOfMember = new HashMap<>();

    MemberChains(Frame frame) {
        Map<Integer, Node> nodes = new HashMap<>();
        frame.nodes().forEach(n -> nodes.put(n.id(), n));
        Map<Integer, Member> members = new HashMap<>();
        Map<Integer, List<Member>> atNode = new HashMap<>();
        for (Member m : frame.members()) {
            members.put(m.id(), m);
            atNode.computeIfAbsent(m.i(), k -> new ArrayList<>()).add(m);
            atNode.computeIfAbsent(m.j(), k -> new ArrayList<>()).add(m);
        }
        for (Member m : frame.members()) {
            if (chainOfMember.containsKey(m.id())) {
                continue;
            }
            // walk back from end i to the first member of the line, then forward to the last
            Member first = m;
            int startNode = m.i();
            while (true) {
                Member previous = continuation(first, startNode, atNode, nodes);
                if (previous == null || previous.id() == m.id()) {
                    break;
                }
                startNode = previous.i() == startNode ? previous.j() : previous.i();
                first = previous;
            }
            List<Integer> ids = new ArrayList<>();
            List<Integer> nodeIds = new ArrayList<>();
            List<Double> along = new ArrayList<>();
            Member current = first;
            int node = startNode;
            nodeIds.add(node);
            along.add(0.0);
            while (current != null && !ids.contains(current.id())) {
                ids.add(current.id());
                int next = current.i() == node ? current.j() : current.i();
                along.add(along.get(along.size() - 1) + position(nodes, node).distanceTo(position(nodes, next)));
                nodeIds.add(next);
                node = next;
                current = continuation(current, node, atNode, nodes);
            }
            Chain chain = new Chain(chains.size(), m.role(), ids, nodeIds, along);
            chains.add(chain);
            ids.forEach(id -> chainOfMember.put(id, chain));
        }
    }

    private static Vec3 position(Map<Integer, Node> nodes, int id) {
        return nodes.get(id).position();
    }

    /** The member of the same role that continues {@code m} in a straight line beyond {@code node}, or null. */
    private static Member continuation(Member m, int node, Map<Integer, List<Member>> atNode, Map<Integer, Node> nodes) {
        int far = m.i() == node ? m.j() : m.i();
        Vec3 in = position(nodes, node).minus(position(nodes, far));
        for (Member other : atNode.getOrDefault(node, List.of())) {
            if (other.id() == m.id() || other.role() != m.role()) {
                continue;
            }
            int otherFar = other.i() == node ? other.j() : other.i();
            Vec3 out = position(nodes, otherFar).minus(position(nodes, node));
            double sine = in.cross(out).norm() / (in.norm() * out.norm());
            if (sine < COLLINEAR_SINE && in.dot(out) > 0) {
                return other;
            }
        }
        return null;
    }

    Chain of(int memberId) {
        Chain chain = chainOfMember.get(memberId);
        if (chain == null) {
            throw new IllegalArgumentException("no member " + memberId);
        }
        return chain;
    }

    List<Chain> all() {
        return List.copyOf(chains);
    }
}
