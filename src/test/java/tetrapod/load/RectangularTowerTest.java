package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.generate.Tower;
import tetrapod.model.spec.TerrainCategory;

/**
 * A rectangular one-panel tower (4 m along x, 2 m along y, 3 m high; members as in
 * {@link OnePanelTowerTest}): the two face pairs differ, and an oblique azimuth combines them as
 * documented in docs/methods.md: F(θ) = d(θ) [F_X K_X(θ) cos²θ + F_Y K_Y(θ) sin²θ] along the wind.
 * <pre>
 *   faces normal to x span y (2 m): A_X = 0.6 + 2 × 0.07 × √13 + 2 × 0.06 × 2 = 1.344777 m², gross 6 m²,  φ_X = 0.224130
 *   faces normal to y span x (4 m): A_Y = 0.6 + 2 × 0.07 × 5  + 2 × 0.06 × 4 = 1.780000 m², gross 12 m², φ_Y = 0.148333
 * </pre>
 */
class RectangularTowerTest {

    private static final Tower TOWER = Towers.onePanel(4, 2, 3);
    private static final double AX = 0.6 + 2 * 0.07 * Math.sqrt(13) + 0.24;
    private static final double AY = 0.6 + 2 * 0.07 * 5 + 0.48;

    private static double cfEn(double phi) {
        return 1.76 * 2.25 * (1 - 1.5 * phi + phi * phi);   // EN 1993-3-1 Annex B, flat-sided
    }

    @Test
    void facePairsAreMeasuredSeparately() {
        PanelExposure p = PanelExposures.of(TOWER, Asce7Ice.NONE).get(0);
        assertEquals(AX, p.xFaces().total(), 1e-12);
        assertEquals(6, p.xFaces().gross(), 1e-12);
        assertEquals(1.78, p.yFaces().total(), 1e-12);
        assertEquals(12, p.yFaces().gross(), 1e-12);
    }

    @Test
    void obliqueWindCombinesTheTwoFacePairs() {
        En1991Wind profile = En1991Wind.of(TerrainCategory.CAT_II, 26);
        WindLoads wind = WindLoads.of(profile, TOWER, Asce7Ice.NONE, Ancillaries.of(TOWER, List.of()));
        double q = profile.peakPressure(1.5);
        double phiX = AX / 6;
        double phiY = AY / 12;
        double fx0 = cfEn(phiX) * q * AX;
        double fy0 = cfEn(phiY) * q * AY;
        // K2 = φ for 0.2 < φ ≤ 0.5 and 0.2 for φ ≤ 0.2; K1 = 0.55 (flat members)
        double ampX = 0.55 * phiX;
        double ampY = 0.55 * 0.2;

        assertEquals(fx0, wind.panelForces(0).get(0).fx(), 1e-9);
        assertEquals(fy0, wind.panelForces(90).get(0).fy(), 1e-9);
        assertEquals(-fy0, wind.panelForces(270).get(0).fy(), 1e-9);

        double theta = Math.toRadians(30);
        double k = Math.pow(Math.sin(2 * theta), 2);       // 0.75
        double c2 = Math.pow(Math.cos(theta), 2);          // 0.75
        double s2 = Math.pow(Math.sin(theta), 2);          // 0.25
        double expected = fx0 * (1 + ampX * k) * c2 + fy0 * (1 + ampY * k) * s2;
        PanelForce p = wind.panelForces(30).get(0);
        assertEquals(expected, p.magnitude(), 1e-9);
        assertEquals(expected * Math.cos(theta), p.fx(), 1e-9);
        assertEquals(expected * Math.sin(theta), p.fy(), 1e-9);
        // the reported area, solidity and cf are the cos²/sin² weighted values, and F = q cf A
        assertEquals(c2 * AX + s2 * AY, p.area(), 1e-12);
        assertEquals((c2 * AX + s2 * AY) / (c2 * 6 + s2 * 12), p.solidity(), 1e-12);
        assertEquals(p.q() * p.cf() * p.area() * p.responseFactor(), p.magnitude(), 1e-9);
    }
}
