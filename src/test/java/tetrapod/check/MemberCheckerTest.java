package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.generate.Tower;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.spec.BoltGrade;
import tetrapod.model.spec.CheckMethod;
import tetrapod.model.spec.ChecksSpec;
import tetrapod.model.spec.ConnectionSpec;
import tetrapod.model.spec.PartialFactors;
import tetrapod.model.spec.Bracing;

/** The checker over a generated tower: connections by role and segment, the crossing rule, both methods. */
class MemberCheckerTest {

    private static ChecksSpec checks(CheckMethod method) {
        ConnectionSpec diagonals = ConnectionSpec.assumed(Role.DIAGONAL, List.of(1), 3, 20, BoltGrade.G10_9);
        return new ChecksSpec(method, PartialFactors.RECOMMENDED, List.of(), List.of(diagonals), null);
    }

    @Test
    void connectionsFromTheSpecOrAssumedByRole() throws Exception {
        Tower tower = Towers.prismatic(3.0, 2, 3.0, Bracing.X, 0);
        MemberChecker checker = MemberChecker.of(tower, checks(CheckMethod.EN1993));
        for (Member m : tower.frame().members()) {
            Connection c = checker.connectionOf(m.id());
            switch (m.role()) {
                case DIAGONAL -> {
                    assertFalse(c.assumed());
                    assertEquals(3, c.bolts());
                    assertEquals(0.022, c.holeDiameter(), 1e-12);   // M20 + 2 mm (EN 1090-2 normal hole, assumed)
                }
                case LEG -> {
                    assertTrue(c.assumed());
                    assertFalse(c.boltsChecked());
                    assertEquals(2, c.holesInSection());
                }
                default -> {
                    assertTrue(c.assumed());
                    assertEquals(2, c.bolts());
                }
            }
        }
    }

    /** The other diagonal in tension halves the out-of-plane length: the same compression is used less. */
    @Test
    void crossingRuleLowersTheBucklingUtilisation() throws Exception {
        Tower tower = Towers.prismatic(3.0, 2, 3.0, Bracing.X, 0);
        MemberChecker checker = MemberChecker.of(tower, checks(CheckMethod.EN1993));
        Member d = tower.frame().members().stream().filter(m -> m.role() == Role.DIAGONAL).findFirst().orElseThrow();
        List<Integer> line = checker.bucklingLengths().line(d.id());
        MemberForces forces = MemberForces.axial(-20e3);
        double alone = buckling(checker.check(d.id(), forces, id -> -20e3));
        double held = buckling(checker.check(d.id(), forces, id -> line.contains(id) ? -20e3 : 20e3));
        assertTrue(held < alone, held + " < " + alone);
    }

    private static double buckling(MemberCheckResult r) {
        return r.checks().stream().filter(c -> c.mode() == CheckMode.COMPRESSION_BUCKLING).findFirst().orElseThrow()
                .utilisation();
    }

    @Test
    void everyMemberOfACaseIsCheckedByEitherMethod() throws Exception {
        Tower tower = Towers.prismatic(3.0, 2, 3.0, Bracing.X, 1);
        for (CheckMethod method : CheckMethod.values()) {
            MemberChecker checker = MemberChecker.of(tower, checks(method));
            List<MemberCheckResult> results = checker.checkAll(id -> MemberForces.axial(id % 2 == 0 ? 15e3 : -15e3));
            assertEquals(tower.frame().members().size(), results.size());
            for (MemberCheckResult r : results) {
                assertTrue(Double.isFinite(r.utilisation()) && r.utilisation() >= 0);
                assertFalse(r.governing().clause().isEmpty());
            }
        }
        assertInstanceOf(Asce10MemberCheck.class, MemberCheck.of(new ChecksSpec(CheckMethod.ASCE10)));
        assertInstanceOf(En1993MemberCheck.class, MemberCheck.of(ChecksSpec.DEFAULT));
    }
}
