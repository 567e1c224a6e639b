package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Comparator;
import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.generate.Tower;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.BucklingOverride;
import tetrapod.model.spec.CrossingRule;

/**
 * Buckling lengths from generated geometry, against the panel geometry worked by hand: a square
 * prismatic tower 3 m wide with 3 m panels, so a whole diagonal is √(3² + 3²) = 4.2426 m and its
 * crossing is at its middle.
 */
class BucklingLengthsTest {

    private static final double DIAGONAL = Math.sqrt(18);
    private static final double TOL = 1e-9;

    private static List<Member> byRole(Tower tower, Role role) {
        return tower.frame().members().stream().filter(m -> m.role() == role).toList();
    }

    @Test
    void xBracingHalvesWithTheCrossingRule() throws Exception {
        Tower tower = Towers.prismatic(3.0, 2, 3.0, Bracing.X, 0);
        BucklingLengths lengths = BucklingLengths.of(tower, List.of());
        for (Member d : byRole(tower, Role.DIAGONAL)) {
            BucklingLength worst = lengths.worstCase(d.id());
            assertEquals(DIAGONAL / 2, worst.minorAxis().length(), TOL);
            assertEquals(1, worst.minorAxis().eccentricEnds());
            assertEquals(1, worst.minorAxis().continuousEnds());
            assertEquals(DIAGONAL, worst.geometricAxis().length(), TOL, "out of plane: the whole diagonal");
            assertEquals(2, worst.geometricAxis().eccentricEnds());
            assertEquals(2, lengths.line(d.id()).size());
            assertFalse(lengths.crossingPartners(d.id()).isEmpty());
            // the other diagonal in tension: the crossing holds it out of plane
            BucklingLength held = lengths.forCase(d.id(), id -> lengths.line(d.id()).contains(id) ? -1.0 : 1.0);
            assertEquals(DIAGONAL / 2, held.geometricAxis().length(), TOL);
            assertEquals(1, held.geometricAxis().continuousEnds());
        }
    }

    @Test
    void legsBetweenNodesAndHorizontalsWhole() throws Exception {
        Tower tower = Towers.prismatic(3.0, 2, 3.0, Bracing.X, 0);
        BucklingLengths lengths = BucklingLengths.of(tower, List.of());
        for (Member leg : byRole(tower, Role.LEG)) {
            BucklingLength b = lengths.worstCase(leg.id());
            assertEquals(3.0, b.minorAxis().length(), TOL);
            assertEquals(3.0, b.geometricAxis().length(), TOL);
        }
        for (Member h : byRole(tower, Role.HORIZONTAL)) {
            assertEquals(3.0, lengths.worstCase(h.id()).geometricAxis().length(), TOL);
        }
    }

    /**
     * Two redundant levels (at 1 m and 2 m of a 3 m panel): the diagonal gets nodes at 1/3 and 2/3 of
     * its length and the crossing at 1/2, so its pieces are 1/3, 1/6, 1/6, 1/3 of 4.2426 m. Out of
     * plane the redundants (in the face) give no support: the whole diagonal, or half of it to the
     * crossing when the other diagonal is in tension.
     */
    @Test
    void redundantsShortenTheMinorAxisOnly() throws Exception {
        Tower tower = Towers.prismatic(3.0, 1, 3.0, Bracing.X, 2);
        BucklingLengths lengths = BucklingLengths.of(tower, List.of());
        Member first = byRole(tower, Role.DIAGONAL).get(0);
        List<Integer> line = lengths.line(first.id());
        assertEquals(4, line.size());
        List<Double> pieces = line.stream().map(id -> lengths.worstCase(id).minorAxis().length()).toList();
        assertEquals(DIAGONAL / 3, pieces.get(0), TOL);
        assertEquals(DIAGONAL / 6, pieces.get(1), TOL);
        assertEquals(DIAGONAL / 6, pieces.get(2), TOL);
        assertEquals(DIAGONAL / 3, pieces.get(3), TOL);
        for (int id : line) {
            assertEquals(DIAGONAL, lengths.worstCase(id).geometricAxis().length(), TOL);
            assertEquals(DIAGONAL / 2, lengths.forCase(id, m -> line.contains(m) ? -1.0 : 1.0).geometricAxis().length(), TOL);
        }
    }

    /** K bracing: the top horizontal is split at the K node; v–v half its width, out of plane the whole width. */
    @Test
    void kHorizontalSplitAtItsMiddle() throws Exception {
        Tower tower = Towers.prismatic(3.0, 1, 3.0, Bracing.K, 0);
        BucklingLengths lengths = BucklingLengths.of(tower, List.of());
        Member top = byRole(tower, Role.HORIZONTAL).stream()
                .max(Comparator.comparingDouble(m -> tower.frame().nodes().stream()
                        .filter(n -> n.id() == m.i()).findFirst().orElseThrow().z()))
                .orElseThrow();
        BucklingLength b = lengths.worstCase(top.id());
        assertEquals(1.5, b.minorAxis().length(), TOL);
        assertEquals(3.0, b.geometricAxis().length(), TOL);
        assertTrue(lengths.crossingPartners(top.id()).isEmpty(), "a K node is not a crossing");
    }

    @Test
    void userOverridesPerRoleAndSegment() throws Exception {
        Tower tower = Towers.prismatic(3.0, 2, 3.0, Bracing.X, 0);
        BucklingLengths supported = BucklingLengths.of(tower,
                List.of(new BucklingOverride(Role.DIAGONAL, List.of(1), 0.9, 1.0, CrossingRule.SUPPORTED)));
        BucklingLengths never = BucklingLengths.of(tower,
                List.of(new BucklingOverride(Role.DIAGONAL, List.of(), 1.0, 0.8, CrossingRule.UNSUPPORTED)));
        BucklingLengths otherSegment = BucklingLengths.of(tower,
                List.of(new BucklingOverride(Role.DIAGONAL, List.of(2), 0.5, 0.5, CrossingRule.SUPPORTED)));
        Member d = byRole(tower, Role.DIAGONAL).get(0);
        assertEquals(0.9 * DIAGONAL / 2, supported.worstCase(d.id()).minorAxis().length(), TOL);
        assertEquals(DIAGONAL / 2, supported.worstCase(d.id()).geometricAxis().length(), TOL);
        assertEquals(0.8 * DIAGONAL, never.forCase(d.id(), id -> 1.0).geometricAxis().length(), TOL);
        assertEquals(DIAGONAL, otherSegment.worstCase(d.id()).geometricAxis().length(), TOL, "segment 2 only");
    }
}
