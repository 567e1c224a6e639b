package tetrapod.check;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.IntFunction;
import java.util.function.IntToDoubleFunction;
import tetrapod.generate.Tower;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.spec.ChecksSpec;
import tetrapod.model.spec.ConnectionSpec;

/**
 * Checks the members of one frame by the method of {@code checks.method}, one load case at a
 * time: it finds each member's connection (from {@code checks.connections}, else the role's
 * assumed one) and its buckling lengths in that case (the X-bracing rule needs the forces of the
 * other diagonals). Immutable; safe to share between threads.
 */
public final class MemberChecker {

    private final Frame frame;
    private final MemberCheck method;
    private final BucklingLengths buckling;
    private final RedundantForces redundants;
    private final Map<Integer, Member> members = new HashMap<>();
    private final Map<Integer, Connection> connections = new HashMap<>();
    private final List<Member> order;

    public MemberChecker(Frame frame, ChecksSpec checks) {
        this.frame = frame;
        this.method = MemberCheck.of(checks);
        this.buckling = BucklingLengths.of(frame, checks.bucklingLengths());
        this.redundants = new RedundantForces(frame, method);
        this.order = frame.members();
        for (Member m : frame.members()) {
            members.put(m.id(), m);
            connections.put(m.id(), connectionFor(m, checks.connections()));
        }
    }

    public static MemberChecker of(Tower tower, ChecksSpec checks) {
        return new MemberChecker(tower.frame(), checks);
    }

    private static Connection connectionFor(Member m, List<ConnectionSpec> specs) {
        for (ConnectionSpec spec : specs) {
            if (spec.covers(m.role(), m.segment())) {
                return Connection.of(spec, false);
            }
        }
        return Connection.assumed(m.role());
    }

    public MemberCheck method() {
        return method;
    }

    public BucklingLengths bucklingLengths() {
        return buckling;
    }

    /** The end connection used for member {@code memberId}. */
    public Connection connectionOf(int memberId) {
        Connection c = connections.get(memberId);
        if (c == null) {
            throw new IllegalArgumentException("no member " + memberId);
        }
        return c;
    }

    /**
     * Checks member {@code memberId} under {@code forces}; {@code axialForce} gives the axial force
     * (N, tension positive) of every member in the same load case, for the crossing rule.
     */
    public MemberCheckResult check(int memberId, MemberForces forces, IntToDoubleFunction axialForce) {
        Member m = members.get(memberId);
        if (m == null) {
            throw new IllegalArgumentException("no member " + memberId);
        }
        return check(m, buckling.forCase(memberId, axialForce), forces, axialForce);
    }

    /**
     * Checks {@code member} with the buckling {@code lengths} of the case and its own
     * {@code forces}; a redundant gets its nominal force (a fraction of the compression of the
     * members it braces, {@link RedundantForces}) when that is larger, noted beside each check.
     *
     * @param axialForce the axial force (N, tension positive) of every member in the same case
     */
    public MemberCheckResult check(Member member, BucklingLength lengths, MemberForces forces,
                                   IntToDoubleFunction axialForce) {
        MemberForces design = designForces(member.id(), forces, axialForce);
        MemberCheckResult result = method.check(new MemberCheckInput(member, frame.material(), lengths,
                connections.get(member.id()), design));
        if (design == forces) {
            return result;
        }
        // the forces now (axialForce may read a buffer that changes), the words when asked for
        double braced = redundants.bracedCompression(member.id(), axialForce);
        List<CheckResult> noted = new ArrayList<>(result.checks().size());
        for (CheckResult c : result.checks()) {
            noted.add(c.mode().isRequirement() ? c
                    : CheckResult.noted(c.mode(), c.utilisation(), c.clause(), () -> {
                        String note = redundants.note(braced);
                        return c.note().isEmpty() ? note : c.note() + "; " + note;
                    }));
        }
        return new MemberCheckResult(result.member(), noted);
    }

    /** The forces member {@code memberId} is checked for: its own, or a redundant's nominal force when larger. */
    public MemberForces designForces(int memberId, MemberForces forces, IntToDoubleFunction axialForce) {
        return redundants.designForces(memberId, forces, axialForce);
    }

    /** Whether member {@code memberId}'s design force depends on the forces of other members (a redundant). */
    public boolean hasNominalForce(int memberId) {
        return redundants.applies(memberId);
    }

    /**
     * The strength utilisation of the member at frame index {@code memberIndex} as numbers alone,
     * for sweeping many cases ({@link MemberUtilisation}: one thread at a time).
     */
    public MemberUtilisation utilisation(int memberIndex) {
        return new MemberUtilisation(this, memberIndex, order.get(memberIndex));
    }

    /** The design axial force of the member at frame index {@code index} ({@link RedundantForces#designAxial}). */
    double designAxial(int index, double axial, IntToDoubleFunction axialByIndex) {
        return redundants.designAxial(index, axial, axialByIndex);
    }

    /** The resistances of the member at frame index {@code index} in buckling state {@code state}. */
    MemberResistance resistance(int index, int state) {
        Member m = order.get(index);
        return method.resistance(m, frame.material(), buckling.lengths(index, state), connections.get(m.id()));
    }

    /** Checks every member of the frame for one load case, in the frame's member order. */
    public List<MemberCheckResult> checkAll(IntFunction<MemberForces> forcesOfMember) {
        IntToDoubleFunction axial = id -> forcesOfMember.apply(id).axial();
        List<MemberCheckResult> results = new ArrayList<>(frame.members().size());
        for (Member m : frame.members()) {
            results.add(check(m.id(), forcesOfMember.apply(m.id()), axial));
        }
        return List.copyOf(results);
    }
}
