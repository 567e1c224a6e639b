package tetrapod.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.model.Idealisation;
import tetrapod.model.Role;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.ExplicitFrameSpec;
import tetrapod.model.spec.ExplicitFrameSpec.MemberSpec;
import tetrapod.model.spec.ExplicitFrameSpec.NodeSpec;
import tetrapod.model.spec.Horizontals;

/** Steel mass = Σ mass per metre × length, by hand. Fixture masses: L150x15 40, L90x8 10, L80x8 8, L50x5 4 kg/m. */
class SteelMassTest {

    private static final double TOL = 1e-9;

    /**
     * Prismatic 2 × 2 m, 3 m high, one panel, X not connected, horizontals at both ends:
     * legs 4 × 3 m × 40 = 480 kg; diagonals 8 × √(2² + 3²) × 10 = 80√13 kg;
     * horizontals 2 levels × 4 × 2 m × 8 = 128 kg. Total 608 + 80√13 = 896.44 kg; with the 10 %
     * allowance of the test spec, × 1.1.
     */
    @Test
    void prismaticTowerByHand() throws Exception {
        Tower tower = Specs.generate(Specs.tower(2.0, 2.0, List.of(
                Specs.segment(3.0, 2.0, 2.0, 1, Bracing.X, Horizontals.ENDS, false, 0)), List.of()));
        double expected = 608 + 80 * Math.sqrt(13);
        assertEquals(expected, tower.steelMass(), TOL);
        assertEquals(expected * 1.1, tower.steelMassWithAllowance(), TOL);
        Map<Role, Double> byRole = SteelMass.byRole(tower.frame());
        assertEquals(480, byRole.get(Role.LEG), TOL);
        assertEquals(80 * Math.sqrt(13), byRole.get(Role.DIAGONAL), TOL);
        assertEquals(128, byRole.get(Role.HORIZONTAL), TOL);
    }

    /**
     * Tapered 4 → 2 m, 4 m high, one panel, single diagonals, no horizontals, plan bracing at the
     * top. Legs: 4 × √(1 + 1 + 16) × 40 = 160√18. Diagonals (e.g. (−2, −2, 0) → (1, −1, 4)):
     * 4 × √(9 + 1 + 16) × 10 = 40√26. Plan: 4 half-diagonals of √2 m × 4 = 16√2.
     */
    @Test
    void taperedTowerWithPlanBracingByHand() throws Exception {
        Tower tower = Specs.generate(Specs.tower(4.0, 4.0, List.of(
                Specs.segment(4.0, 2.0, 2.0, 1, Bracing.SINGLE, Horizontals.NONE, false, 0)), List.of(4.0)));
        double expected = 160 * Math.sqrt(18) + 40 * Math.sqrt(26) + 16 * Math.sqrt(2);
        assertEquals(expected, tower.steelMass(), TOL);
        assertEquals(expected * 1.25, SteelMass.withAllowance(tower.frame(), 0.25), TOL);
    }

    /** Two members of an explicit frame: 5 m (3-4-5) of L90x8 and 2 m of L150x15: 50 + 80 = 130 kg. */
    @Test
    void explicitFrame() throws Exception {
        Tower tower = Specs.generate(Specs.explicit(Idealisation.TRUSS, new ExplicitFrameSpec(
                List.of(new NodeSpec(1, 0, 0, 0), new NodeSpec(2, 3, 4, 0), new NodeSpec(3, 3, 4, 2)),
                List.of(new MemberSpec(1, 1, 2, "L90x8", null, false, null),
                        new MemberSpec(2, 2, 3, "L150x15", null, false, null)), List.of())));
        assertEquals(130, tower.steelMass(), TOL);
        assertEquals(130, tower.steelMassWithAllowance(), TOL);
    }
}
