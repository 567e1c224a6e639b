package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import tetrapod.generate.Tower;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.Asce7Edition;
import tetrapod.model.spec.Exposure;
import tetrapod.model.spec.TerrainCategory;

/**
 * A one-panel tower whose wind force is worked by hand from the published formulas, step by step.
 *
 * <p>The tower: a 2 m × 2 m prismatic panel, 3 m high, X-braced (diagonals joined where they
 * cross), horizontals at its bottom and top. Legs L100x10 (100 mm wide to the wind), diagonals
 * L70x7 (70 mm), horizontals L60x6 (60 mm). One face shows the wind
 * <pre>
 *   legs         2 × 0.100 m × 3 m           = 0.600000 m²
 *   diagonals    2 × 0.070 m × √(2² + 3²) m  = 0.504777 m²
 *   horizontals  2 × 0.060 m × 2 m           = 0.240000 m²
 *   A_s                                      = 1.344777 m²,  A_gross = 2 × 3 = 6 m²,  φ = 0.224130
 * </pre>
 * Every member is symmetric about mid-height: the reference height is 1.5 m.
 */
class OnePanelTowerTest {

    private static final double A = 0.6 + 2 * 0.07 * Math.sqrt(13) + 0.24;
    private static final double PHI = A / 6;
    private static final Tower TOWER = Towers.onePanel(2, 2, 3);

    @Test
    void faceAreasAndSolidity() {
        PanelExposure p = PanelExposures.of(TOWER, Asce7Ice.NONE).get(0);
        assertEquals(1.344777, p.xFaces().total(), 1e-6);
        assertEquals(A, p.yFaces().total(), 1e-12);
        assertEquals(6, p.xFaces().gross(), 1e-12);
        assertEquals(0.224130, p.xFaces().solidity(), 1e-6);
        assertEquals(1.5, p.zRef(), 1e-12);
    }

    @Test
    void en1991AndEn1993ByHand() {
        // EN 1991-1-4, category II, v_b,0 = 26 m/s, z_e = 1.5 m < z_min = 2 m, so z = 2 m (4.4), (4.7):
        double l = Math.log(2 / 0.05);                       // ln(z/z0) = 3.688879
        double vm = 0.19 * l * 26;                           // (4.3), (4.4), (4.5): v_m = 18.2231 m/s
        double qp = (1 + 7 / l) * 0.5 * 1.25 * vm * vm;      // (4.7), (4.8): q_p = 601.396 Pa
        assertEquals(601.396, qp, 1e-3);
        // EN 1993-3-1 Annex B: c_f,S,0 = 1.76 × 2.25 × (1 − 1.5 φ + φ²) = 2.827597
        double cf = 1.76 * 2.25 * (1 - 1.5 * PHI + PHI * PHI);
        assertEquals(2.827597, cf, 1e-6);
        double force = cf * qp * A;                          // c_s c_d = 1: F = c_f q_p A_s = 2286.80 N
        assertEquals(2286.80, force, 0.01);

        WindLoads wind = WindLoads.of(En1991Wind.of(TerrainCategory.CAT_II, 26), TOWER, Asce7Ice.NONE,
                Ancillaries.of(TOWER, List.of()));
        PanelForce p = wind.panelForces(0).get(0);
        assertEquals(qp, p.q(), 1e-9);
        assertEquals(PHI, p.solidity(), 1e-12);
        assertEquals(cf, p.cf(), 1e-12);
        assertEquals(A, p.area(), 1e-12);
        assertEquals(force, p.fx(), 1e-9);
        assertEquals(0, p.fy(), 1e-9);

        // the eight leg nodes (four at each level) take an eighth each
        List<NodeForce> loads = wind.at(0);
        assertEquals(8, loads.size());
        for (NodeForce n : loads) {
            assertEquals(force / 8, n.fx(), 1e-9);
            assertEquals(0, n.fy(), 1e-9);
            assertEquals(0, n.fz(), 0);
        }

        // wind along the diagonal: K_θ = 1 + K1 K2 sin²90° with K1 = 0.55 (flat members), K2 = φ (0.2 < φ ≤ 0.5)
        double diagonal = force * (1 + 0.55 * PHI);          // 2568.70 N
        assertEquals(2568.70, diagonal, 0.01);
        PanelForce p45 = wind.panelForces(45).get(0);
        assertEquals(diagonal, p45.magnitude(), 1e-9);
        assertEquals(diagonal / Math.sqrt(2), p45.fx(), 1e-9);
        assertEquals(diagonal / Math.sqrt(2), p45.fy(), 1e-9);
        // 30° off the face normal: sin²60° = 0.75
        assertEquals(force * (1 + 0.55 * PHI * 0.75), wind.panelForces(30).get(0).magnitude(), 1e-9);
        assertEquals(force, sum(wind.at(180), 0) * -1, 1e-9);
    }

    @Test
    void asce7ByHand() {
        // ASCE 7-16, exposure C, V = 40 m/s, z = 1.5 m < 15 ft: K_z = 2.01 (15/900)^(2/9.5) = 0.848884 (Table 26.10-1)
        double kz = 2.01 * Math.pow(15.0 / 900, 2 / 9.5);
        assertEquals(0.848884, kz, 1e-6);
        double q = 0.613 * kz * 1.0 * 0.85 * 1.0 * 40 * 40;  // (26.10-1), K_zt = K_e = 1, K_d = 0.85: 707.698 Pa
        assertEquals(707.698, q, 1e-3);
        double cf = 4.0 * PHI * PHI - 5.9 * PHI + 4.0;       // trussed tower, square: 2.878572
        assertEquals(2.878572, cf, 1e-6);
        double force = 0.85 * q * cf * A;                    // F = q_z G C_f A_f, G = 0.85: 2328.60 N
        assertEquals(2328.60, force, 0.01);

        WindLoads wind = WindLoads.of(Asce7Wind.of(Asce7Edition.ASCE_7_16, Exposure.C, 40), TOWER, Asce7Ice.NONE,
                Ancillaries.of(TOWER, List.of()));
        assertEquals(force, sum(wind.at(0), 0), 1e-9);
        assertEquals(force, wind.panelForces(90).get(0).fy(), 1e-9);
        // diagonal wind: × (1 + 0.75 ε) = 1.168097 (below the 1.2 cap)
        assertEquals(force * (1 + 0.75 * PHI), wind.panelForces(45).get(0).magnitude(), 1e-9);
        assertEquals(force * (1 + 0.75 * PHI), wind.panelForces(225).get(0).magnitude(), 1e-9);
    }

    @Test
    void uniformPressureByHand() {
        // 1.2 kPa × 1.0 × A_s = 1613.73 N from every direction
        WindLoads wind = WindLoads.of(new UniformWind(1200, 1.0), TOWER, Asce7Ice.NONE, Ancillaries.of(TOWER, List.of()));
        assertEquals(1200 * A, sum(wind.at(0), 0), 1e-9);
        assertEquals(1200 * A, wind.panelForces(45).get(0).magnitude(), 1e-9);
        assertEquals(1200 * A, wind.panelForces(77).get(0).magnitude(), 1e-9);
    }

    /** Σ of one force component (0 = x, 1 = y) over the loads. */
    static double sum(List<NodeForce> loads, int component) {
        return loads.stream().mapToDouble(l -> component == 0 ? l.fx() : l.fy()).sum();
    }

    static Map<Integer, NodeForce> byNode(List<NodeForce> loads) {
        return loads.stream().collect(Collectors.toMap(NodeForce::node, l -> l));
    }
}
