package tetrapod.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.SectionProperties;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/**
 * A frame prepared for solving: its members as elements, the lattice model's own instabilities
 * restrained ({@link #autoRestraints()}), and its degrees of freedom numbered in a banded order.
 * Immutable; build it with {@link #of(Frame)}.
 *
 * <p><b>Idealisations.</b> {@link Idealisation#TRUSS}: three translations per node, every member
 * axial only. {@link Idealisation#CONTINUOUS_LEGS} and {@link Idealisation#FRAME}: six DOFs per
 * node; members with {@code axialOnly == false} are 3D Euler–Bernoulli beam-columns (axial, St
 * Venant torsion, biaxial bending), the others pin-ended bars contributing translational stiffness
 * only. Straight pin-ended bracing split at a node is held across its line in every idealisation
 * ({@link ContinuityElement}).
 *
 * <p><b>Member axes.</b> Local x runs from node i to node j, local y is {@code member.orientation()}
 * (made exactly perpendicular to x), z = x × y. Iy, the second moment about local y, is
 * {@link SectionProperties#iu()} and Iz, about local z, is {@link SectionProperties#iv()}: for an
 * angle the orientation vector is therefore the direction of its major principal axis u–u, and
 * bending about u–u deflects the member along local z. J = {@link SectionProperties#torsion()};
 * E and G from {@link Frame#material()}.
 */
public final class StructuralModel {

    private final Frame frame;
    private final Map<Integer, Integer> nodeIndex;
    private final Map<Integer, Integer> memberIndex;
    private final List<MemberElement> elements;
    private final List<ContinuityElement> continuity;
    private final NodeConstraints constraints;
    private final DofNumbering numbering;
    private final int[] autoRestraintRows;
    private final OrderingSummary ordering;
    private final double size;

    private StructuralModel(Frame frame, Map<Integer, Integer> nodeIndex, Map<Integer, Integer> memberIndex,
                            List<MemberElement> elements, List<ContinuityElement> continuity,
                            NodeConstraints constraints, DofNumbering numbering, OrderingSummary ordering, double size) {
        this.autoRestraintRows = AutoRestraintRows.of(frame, constraints, numbering);
        this.frame = frame;
        this.nodeIndex = nodeIndex;
        this.memberIndex = memberIndex;
        this.elements = elements;
        this.continuity = continuity;
        this.constraints = constraints;
        this.numbering = numbering;
        this.ordering = ordering;
        this.size = size;
    }

    /** {@link #of(Frame, NodeOrdering)} with {@link NodeOrdering#AUTOMATIC}. */
    public static StructuralModel of(Frame frame) {
        return of(frame, NodeOrdering.AUTOMATIC);
    }

    /**
     * Prepares {@code frame} (input, not modified) for solving.
     *
     * @throws IllegalArgumentException when the frame is inconsistent: duplicate node ids, a
     *         member or support naming an unknown node, a zero-length member, a beam-column whose
     *         orientation is parallel to it, or two supports on one node. The model reader is
     *         expected to have reported these to the user already.
     */
    public static StructuralModel of(Frame frame, NodeOrdering ordering) {
        Objects.requireNonNull(frame, "frame");
        Objects.requireNonNull(ordering, "ordering");
        Map<Integer, Integer> nodeIndex = frame.nodeIndex();
        if (nodeIndex.size() != frame.nodes().size()) {
            throw new IllegalArgumentException("frame " + frame.name() + " has duplicate node ids");
        }
        boolean isFrame = frame.idealisation().hasRotations();
        List<MemberElement> elements = new ArrayList<>(frame.members().size());
        Map<Integer, Integer> memberIndex = new HashMap<>(frame.members().size() * 2);
        boolean[] beam = new boolean[frame.members().size()];
        for (int m = 0; m < frame.members().size(); m++) {
            Member member = frame.members().get(m);
            beam[m] = isFrame && !member.axialOnly();
            elements.add(element(frame, nodeIndex, member, beam[m]));
            if (memberIndex.put(member.id(), m) != null) {
                throw new IllegalArgumentException("frame " + frame.name() + " has two members with id " + member.id());
            }
        }
        Set<Integer> supported = new HashSet<>();
        for (Support s : frame.supports()) {
            if (!nodeIndex.containsKey(s.node())) {
                throw new IllegalArgumentException("support at unknown node " + s.node());
            }
            if (!supported.add(s.node())) {
                throw new IllegalArgumentException("node " + s.node() + " has two supports");
            }
        }
        List<ContinuityElement> continuity = ContinuityFinder.find(frame, nodeIndex, beam);
        boolean[] held = new boolean[frame.nodes().size()];
        continuity.forEach(c -> held[c.a()] = true);
        NodeConstraints constraints = StabilityInspector.inspect(frame, nodeIndex, beam, held);
        int[][] adjacency = adjacency(frame.nodes().size(), elements, continuity);
        int[] given = new int[frame.nodes().size()];
        Arrays.setAll(given, k -> k);
        int[] givenPosition = ReverseCuthillMcKee.positions(given);
        int givenBand = ReverseCuthillMcKee.bandwidth(adjacency, givenPosition);
        long givenProfile = ReverseCuthillMcKee.profile(adjacency, givenPosition);
        int[] order = given;
        NodeOrdering used = NodeOrdering.GIVEN;
        if (ordering != NodeOrdering.GIVEN) {
            int[] rcm = ReverseCuthillMcKee.order(adjacency);
            long rcmProfile = ReverseCuthillMcKee.profile(adjacency, ReverseCuthillMcKee.positions(rcm));
            if (ordering == NodeOrdering.REVERSE_CUTHILL_MCKEE || rcmProfile < givenProfile) {
                order = rcm;
                used = NodeOrdering.REVERSE_CUTHILL_MCKEE;
            }
        }
        int[] position = ReverseCuthillMcKee.positions(order);
        OrderingSummary summary = new OrderingSummary(used, ReverseCuthillMcKee.bandwidth(adjacency, position),
                ReverseCuthillMcKee.profile(adjacency, position), givenBand, givenProfile);
        DofNumbering numbering = new DofNumbering(order, isFrame ? 6 : 3, constraints);
        return new StructuralModel(frame, nodeIndex, memberIndex, List.copyOf(elements), List.copyOf(continuity),
                constraints, numbering, summary, size(frame.nodes()));
    }

    private static MemberElement element(Frame frame, Map<Integer, Integer> nodeIndex, Member member, boolean beam) {
        Integer i = nodeIndex.get(member.i());
        Integer j = nodeIndex.get(member.j());
        if (i == null || j == null) {
            throw new IllegalArgumentException("member " + member.id() + " joins unknown node "
                    + (i == null ? member.i() : member.j()));
        }
        Vec3 a = frame.nodes().get(i).position();
        Vec3 b = frame.nodes().get(j).position();
        if (!(a.distanceTo(b) > 0)) {
            throw new IllegalArgumentException("member " + member.id() + " has zero length");
        }
        LocalAxes axes;
        try {
            axes = beam ? LocalAxes.of(a, b, member.orientation()) : LocalAxes.axialOnly(a, b);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("member " + member.id() + ": " + e.getMessage(), e);
        }
        Material mat = frame.material();
        SectionProperties p = member.section().properties();
        return new MemberElement(member, i, j, beam, axes, a.distanceTo(b),
                mat.e() * p.area(), mat.e() * p.iu(), mat.e() * p.iv(), mat.g() * p.torsion());
    }

    /** Sorted, duplicate-free neighbour lists of the node graph (nodes joined by members). */
    private static int[][] adjacency(int nodes, List<MemberElement> elements, List<ContinuityElement> continuity) {
        int[] degree = new int[nodes];
        for (MemberElement e : elements) {
            degree[e.i()]++;
            degree[e.j()]++;
        }
        for (ContinuityElement c : continuity) {
            degree[c.p()]++;
            degree[c.q()]++;
        }
        int[][] adjacency = new int[nodes][];
        for (int n = 0; n < nodes; n++) {
            adjacency[n] = new int[degree[n]];
        }
        int[] fill = new int[nodes];
        for (MemberElement e : elements) {
            adjacency[e.i()][fill[e.i()]++] = e.j();
            adjacency[e.j()][fill[e.j()]++] = e.i();
        }
        for (ContinuityElement c : continuity) {
            adjacency[c.p()][fill[c.p()]++] = c.q();
            adjacency[c.q()][fill[c.q()]++] = c.p();
        }
        for (int n = 0; n < nodes; n++) {
            int[] row = adjacency[n];
            Arrays.sort(row);
            int unique = 0;
            for (int k = 0; k < row.length; k++) {
                if (k == 0 || row[k] != row[k - 1]) {
                    row[unique++] = row[k];
                }
            }
            adjacency[n] = unique == row.length ? row : Arrays.copyOf(row, unique);
        }
        return adjacency;
    }

    /** Diagonal of the nodes' bounding box, m (at least 1e-9). */
    private static double size(List<Node> nodes) {
        double[] lo = {Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE};
        double[] hi = {-Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        for (Node n : nodes) {
            double[] p = {n.x(), n.y(), n.z()};
            for (int a = 0; a < 3; a++) {
                lo[a] = Math.min(lo[a], p[a]);
                hi[a] = Math.max(hi[a], p[a]);
            }
        }
        if (nodes.isEmpty()) {
            return 1e-9;
        }
        double dx = hi[0] - lo[0];
        double dy = hi[1] - lo[1];
        double dz = hi[2] - lo[2];
        return Math.max(Math.sqrt(dx * dx + dy * dy + dz * dz), 1e-9);
    }

    public Frame frame() {
        return frame;
    }

    /** Restraints the solver added for the lattice model's own instabilities, in node order. */
    public List<AutoRestraint> autoRestraints() {
        return constraints.autoRestraints();
    }

    /**
     * The restrained row (see {@link DofNumbering}) of each auto-restraint, in the order of
     * {@link #autoRestraints()}.
     */
    int[] autoRestraintRows() {
        return autoRestraintRows;
    }

    /** Number of unknowns (free degrees of freedom). */
    public int freeDofCount() {
        return numbering.freeCount();
    }

    /** Number of eliminated degrees of freedom (support and auto-restraints). */
    public int restrainedDofCount() {
        return numbering.restrainedCount();
    }

    /** 3 for a truss, 6 for a frame. */
    public int dofsPerNode() {
        return numbering.dofsPerNode();
    }

    public OrderingSummary ordering() {
        return ordering;
    }

    /** Diagonal of the nodes' bounding box, m: the length scale of the structure. */
    public double size() {
        return size;
    }

    /** Position of node {@code id} in frame.nodes(). */
    public int nodeIndex(int id) {
        Integer n = nodeIndex.get(id);
        if (n == null) {
            throw new IllegalArgumentException("unknown node " + id);
        }
        return n;
    }

    /** Position of member {@code id} in frame.members(). */
    public int memberIndex(int id) {
        Integer m = memberIndex.get(id);
        if (m == null) {
            throw new IllegalArgumentException("unknown member " + id);
        }
        return m;
    }

    List<ContinuityElement> continuity() {
        return continuity;
    }

    private List<GeometricLines> geometricLines;

    /** The lines whose chord rotation carries the geometric stiffness (built on first use). */
    synchronized List<GeometricLines> geometricLines() {
        if (geometricLines == null) {
            geometricLines = List.copyOf(GeometricLines.of(this));
        }
        return geometricLines;
    }

    /**
     * Nodes of a truss held across a straight bracing member by its bending stiffness, because
     * only redundants join them there (see {@link ContinuityElement}); empty for a frame.
     */
    public List<ContinuityNode> continuityNodes() {
        List<ContinuityNode> out = new ArrayList<>(continuity.size());
        for (ContinuityElement c : continuity) {
            out.add(new ContinuityNode(frame.nodes().get(c.a()).id(), frame.nodes().get(c.p()).id(),
                    frame.nodes().get(c.q()).id(), c.k()));
        }
        return out;
    }

    List<MemberElement> elements() {
        return elements;
    }

    NodeConstraints constraints() {
        return constraints;
    }

    DofNumbering numbering() {
        return numbering;
    }
}
