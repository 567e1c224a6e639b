package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.generate.PanelLevel;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.SpecReader;
import tetrapod.load.LoadCase;
import tetrapod.load.TowerLoads;
import tetrapod.model.Node;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.LoadVector;
import tetrapod.solve.NodeDisplacement;
import tetrapod.solve.Solution;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * The serviceability sweep superposes the responses to its load basis; the reference is a direct
 * solve of the serviceability combination's load vector, formed directly at each azimuth, with the
 * fit of each level taken from the direct displacements (linear statics: superposition is exact up to
 * rounding). On a tower with a directional factor table and face-mounted items, so that every
 * movement depends on the azimuth; every azimuth of a 15° sweep is compared, and the envelope and its
 * governing azimuth must be the largest of the direct values. Invented test tower.
 */
class ServiceabilitySuperpositionTest {

    private static final String TOWER = TestTowers.squareTower("""
            { "wind": { "method": "en1991", "basicSpeed": 28.0, "terrain": "II", "structuralFactor": 1.0,
                        "directionFactors": [1.0, 0.9, 0.8, 0.7, 0.8, 0.9, 1.0, 0.95, 0.85, 0.75, 0.85, 0.95] },
              "ancillaries": [
                { "kind": "point", "name": "dish", "height": 17.0, "weight": 1.2, "area": 1.1, "forceCoefficient": 1.5, "face": "+x" },
                { "kind": "point", "name": "panel", "height": 20.0, "weight": 0.8, "area": 0.9, "forceCoefficient": 1.4, "face": "-y" },
                { "kind": "linear", "name": "feeder", "from": 0.0, "to": 20.0, "weight": 0.2, "width": 0.15,
                  "forceCoefficient": 1.3, "face": "+y" } ],
              "sweepStep": 15.0 }""").replace("\"loads\"", "\"serviceability\": { \"wind\": { \"returnPeriod\": 10 } },\n  \"loads\"");

    @Test
    void everyAzimuthEqualsADirectSolveAndTheEnvelopeIsTheirLargest() throws Exception {
        SectionCatalogue catalogue = SectionCatalogue.standard();
        TowerSpec spec = SpecReader.read(TOWER, catalogue);
        Tower tower = TowerGenerator.generate(spec, catalogue, SteelGrades.fromSpec(spec.material()));
        TowerLoads loads = TowerLoads.build(tower, spec.loads());
        ServiceabilityPlan plan = ServiceabilityPlan.of(tower, loads, spec.serviceability()).orElseThrow();
        StructuralModel model = StructuralModel.of(tower.frame());
        FactoredSystem system = Solver.factor(model);
        ServiceabilitySweep sweep = ServiceabilitySweep.of(system, plan);
        ServiceabilityResult result = sweep.run();

        List<PanelLevel> levels = tower.levels();
        List<Double> azimuths = plan.loads().azimuths();
        assertEquals(24, azimuths.size());
        double[][][] direct = new double[azimuths.size()][levels.size()][];
        double[] weights = new double[plan.loads().basis().size()];
        double[] superposed = new double[6 * plan.stations().size()];
        double largestMotion = 0;
        for (int a = 0; a < azimuths.size(); a++) {
            LoadCase c = plan.loads().loadCase(azimuths.get(a));
            Solution s = system.solve(new LoadVector(c.id(), c.loads()));
            sweep.motions(plan.loads().weights(azimuths.get(a), weights), superposed);
            for (int l = 0; l < levels.size(); l++) {
                direct[a][l] = fit(tower, levels.get(l), s);
                for (int k = 0; k < 6; k++) {
                    largestMotion = Math.max(largestMotion, Math.abs(direct[a][l][k]));
                }
            }
            for (int l = 0; l < levels.size(); l++) {
                for (int k = 0; k < 6; k++) {
                    assertEquals(direct[a][l][k], superposed[6 * l + k], 1e-9 * largestMotion,
                            "azimuth " + azimuths.get(a) + ", level " + l + ", component " + k);
                }
            }
        }
        assertTrue(largestMotion > 1e-3, "the tower moves: " + largestMotion);

        for (int l = 1; l < levels.size(); l++) {
            ServiceMotion.Level level = result.levels().get(l);
            for (Movement q : Movement.values()) {
                double best = -1;
                double bestAzimuth = Double.NaN;
                for (int a = 0; a < azimuths.size(); a++) {
                    double[] m = direct[a][l];
                    double v = switch (q) {
                        case SWAY -> Math.hypot(m[0], m[1]);
                        case TILT -> Math.hypot(m[3], m[4]);
                        case TWIST -> Math.abs(m[5]);
                    };
                    if (v > best) {
                        best = v;
                        bestAzimuth = azimuths.get(a);
                    }
                }
                MotionPeak peak = level.envelope().of(q);
                assertEquals(best, peak.value(), 1e-9 * Math.max(best, 1e-12), "level " + l + " " + q);
                assertEquals(bestAzimuth, peak.azimuthDeg(), 1e-12, "governing azimuth of level " + l + " " + q);
            }
        }
    }

    /** The level's rigid-body fit from the direct solution's leg displacements. */
    private static double[] fit(Tower tower, PanelLevel level, Solution s) {
        double[][] xyz = new double[4][];
        double[][] u = new double[4][];
        for (int k = 0; k < 4; k++) {
            int id = level.legNodes().get(k);
            Node n = tower.frame().nodes().stream().filter(x -> x.id() == id).findFirst().orElseThrow();
            xyz[k] = new double[] {n.x(), n.y(), n.z()};
            NodeDisplacement d = s.displacement(id);
            u[k] = new double[] {d.ux(), d.uy(), d.uz()};
        }
        return new RigidBodyFit(xyz).fit(u, new double[6]);
    }
}
