package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.Support;
import tetrapod.model.Vec3;
import tetrapod.model.spec.BoltGrade;
import tetrapod.model.spec.ConnectedLeg;
import tetrapod.model.spec.PartialFactors;

/**
 * The tower codes' own rules of issue 12 item 2, worked by hand: slenderness limits for every
 * role (EN 1993-3-1 Annex H) and the nominal force of redundants. L80x10 (Fixtures): i_v =
 * √(36.4/15.1) cm = 15.526 mm, i_y = √(87.5/15.1) cm = 24.072 mm; lengths 1.6 m about v–v and
 * 3.2 m about the geometric axes give L/i = max(1600/15.526, 3200/24.072) = max(103.05, 132.94) =
 * 132.94.
 */
class TowerRulesTest {

    private static final double LAMBDA = 3200 / 24.072;
    private static final Connection TWO_BOLTS = new Connection(2, 0.016, BoltGrade.G8_8, 0.018, 0.030, 0.035, 0.050,
            1, true, 1, ConnectedLeg.LONG, false);

    private static CheckResult slenderness(Role role, double axial) {
        MemberCheckResult r = new En1993MemberCheck(PartialFactors.RECOMMENDED).check(new MemberCheckInput(
                Fixtures.member(1, role, Fixtures.l80x10()), Fixtures.S355,
                new BucklingLength(1.6, new BucklingSpan(1.6, 1, 1), new BucklingSpan(3.2, 2, 0)), TWO_BOLTS,
                MemberForces.axial(axial)));
        return r.requirements().stream().filter(q -> q.mode() == CheckMode.SLENDERNESS_LIMIT).findFirst().orElseThrow();
    }

    @Test
    void everyRoleHasItsSlendernessLimit() {
        // EN 1993-3-1 H.2 (1): legs 120 (read); bracing in compression 180, redundants 250, members in
        // tension 350 (Annex H, recalled from memory, marked in docs/methods.md)
        assertEquals(LAMBDA / 120, slenderness(Role.LEG, -1e3).utilisation(), 1e-4);
        assertEquals(LAMBDA / 180, slenderness(Role.DIAGONAL, -1e3).utilisation(), 1e-4);
        assertEquals(LAMBDA / 180, slenderness(Role.HORIZONTAL, -1e3).utilisation(), 1e-4);
        assertEquals(LAMBDA / 180, slenderness(Role.PLAN, -1e3).utilisation(), 1e-4);
        assertEquals(LAMBDA / 250, slenderness(Role.REDUNDANT, -1e3).utilisation(), 1e-4);
        assertEquals(LAMBDA / 350, slenderness(Role.DIAGONAL, 1e3).utilisation(), 1e-4);
        assertEquals(LAMBDA / 350, slenderness(Role.HORIZONTAL, 0).utilisation(), 1e-4, "no force: not in compression");
    }

    /**
     * A redundant (member 3) from a leg node (1) to a diagonal node (4): it braces the leg members 1
     * and 2 (both meet node 1) and the diagonal members 4 and 5 (both meet node 4); member 6, a
     * horizontal elsewhere, is not braced by it.
     */
    private static Frame redundantPanel() {
        List<Node> nodes = List.of(new Node(1, 0, 0, 1), new Node(2, 0, 0, 0), new Node(3, 0, 0, 2),
                new Node(4, 1, 0, 1), new Node(5, 2, 0, 0), new Node(6, 0, 1, 2), new Node(7, 2, 0, 2));
        var s = Fixtures.l80x10();
        List<Member> members = List.of(
                new Member(1, 2, 1, Role.LEG, 1, 1, Face.NONE, s, true, Vec3.X),
                new Member(2, 1, 3, Role.LEG, 1, 1, Face.NONE, s, true, Vec3.X),
                new Member(3, 1, 4, Role.REDUNDANT, 1, 1, Face.Y_MINUS, s, true, Vec3.Z),
                new Member(4, 5, 4, Role.DIAGONAL, 1, 1, Face.Y_MINUS, s, true, Vec3.Z),
                new Member(5, 4, 3, Role.DIAGONAL, 1, 1, Face.Y_MINUS, s, true, Vec3.Z),
                new Member(6, 3, 6, Role.HORIZONTAL, 1, 1, Face.Y_MINUS, s, true, Vec3.Z),
                new Member(7, 5, 7, Role.LEG, 1, 1, Face.NONE, s, true, Vec3.X));
        return new Frame("redundant panel", Idealisation.TRUSS, Fixtures.S355, nodes, members,
                List.of(new Support(2, Restraint.PINNED), new Support(5, Restraint.PINNED)));
    }

    @Test
    void aRedundantCarriesAFractionOfTheCompressionOfTheMembersItBraces() {
        Frame frame = redundantPanel();
        // leg members −100 and −80 kN, diagonals −40 and +30 kN, the horizontal −500 kN (not braced)
        Map<Integer, Double> n = Map.of(1, -100e3, 2, -80e3, 3, -0.5e3, 4, -40e3, 5, 30e3, 6, -500e3, 7, -900e3);
        RedundantForces en = new RedundantForces(frame, new En1993MemberCheck(PartialFactors.RECOMMENDED));
        RedundantForces us = new RedundantForces(frame, new Asce10MemberCheck());
        MemberForces own = MemberForces.axial(-0.5e3);
        // the largest braced compression is 100 kN (leg member 1): EN 2.5 % = 2.5 kN, ASCE 10 1.5 % = 1.5 kN
        assertEquals(-2.5e3, en.designForces(3, own, n::get).axial(), 1e-9);
        assertEquals(-1.5e3, us.designForces(3, own, n::get).axial(), 1e-9);
        MemberForces strong = MemberForces.axial(-3e3);
        assertSame(strong, en.designForces(3, strong, n::get), "its own force governs when larger");
        MemberForces legOwn = MemberForces.axial(-100e3);
        assertSame(legOwn, en.designForces(1, legOwn, n::get), "only redundants get a nominal force");
        assertEquals(100e3, en.bracedCompression(3, n::get), 1e-9);
        assertTrue(en.note(100e3).contains("100.0 kN"), en.note(100e3));
    }
}
