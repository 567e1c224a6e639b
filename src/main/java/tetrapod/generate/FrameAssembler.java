package tetrapod.generate;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/**
 * Turns the split member lines of a lattice into a numbered {@link Frame}: drops zero-length
 * pieces (ends merged into one node) and repeated pieces (same two nodes, the first generated
 * kept), numbers nodes bottom-up ({@link NodeOrdering}) and members by (lower node, upper node),
 * sets idealisation flags, orientations and the four base supports.
 */
final class FrameAssembler {

    /**
     * @param frame   the numbered frame
     * @param nodeIds for each registry index, its node id in {@code frame}
     */
    record Assembled(Frame frame, List<Integer> nodeIds) {
        Assembled {
            nodeIds = List.copyOf(nodeIds);
        }
    }

    private record Kept(int i, int j, RawMember source) { }

    private FrameAssembler() { }

    static Assembled assemble(String name, Idealisation idealisation, Material material, Restraint baseRestraint,
                              LatticeBuilder.Lattice lattice, List<MemberSplitter.Piece> pieces, LevelPlan plan) {
        NodeOrdering.Ordering ordering = NodeOrdering.order(lattice.registry().points(), plan);
        List<Integer> nodeIds = ordering.newIndexOf().stream().map(index -> index + 1).toList();
        List<Node> nodes = new ArrayList<>(ordering.positions().size());
        for (Vec3 p : ordering.positions()) {
            nodes.add(new Node(nodes.size() + 1, p.x(), p.y(), p.z()));
        }
        List<Kept> kept = new ArrayList<>();
        Set<Long> seen = new HashSet<>();
        for (MemberSplitter.Piece piece : pieces) {
            int a = nodeIds.get(piece.a());
            int b = nodeIds.get(piece.b());
            if (a != b && seen.add(pairKey(Math.min(a, b), Math.max(a, b)))) {
                kept.add(new Kept(Math.min(a, b), Math.max(a, b), piece.source()));
            }
        }
        kept.sort(Comparator.comparingInt(Kept::i).thenComparingInt(Kept::j));
        List<Member> members = new ArrayList<>(kept.size());
        for (Kept k : kept) {
            members.add(member(members.size() + 1, k, nodes, idealisation));
        }
        List<Support> supports = new ArrayList<>();
        lattice.levelLegNodes().get(0).stream().map(nodeIds::get).sorted()
                .forEach(id -> supports.add(new Support(id, baseRestraint)));
        if (!Connectivity.isConnected(nodes, members)) {
            throw new IllegalStateException("generated lattice is not connected");
        }
        return new Assembled(new Frame(name, idealisation, material, nodes, members, supports), nodeIds);
    }

    private static Member member(int id, Kept k, List<Node> nodes, Idealisation idealisation) {
        Vec3 from = nodes.get(k.i() - 1).position();
        Vec3 to = nodes.get(k.j() - 1).position();
        RawMember s = k.source();
        boolean leg = s.role() == Role.LEG;
        Vec3 orientation = leg ? Orientations.leg(from, to) : Orientations.standard(from, to);
        boolean axialOnly = switch (idealisation) {
            case TRUSS -> true;
            case CONTINUOUS_LEGS -> !leg;
            case FRAME -> false;
        };
        return new Member(id, k.i(), k.j(), s.role(), s.segment(), s.panel(), s.face(), s.section(), axialOnly,
                orientation);
    }

    private static long pairKey(int lower, int upper) {
        return ((long) lower << 32) | (upper & 0xffffffffL);
    }
}
