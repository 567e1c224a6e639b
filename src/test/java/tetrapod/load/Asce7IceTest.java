package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.common.Units;
import tetrapod.generate.Tower;
import tetrapod.model.NodeForce;
import tetrapod.model.SectionShape;

/** Radial ice by ASCE 7-16 chapter 10 (equation numbers and the height factor recalled from memory). */
class Asce7IceTest {

    @Test
    void heightFactor() {
        // f_z = (z/33 ft)^0.10 up to 900 ft, 1.4 above (10.4-4)
        assertEquals(1.0, Asce7Ice.heightFactor(33 * 0.3048), 1e-12);
        assertEquals(Math.pow(100.0 / 33, 0.1), Asce7Ice.heightFactor(100 * 0.3048), 1e-12);   // 1.117
        assertEquals(1.4, Asce7Ice.heightFactor(300), 0);
    }

    @Test
    void iceAreaAndWeightOfAMember() {
        // (10.4-1) A_i = π t_d (D_c + t_d): a 100 mm tube under 20 mm of ice: π × 0.02 × 0.12 = 0.0075398 m²;
        // at 900 kg/m³: 0.0075398 × 900 × 9.80665 = 66.547 N/m
        Asce7Ice ice = new Asce7Ice(0.020, 900, false);
        double dc = Asce7Ice.characteristicDimension(new SectionShape.Tube(0.1, 0.004));
        assertEquals(0.1, dc, 0);
        assertEquals(0.0075398, ice.iceArea(dc, 50), 1e-7);
        assertEquals(66.547, ice.weightPerMetre(dc, 50), 1e-3);
        // an L100x10 angle: D_c is the diameter of the circle through heel and toes, √2 × 100 mm
        assertEquals(0.1414214, Asce7Ice.characteristicDimension(new SectionShape.Angle(0.1, 0.1, 0.01, 0.012, 0.006)), 1e-7);
        // the wind width grows by 2 t
        assertEquals(0.14, ice.icedWidth(0.1, 5), 1e-15);
    }

    @Test
    void thicknessGrowsWithHeightWhenAsked() {
        Asce7Ice ice = new Asce7Ice(0.025, 900, true);
        assertEquals(0.025, ice.thicknessAt(33 * 0.3048), 1e-12);
        assertEquals(0.025 * Math.pow(60 / (33 * 0.3048), 0.1), ice.thicknessAt(60), 1e-12);
    }

    /**
     * Design thickness from the map, ASCE 7 (10.4-5) t_d = 2.0 t I_i f_z K_zt^0.35, by hand:
     * t = 1 in, I_i = 1.25 (risk category IV, Table 1.5-2), z = 100 ft, K_zt = 1.0:
     * f_z = (100/33)^0.10 = exp(0.10 · ln 3.0303) = exp(0.10 · 1.108663) = exp(0.1108663) = 1.117245;
     * t_d = 2.0 · 1 · 1.25 · 1.117245 · 1.0^0.35 = 2.793114 in = 70.945 mm.
     * With K_zt = 1.2: 1.2^0.35 = exp(0.35 · ln 1.2) = exp(0.35 · 0.1823216) = exp(0.0638126) = 1.065893;
     * t_d = 2.793114 · 1.065893 = 2.977160 in = 75.620 mm. At 33 ft f_z = 1: t_d = 2.0 · 1 · 1.25 = 2.5 in = 63.5 mm.
     */
    @Test
    void designThicknessFromTheMapByHand() {
        double inch = 0.0254;
        double z = 100 * 0.3048;
        Asce7Ice flat = Asce7Ice.fromMap(new Asce7Ice.MapValues(1 * inch, 1.25, 1.0), 900);
        assertEquals(70.945e-3, flat.thicknessAt(z), 0.0005e-3);
        assertEquals(63.5e-3, flat.thicknessAt(33 * 0.3048), 1e-9);
        assertEquals(63.5e-3, flat.thickness(), 1e-12);
        Asce7Ice hill = Asce7Ice.fromMap(new Asce7Ice.MapValues(1 * inch, 1.25, 1.2), 900);
        assertEquals(75.620e-3, hill.thicknessAt(z), 0.0005e-3);
        assertEquals(75.620e-3, Asce7Ice.designThickness(hill.map(), Asce7Ice.heightFactor(z)), 0.0005e-3);
    }

    @Test
    void itemIceAndIcedArea() {
        Asce7Ice ice = new Asce7Ice(0.01, 900, false);
        // (10.4-2) V_i = π t A on a flat item of 2 m²: π × 0.01 × 2 m³ × 900 kg/m³ × g
        assertEquals(Math.PI * 0.01 * 2 * 900 * Units.G_ACCEL, ice.itemWeight(2, 10), 1e-9);
        // a 1 m² item (square outline) with 10 mm on every edge: (1 + 0.02)² m²
        assertEquals(1.0404, ice.icedArea(1.0, 10), 1e-12);
    }

    @Test
    void iceWeightOnTheMembersOfATowerAddsUp() {
        // the one-panel tower: 4 legs L100x10 of 3 m, 4 faces × 2 diagonals L70x7 of √13 m, 8 horizontals L60x6 of 2 m
        Tower tower = Towers.onePanel(2, 2, 3);
        Asce7Ice ice = new Asce7Ice(0.015, 900, false);
        double perMetre = 900 * Units.G_ACCEL * Math.PI * 0.015;
        double expected = perMetre * (4 * 3 * (Math.hypot(0.1, 0.1) + 0.015)
                + 8 * Math.sqrt(13) * (Math.hypot(0.07, 0.07) + 0.015)
                + 8 * 2 * (Math.hypot(0.06, 0.06) + 0.015));
        List<NodeForce> loads = ice.memberWeights(tower.frame());
        assertEquals(-expected, loads.stream().mapToDouble(NodeForce::fz).sum(), 1e-9);
    }
}
