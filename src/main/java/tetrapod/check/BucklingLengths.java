package tetrapod.check;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
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
    private final Map<Integer, Member> members = new HashMap<>();
    private final Map<Integer, Double> lengths = new HashMap<>();
    private final List<BucklingOverride> overrides;
    /** For each node, the chains (of diagonals or plan bracing) that pass through it. */
    private final Map<Integer, List<MemberChains.Chain>> passingThrough = new HashMap<>();

    private BucklingLengths(Frame frame, List<BucklingOverride> overrides) {
        this.chains = new MemberChains(frame);
        this.overrides = List.copyOf(overrides);
        double[] l = frame.memberLengths();
        for (int k = 0; k < l.length; k++) {
            Member m = frame.members().get(k);
            members.put(m.id(), m);
            lengths.put(m.id(), l[k]);
        }
        for (MemberChains.Chain c : chains.all()) {
            if (c.role() == Role.DIAGONAL || c.role() == Role.PLAN) {
                for (int k = 1; k < c.nodes().size() - 1; k++) {
                    passingThrough.computeIfAbsent(c.nodes().get(k), n -> new ArrayList<>()).add(c);
                }
            }
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
        Member m = member(memberId);
        double length = lengths.get(memberId);
        BucklingOverride override = override(m);
        double minorFactor = override == null ? 1.0 : override.minorAxisFactor();
        double geometricFactor = override == null ? 1.0 : override.geometricAxisFactor();
        CrossingRule rule = override == null ? CrossingRule.AUTO : override.crossing();
        if (m.role() == Role.LEG || m.role() == Role.GENERAL) {
            String why = m.role() == Role.LEG ? "leg: between bracing nodes, both directions" : "between the member's nodes";
            BucklingLength base = BucklingLength.between(length, why);
            return new BucklingLength(length, base.minorAxis().scaled(minorFactor),
                    base.geometricAxis().scaled(geometricFactor), why + factors(override));
        }
        MemberChains.Chain chain = chains.of(memberId);
        int k = chain.positionOf(memberId);
        int last = chain.nodes().size() - 1;
        int ends = (k == 0 ? 1 : 0) + (k + 1 == last ? 1 : 0);
        BucklingSpan minor = new BucklingSpan(length, ends, 2 - ends);

        int start = k;
        while (start > 0 && !holds(chain, chain.nodes().get(start), rule, axialForce)) {
            start--;
        }
        int end = k + 1;
        while (end < last && !holds(chain, chain.nodes().get(end), rule, axialForce)) {
            end++;
        }
        int spanEnds = (start == 0 ? 1 : 0) + (end == last ? 1 : 0);
        BucklingSpan geometric = new BucklingSpan(chain.along().get(end) - chain.along().get(start), spanEnds, 2 - spanEnds);
        String why = String.format(Locale.ROOT, "%s line of %d member(s), %.3f m; out of plane %.3f m%s",
                m.role().jsonName(), chain.members().size(), chain.length(), geometric.length(),
                spanEnds == 2 ? " (whole line)" : " (to the crossing)");
        return new BucklingLength(length, minor.scaled(minorFactor), geometric.scaled(geometricFactor),
                why + factors(override));
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

    private Member member(int id) {
        Member m = members.get(id);
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

    /** Whether the interior node {@code node} of {@code chain} holds it out of plane in this case. */
    private boolean holds(MemberChains.Chain chain, int node, CrossingRule rule, IntToDoubleFunction axialForce) {
        for (MemberChains.Chain other : passingThrough.getOrDefault(node, List.of())) {
            if (other.index() == chain.index() || other.role() != chain.role()) {
                continue;
            }
            switch (rule) {
                case SUPPORTED:
                    return true;
                case UNSUPPORTED:
                    return false;
                default:
                    if (partnerInTension(other, node, axialForce)) {
                        return true;
                    }
            }
        }
        return false;
    }

    /** Both members of the partner line at the crossing are in tension. */
    private static boolean partnerInTension(MemberChains.Chain partner, int node, IntToDoubleFunction axialForce) {
        int k = partner.nodes().indexOf(node);
        return axialForce.applyAsDouble(partner.members().get(k - 1)) > 0
                && axialForce.applyAsDouble(partner.members().get(k)) > 0;
    }

    private static String factors(BucklingOverride o) {
        if (o == null) {
            return "";
        }
        return String.format(Locale.ROOT, "; user factors %.3g (minor), %.3g (geometric), crossing %s",
                o.minorAxisFactor(), o.geometricAxisFactor(), o.crossing().jsonName());
    }
}
