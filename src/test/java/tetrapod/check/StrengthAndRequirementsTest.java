package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.model.Role;
import tetrapod.model.spec.BoltGrade;
import tetrapod.model.spec.ConnectedLeg;
import tetrapod.model.spec.PartialFactors;

/**
 * Utilisation means strength (issue 12): the rules that do not depend on the load are reported as
 * requirements and never become a member's utilisation. L80x10 diagonal (Fixtures), two M16 8.8
 * bolts with d0 = 18 mm at e1 = e2 = 20 mm, p1 = 50 mm: EN 1993-1-8 Table 3.3 asks e1, e2 ≥ 1.2 d0
 * = 21.6 mm, so the spacing ratio is 21.6 / 20 = 1.08 (not met) whatever the force.
 */
class StrengthAndRequirementsTest {

    private static final Connection CLOSE = new Connection(2, 0.016, BoltGrade.G8_8, 0.018, 0.020, 0.020, 0.050, 1,
            true, 1, ConnectedLeg.LONG, false);

    private static BucklingLength lengths(double outOfPlane) {
        return new BucklingLength(1.6, new BucklingSpan(1.6, 1, 1), new BucklingSpan(outOfPlane, 2, 0));
    }

    private static MemberCheckResult check(MemberCheck method, double axial, double outOfPlane) {
        return method.check(new MemberCheckInput(Fixtures.member(7, Role.DIAGONAL, Fixtures.l80x10()), Fixtures.S355,
                lengths(outOfPlane), CLOSE, MemberForces.axial(axial)));
    }

    @Test
    void aMemberWithoutForceHasUtilisationZeroWhateverItsRequirements() {
        for (MemberCheck method : List.of(new En1993MemberCheck(PartialFactors.RECOMMENDED), new Asce10MemberCheck())) {
            MemberCheckResult r = check(method, 0, 3.2);
            assertEquals(0, r.utilisation(), 0, method.getClass().getSimpleName() + ": no force, no utilisation");
            assertFalse(r.governing().mode().isRequirement());
            assertTrue(r.requirements().stream().allMatch(q -> q.mode().isRequirement()));
        }
    }

    @Test
    void boltSpacingIsARequirementWithItsRatioToTheLimit() {
        MemberCheckResult r = check(new En1993MemberCheck(PartialFactors.RECOMMENDED), 50e3, 3.2);
        CheckResult spacing = r.requirements().stream().filter(q -> q.mode() == CheckMode.BOLT_SPACING).findFirst()
                .orElseThrow();
        assertEquals(1.08, spacing.utilisation(), 1e-12, "1.2 d0 / e1 = 21.6 / 20 (EN 1993-1-8 Table 3.3)");
        assertFalse(spacing.passes());
        assertTrue(r.utilisation() < 1.08, "the spacing ratio is not the utilisation: " + r.governing());
        assertTrue(r.checks().stream().noneMatch(c -> c.mode() == CheckMode.BOLT_BEARING && c.clause().contains("3.3")),
                "spacing is not called bearing");
    }

    @Test
    void theEnvelopeKeepsEachRequirementAtItsLargestRatio() {
        // ASCE 10 slenderness limit of a compression member, KL/r ≤ 200: the out-of-plane length is the
        // crossing rule's and changes with the case, so the envelope keeps the larger ratio
        MemberCheck method = new Asce10MemberCheck();
        MemberCheckResult shortCase = check(method, -10e3, 1.6);
        MemberCheckResult longCase = check(method, -10e3, 3.2);
        MemberEnvelope e = MemberEnvelope.empty(7).with(longCase, MemberForces.axial(-10e3), "long", 0.0)
                .with(shortCase, MemberForces.axial(-10e3), "short", 90.0);
        double longRatio = longCase.requirements().stream().filter(q -> q.mode() == CheckMode.SLENDERNESS_LIMIT)
                .findFirst().orElseThrow().utilisation();
        double kept = e.requirements().stream().filter(q -> q.mode() == CheckMode.SLENDERNESS_LIMIT).findFirst()
                .orElseThrow().utilisation();
        double shortRatio = shortCase.requirements().stream().filter(q -> q.mode() == CheckMode.SLENDERNESS_LIMIT)
                .findFirst().orElseThrow().utilisation();
        // L/r out of plane 3200 / 24.07 = 132.9 against 1600 / 15.53 = 103.0 about v–v: the long case governs
        assertTrue(longRatio > shortRatio, longRatio + " vs " + shortRatio);
        assertEquals(longRatio, kept, 0);
        assertEquals(1, e.requirements().stream().filter(q -> q.mode() == CheckMode.SLENDERNESS_LIMIT).count());
    }
}
