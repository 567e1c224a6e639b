package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * The hand method is set beside the analysis in the combination that governs each quantity:
 * compression where the dead load is factored up, uplift where it is not. Closed form on a
 * one-panel tower whose loads are worked by hand.
 *
 * <p>The tower: a 2 m × 2 m prismatic panel, 3 m high, X-braced, horizontals at its bottom and top,
 * no connection allowance; sections given by their properties: legs 10 kg/m and 100 mm to the wind,
 * diagonals 5 kg/m and 70 mm, horizontals 4 kg/m and 60 mm.
 * <pre>
 *   weight   G = g (4 × 3 × 10 + 8 × √13 × 5 + 8 × 2 × 4) = 9.80665 × (184 + 144.222051) = 3218.759 N
 *   one face A = 2 × 0.100 × 3 + 2 × 0.070 × √13 + 2 × 0.060 × 2 = 1.344777 m²
 *   uniform wind 1 kPa, force coefficient 1: F = 1344.777 N from every azimuth, at z_ref = 1.5 m
 *   (every member is symmetric about mid-height), so the base moment of the wind is 1.5 F
 *   base diagonal d = √(2² + 2²) = 2.828427 m; wind on a diagonal: leg force N/4 ± M/d
 * </pre>
 * Combination "strength" 1.35G + 1.5W: N = 1.35 G = 4345.324 N, M = 1.5 × 1.5 F = 3025.749 N·m,
 * compression N/4 + M/d = 1086.331 + 1069.764 = 2156.095 N.
 * Combination "uplift" 1.0G + 1.5W: N = 3218.759 N, the same M, uplift M/d − N/4 = 1069.764 − 804.690
 * = 265.074 N. (In "strength" the same leg would not lift: 1069.764 − 1086.331 = −16.567 N.)
 */
class HandGoverningTest {

    private static final double G = 9.80665 * (184 + 40 * Math.sqrt(13));
    private static final double F = 1000 * (0.6 + 0.14 * Math.sqrt(13) + 0.24);
    private static final double D = Math.sqrt(8);
    private static final Set<Double> DIAGONALS = Set.of(45.0, 135.0, 225.0, 315.0);

    private static final String TOWER = TestTowers.handTower(1.0, "");

    @Test
    void eachQuantityIsComparedInTheCombinationThatGovernsIt() throws Exception {
        HandGoverning g = TestTowers.analyse(TOWER).result().handGoverning().orElseThrow();
        HandComparison c = g.compression();
        HandComparison u = g.uplift();
        assertEquals("strength", c.combination());
        assertEquals("uplift", u.combination());
        // one leg takes the whole moment over the diagonal: both govern with the wind on a diagonal
        assertTrue(DIAGONALS.contains(c.hand().azimuthDeg()), "compression at " + c.hand().azimuthDeg());
        assertTrue(DIAGONALS.contains(u.hand().azimuthDeg()), "uplift at " + u.hand().azimuthDeg());
        // the closed forms of the class comment
        assertEquals(3218.759, G, 5e-4);
        assertEquals(1.35 * G, c.hand().n(), 1e-6);
        assertEquals(2.25 * F, c.hand().m(), 1e-6);
        assertEquals(2156.095, 1.35 * G / 4 + 2.25 * F / D, 5e-4);
        assertEquals(1.35 * G / 4 + 2.25 * F / D, c.hand().legs().compression(), 1e-6);
        assertEquals(G, u.hand().n(), 1e-6);
        assertEquals(2.25 * F, u.hand().m(), 1e-6);
        assertEquals(265.074, 2.25 * F / D - G / 4, 5e-4);
        assertEquals(2.25 * F / D - G / 4, u.hand().legs().tension(), 1e-6);
        // On a diagonal wind the square, symmetric tower's four vertical reactions are statically determinate:
        // the one redundant pattern (+r, −r, +r, −r) is symmetric under the swap of the two legs on the wind's
        // diagonal, the wind's moment antisymmetric, and the weight gives it nothing by the 90° symmetry; so the
        // analysis must find N/4 ± M/d exactly, in the case each comparison was made in.
        assertEquals(c.hand().legs().compression(), c.feMaxCompression(), 1e-6 * c.feMaxCompression());
        assertEquals(u.hand().legs().tension(), u.feMaxTension(), 1e-6 * u.feMaxTension());
    }
}
