package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.generate.Panel;
import tetrapod.generate.PanelLevel;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.SpecReader;
import tetrapod.load.TowerLoads;
import tetrapod.model.Face;
import tetrapod.model.spec.ServiceabilitySpec;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * Serviceability's tilt, sway and twist of a level against the closed-form rotation of a cantilever
 * (Euler–Bernoulli, as the element: e.g. Gere and Timoshenko, Mechanics of Materials, table of
 * cantilever deflections): a vertical cantilever column of length L, fixed at its base, carries at
 * its top a level of four arms out to "leg" nodes at (±a, ±a). The arms carry no load of their own
 * except their weight, which is the same on all four, so the level moves rigidly with the column's
 * top. Under a tip force P along x and a tip torque T about z:
 * <pre>
 *   tilt  θ = P L² / (2 E I)        sway  Δ = P L³ / (3 E I)        twist  φ = T L / (G J)
 * </pre>
 * E = 210 000 MPa, G = 81 000 MPa, I = 1 000 cm⁴, J = 2 000 cm⁴, L = 10 m, P = 2 kN, T = 3 kN·m:
 * θ = 2000 × 100 / (2 × 2.1e6) = 0.0476190 rad, Δ = 2000 × 1000 / (3 × 2.1e6) = 0.317460 m,
 * φ = 3000 × 10 / (8.1e10 × 2e-5) = 0.0185185 rad. (Invented test data; the formulas are the check.)
 */
class CantileverTiltTest {

    private static final double E = 210_000e6;
    private static final double G = 81_000e6;
    private static final double I = 1_000e-8;
    private static final double J = 2_000e-8;
    private static final double L = 10.0;
    private static final double P = 2_000;
    private static final double T = 3_000;

    private static final String FRAME = """
        { "name": "cantilever column with a level of four arms at its top",
          "idealisation": "frame",
          "material": { "name": "steel", "E": 210000, "G": 81000, "fy": 355, "fu": 490, "density": 7850 },
          "userSections": {
            "COL": { "properties": { "A_cm2": 100, "Iy_cm4": 1000, "Iz_cm4": 1000, "Iv_cm4": 1000, "J_cm4": 2000,
                                     "width_mm": 200, "flatSided": false } },
            "ARM": { "properties": { "A_cm2": 50, "Iy_cm4": 500, "Iz_cm4": 500, "Iv_cm4": 500, "J_cm4": 1000,
                                     "width_mm": 150, "flatSided": false } } },
          "frame": {
            "nodes": [
              { "id": 1, "x": 0, "y": 0, "z": 0 }, { "id": 2, "x": 0, "y": 0, "z": 2.5 }, { "id": 3, "x": 0, "y": 0, "z": 5 },
              { "id": 4, "x": 0, "y": 0, "z": 7.5 }, { "id": 5, "x": 0, "y": 0, "z": 10 },
              { "id": 11, "x": -1, "y": -1, "z": 0 }, { "id": 12, "x": 1, "y": -1, "z": 0 },
              { "id": 13, "x": 1, "y": 1, "z": 0 }, { "id": 14, "x": -1, "y": 1, "z": 0 },
              { "id": 21, "x": -1, "y": -1, "z": 10 }, { "id": 22, "x": 1, "y": -1, "z": 10 },
              { "id": 23, "x": 1, "y": 1, "z": 10 }, { "id": 24, "x": -1, "y": 1, "z": 10 } ],
            "members": [
              { "id": 1, "i": 1, "j": 2, "section": "COL", "role": "general", "continuous": true },
              { "id": 2, "i": 2, "j": 3, "section": "COL", "role": "general", "continuous": true },
              { "id": 3, "i": 3, "j": 4, "section": "COL", "role": "general", "continuous": true },
              { "id": 4, "i": 4, "j": 5, "section": "COL", "role": "general", "continuous": true },
              { "id": 11, "i": 5, "j": 21, "section": "ARM", "role": "general", "continuous": true },
              { "id": 12, "i": 5, "j": 22, "section": "ARM", "role": "general", "continuous": true },
              { "id": 13, "i": 5, "j": 23, "section": "ARM", "role": "general", "continuous": true },
              { "id": 14, "i": 5, "j": 24, "section": "ARM", "role": "general", "continuous": true } ],
            "supports": [ { "node": 1, "type": "fixed" }, { "node": 11, "type": "fixed" }, { "node": 12, "type": "fixed" },
                          { "node": 13, "type": "fixed" }, { "node": 14, "type": "fixed" } ] },
          "loads": { "nodal": [ { "node": 5, "F": [2.0, 0, 0, 0, 0, 3.0] } ] } }
        """;

    @Test
    void theTopLevelTiltsSwaysAndTwistsAsTheClosedFormCantilever() throws Exception {
        SectionCatalogue catalogue = SectionCatalogue.standard();
        TowerSpec spec = SpecReader.read(FRAME, catalogue);
        Tower frame = TowerGenerator.generate(spec, catalogue.with(spec.userSections()), SteelGrades.fromSpec(spec.material()));
        // the frame seen as a one-panel tower: the base corners and the arm ends are its two levels' leg nodes
        PanelLevel base = new PanelLevel(0, 0, 2, 2, List.of(11, 12, 13, 14), false, false);
        PanelLevel top = new PanelLevel(1, L, 2, 2, List.of(21, 22, 23, 24), false, false);
        Map<Face, List<Integer>> noBracing = new EnumMap<>(Face.class);
        Panel panel = new Panel(1, 1, 1, base, top, List.of(List.of(), List.of(), List.of(), List.of()), noBracing, List.of());
        Tower tower = new Tower(frame.frame(), List.of(base, top), List.of(panel), 0);
        TowerLoads loads = TowerLoads.build(tower, spec.loads());
        ServiceabilityPlan plan = ServiceabilityPlan.of(tower, loads, ServiceabilitySpec.NONE).orElseThrow();
        FactoredSystem system = Solver.factor(StructuralModel.of(tower.frame()));

        ServiceabilityResult result = ServiceabilitySweep.of(system, plan).run();

        ServiceMotion.Level level = result.levels().get(1);
        double tilt = P * L * L / (2 * E * I);       // cantilever, tip load: θ = PL²/2EI
        double sway = P * L * L * L / (3 * E * I);   // Δ = PL³/3EI
        double twist = T * L / (G * J);              // φ = TL/GJ
        assertEquals(0.0476190, tilt, 5e-8);
        assertEquals(0.317460, sway, 5e-7);
        assertEquals(0.0185185, twist, 5e-8);
        assertEquals(tilt, level.envelope().tilt().value(), 1e-9 * tilt);
        assertEquals(sway, level.envelope().sway().value(), 1e-9 * sway);
        assertEquals(twist, level.envelope().twist().value(), 1e-9 * twist);
        assertNull(level.envelope().tilt().azimuthDeg(), "no wind: one case, no azimuth");
        assertEquals("1.0G + 1.0Q", result.combination());
        ServiceMotion.Level ground = result.levels().get(0);
        assertEquals(0.0, ground.envelope().sway().value(), 1e-15);
        assertEquals(0.0, ground.envelope().tilt().value(), 1e-15);
    }
}
