package tetrapod.check;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.IntToDoubleFunction;
import tetrapod.generate.Tower;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.spec.BucklingOverride;
import tetrapod.model.spec.CrossingRule;

/**
 * Buckling lengths of every member, found from the generated geometry (see the generator's
 * package notes: legs are split at every bracing node, diagonals at their crossings and at
 * redundant levels, horizontals at K nodes).
 *
 * <ul>
 * <li><b>Legs</b>: the member itself, the length between bracing nodes, in both directions
 *     (EN 1993-3-1 H.2 (2): legs braced symmetrically in both faces; slenderness from the system
 *     length between nodes).</li>
 * <li><b>Bracing</b> (diagonals, horizontals, redundants, plan bracing): the collinear line of
 *     members forming the whole brace is found. Minor axis (v–v): the member between its nodes,
 *     since every node along the line (crossing, redundant, K node) holds it in the face's plane.
 *     Geometric axes (out of the face's plane): the whole line, end to end, because redundants and
 *     horizontals lie in the face and give no support out of it; but when two diagonals (or two
 *     plan diagonals) of the same role cross and are joined, the crossing holds the compressed one
 *     out of plane when the other is in tension in the same load case (the rule for X bracing with
 *     one diagonal in tension: common practice, as in ASCE 10 and EN 1993-3-1 Annex H, recalled
 *     from memory; no minimum tension is required). The user may fix the crossing as always or
 *     never holding, and scale either length, per role and segment.</li>
 * <li><b>General members</b> (explicit frames): the member's own length about every axis; the
 *     nodes are taken as braced points.</li>
 * </ul>
 */
public final class BucklingLengths {

    private final MemberChains chains;
    private final List<Member> members;
    private final Map<Integer, Integer> index = new HashMap<>();
    private final double[] lengths;
    private final List<BucklingOverride> overrides;
    /** For each node, the chains (of diagonals or plan bracing) that pass through it. */
    private final Map<Integer, List<MemberChains.Chain>> passingThrough = new HashMap<>();
    /** Per member (frame order): how its out-of-plane span is found in a case. */
    private final Scan[] scans;

    /**
     * How the out-of-plane span of one member is found: from its position {@code k} in a line
     * of {@code last} members, the span runs back and forward to the nearest interior nodes that
     * hold. Node p (0 < p < last) holds always ({@code always[p]}), or when both members of some
     * crossing partner line at p are in tension: the member indices {@code pairs[p][2q]} and
     * {@code pairs[p][2q + 1]}. A leg or general member has no line ({@code last} = 0).
     */
    private record Scan(int k, int last, boolean[] always, int[][] pairs) { }

    private BucklingLengths(Frame frame, List<BucklingOverride> overrides) {
        this.chains = new MemberChains(frame);
        this.overrides = List.copyOf(overrides);
        this.members = frame.members();
        this.lengths = frame.memberLengths();
        for (int k = 0; k < members.size(); k++) {
            index.put(members.get(k).id(), k);
        }
        for (MemberChains.Chain c : chains.all()) {
            if (c.role() == Role.DIAGONAL || c.role() == Role.PLAN) {
                for (int k = 1; k < c.nodes().size() - 1; k++) {
                    passingThrough.computeIfAbsent(c.nodes().get(k), n -> new ArrayList<>()).add(c);
                }
            }
        }
        this.scans = new Scan[members.size()];
        for (int m = 0; m < members.size(); m++) {
            scans[m] = scan(members.get(m));
        }
    }

    /** The buckling lengths of a tower's members, with the user's overrides (from {@code checks.bucklingLengths}). */
    public static BucklingLengths of(Tower tower, List<BucklingOverride> overrides) {
        return of(tower.frame(), overrides);
    }

    public static BucklingLengths of(Frame frame, List<BucklingOverride> overrides) {
        return new BucklingLengths(frame, overrides);
    }

    /**
     * The lengths of member {@code memberId} in a load case whose axial forces (N, positive in
     * tension) {@code axialForce} gives by member id: the crossing of an X pair holds out of plane
     * when the partner diagonal is in tension.
     */
    public BucklingLength forCase(int memberId, IntToDoubleFunction axialForce) {
        int m = indexOf(memberId);
        return lengths(m, state(m, k -> axialForce.applyAsDouble(members.get(k).id())));
    }

    /**
     * Which of its few possible buckling states member {@code memberIndex} (frame order) is in,
     * for a case whose axial forces (N, positive in tension) {@code axialByIndex} gives by frame
     * index: two cases in the same state have the same lengths ({@link #lengths}). Asks only for
     * the forces of the member's crossing partners; 0 for legs and general members.
     */
    public int state(int memberIndex, IntToDoubleFunction axialByIndex) {
        Scan scan = scans[memberIndex];
        if (scan.last() == 0) {
            return 0;
        }
        int start = scan.k();
        while (start > 0 && !holds(scan, start, axialByIndex)) {
            start--;
        }
        int end = scan.k() + 1;
        while (end < scan.last() && !holds(scan, end, axialByIndex)) {
            end++;
        }
        return start * (scan.last() + 1) + end;
    }

    /** The lengths of member {@code memberIndex} (frame order) in buckling state {@code state} ({@link #state}). */
    public BucklingLength lengths(int memberIndex, int state) {
        Member m = members.get(memberIndex);
        double length = lengths[memberIndex];
        BucklingOverride override = override(m);
        double minorFactor = override == null ? 1.0 : override.minorAxisFactor();
        double geometricFactor = override == null ? 1.0 : override.geometricAxisFactor();
        if (m.role() == Role.LEG || m.role() == Role.GENERAL) {
            BucklingLength base = BucklingLength.between(length);
            return new BucklingLength(length, base.minorAxis().scaled(minorFactor),
                    base.geometricAxis().scaled(geometricFactor));
        }
        Scan scan = scans[memberIndex];
        MemberChains.Chain chain = chains.of(m.id());
        int k = scan.k();
        int last = scan.last();
        int ends = (k == 0 ? 1 : 0) + (k + 1 == last ? 1 : 0);
        BucklingSpan minor = new BucklingSpan(length, ends, 2 - ends);
        int start = state / (last + 1);
        int end = state % (last + 1);
        int spanEnds = (start == 0 ? 1 : 0) + (end == last ? 1 : 0);
        BucklingSpan geometric = new BucklingSpan(chain.along().get(end) - chain.along().get(start), spanEnds, 2 - spanEnds);
        return new BucklingLength(length, minor.scaled(minorFactor), geometric.scaled(geometricFactor));
    }

    /** The lengths when no crossing partner is in tension (the longest out-of-plane lengths). */
    public BucklingLength worstCase(int memberId) {
        return forCase(memberId, id -> -1.0);
    }

    /** Ids of the members of the other diagonals crossing this member's line at a joined crossing. */
    public List<Integer> crossingPartners(int memberId) {
        MemberChains.Chain chain = chains.of(memberId);
        List<Integer> partners = new ArrayList<>();
        for (int k = 1; k < chain.nodes().size() - 1; k++) {
            for (MemberChains.Chain other : passingThrough.getOrDefault(chain.nodes().get(k), List.of())) {
                if (other.index() != chain.index() && other.role() == chain.role()) {
                    partners.addAll(other.members());
                }
            }
        }
        return List.copyOf(partners);
    }

    /** The ids of the collinear line of members that {@code memberId} belongs to, end to end. */
    public List<Integer> line(int memberId) {
        return chains.of(memberId).members();
    }

    private int indexOf(int id) {
        Integer m = index.get(id);
        if (m == null) {
            throw new IllegalArgumentException("no member " + id);
        }
        return m;
    }

    private BucklingOverride override(Member m) {
        for (BucklingOverride o : overrides) {
            if (o.covers(m.role(), m.segment())) {
                return o;
            }
        }
        return null;
    }

    /**
     * The scan of one member. An interior node of its line holds it out of plane when a crossing
     * partner line (another line of the same role through the node) is there and: always with
     * the rule {@code supported}, never with {@code unsupported}, and by default when both
     * members of that partner line at the node are in tension.
     */
    private Scan scan(Member m) {
        if (m.role() == Role.LEG || m.role() == Role.GENERAL) {
            return new Scan(0, 0, new boolean[0], new int[0][]);
        }
        MemberChains.Chain chain = chains.of(m.id());
        BucklingOverride override = override(m);
        CrossingRule rule = override == null ? CrossingRule.AUTO : override.crossing();
        int last = chain.nodes().size() - 1;
        boolean[] always = new boolean[last + 1];
        int[][] pairs = new int[last + 1][];
        for (int p = 0; p <= last; p++) {
            List<Integer> found = new ArrayList<>();
            int node = chain.nodes().get(p);
            for (MemberChains.Chain other : passingThrough.getOrDefault(node, List.of())) {
                if (other.index() == chain.index() || other.role() != chain.role()) {
                    continue;
                }
                if (rule == CrossingRule.SUPPORTED) {
                    always[p] = true;
                } else if (rule == CrossingRule.AUTO) {
                    int at = other.nodes().indexOf(node);
                    found.add(indexOf(other.members().get(at - 1)));
                    found.add(indexOf(other.members().get(at)));
                }
            }
            pairs[p] = found.stream().mapToInt(Integer::intValue).toArray();
        }
        return new Scan(chain.positionOf(m.id()), last, always, pairs);
    }

    /** Whether interior node {@code p} of the member's line holds it out of plane in this case. */
    private static boolean holds(Scan scan, int p, IntToDoubleFunction axialByIndex) {
        if (scan.always()[p]) {
            return true;
        }
        int[] pairs = scan.pairs()[p];
        for (int q = 0; q < pairs.length; q += 2) {
            if (axialByIndex.applyAsDouble(pairs[q]) > 0 && axialByIndex.applyAsDouble(pairs[q + 1]) > 0) {
                return true;
            }
        }
        return false;
    }
}
