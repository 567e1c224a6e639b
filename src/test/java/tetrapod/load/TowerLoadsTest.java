package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.generate.Tower;
import tetrapod.model.Face;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.ActionFactorSet;
import tetrapod.model.spec.ActionFactors;
import tetrapod.model.spec.AncillarySpec;
import tetrapod.model.spec.Asce7Edition;
import tetrapod.model.spec.CombinationSpec;
import tetrapod.model.spec.Exposure;
import tetrapod.model.spec.IceSpec;
import tetrapod.model.spec.LoadAction;
import tetrapod.model.spec.LoadsSpec;
import tetrapod.model.spec.LoadsSpec.NodalLoadSpec;
import tetrapod.model.spec.TerrainCategory;
import tetrapod.model.spec.WindSpec;

/** The tower's loads as load cases: combinations, the sweep, superposition of the load basis. */
class TowerLoadsTest {

    private static final Tower TOWER = Towers.mixed(5.0, 5.0);
    private static final List<AncillarySpec> ITEMS = List.of(
            new AncillarySpec.Point("antennas", 26, 3.0, 2.4, 1.5, 0, Face.NONE),
            new AncillarySpec.Linear("feeder", 0, 24, 0.2, 0.15, 1.3, 0.1, Face.Y_PLUS));
    private static final WindSpec EN = new WindSpec.En1991(26, TerrainCategory.CAT_II, List.of(), 1, 1, 1, 1, 1.25);
    private static final IceSpec ICE = new IceSpec(new IceSpec.Given(20, true), 900, 18, Double.NaN);

    private static final ActionFactors EN1990 = new ActionFactors(ActionFactorSet.EN1990, 2);

    private static LoadsSpec spec(WindSpec wind, IceSpec ice, List<CombinationSpec> combinations, double step) {
        return new LoadsSpec(List.of(new NodalLoadSpec(TOWER.frame().nodes().size(), 1.0, 0, -2.0, 0, 0, 0.5)), wind,
                ITEMS, ice, combinations, step);
    }

    /** EN 1990 Table A1.2(B): γ_G = 1.35 (1.0 favourable), γ_Q = 1.5; ψ0 = 0.5 for the accompanying ice action. */
    @Test
    void en1990DefaultsWithIceAndNodalLoads() throws BadInputException {
        TowerLoads loads = TowerLoads.build(TOWER, spec(EN, ICE, List.of(), 5).withActionFactors(EN1990));
        List<String> names = loads.combinations().stream().map(Combination::name).toList();
        assertEquals(List.of("1.35G + 1.5W + 1.0Q", "1.0G + 1.5W + 1.0Q", "1.35G + 1.5I + 0.75Wi + 1.0Q",
                "1.35G + 0.75I + 1.5Wi + 1.0Q"), names);
        assertEquals(72, loads.azimuths().size());
        assertEquals(4 * 72, loads.caseKeys().size());
        assertEquals("1.35G + 1.5W + 1.0Q@45", loads.caseKeys().get(9).id());
    }

    @Test
    void asce7Defaults() throws BadInputException {
        WindSpec asce = new WindSpec.Asce7(Asce7Edition.ASCE_7_16, 45, Exposure.C, 1, 1, 0.85, 0.85);
        TowerLoads loads = TowerLoads.build(TOWER, new LoadsSpec(List.of(), asce, List.of(), ICE, List.of(), 10));
        assertEquals(List.of("1.2D + 1.0W", "0.9D + 1.0W", "1.2D + 1.0Di + 1.0Wi", "0.9D + 1.0Di + 1.0Wi"),
                loads.combinations().stream().map(Combination::name).toList());
    }

    @Test
    void withoutWindOneCasePerCombination() throws BadInputException {
        TowerLoads loads = TowerLoads.build(TOWER, new LoadsSpec(List.of()));
        assertEquals(List.of("1.0G"), loads.combinations().stream().map(Combination::name).toList());
        assertEquals(1, loads.caseKeys().size());
        assertNull(loads.caseKeys().get(0).azimuthDeg());
        assertEquals("1.0G", loads.caseKeys().get(0).id());
        assertFalse(loads.wind().isPresent());
    }

    @Test
    void fineSweepIsExactMultiples() throws BadInputException {
        TowerLoads loads = TowerLoads.build(TOWER, spec(EN, null, List.of(), 0.1).withActionFactors(EN1990));
        List<Double> az = loads.azimuths();
        assertEquals(3600, az.size());
        assertEquals(359.9, az.get(3599), 1e-9);
        assertEquals(123.4, az.get(1234), 1e-9);
        assertEquals("1.0G + 1.5W + 1.0Q@123.4", new CaseKey(loads.combinations().get(1), az.get(1234)).id());
    }

    /** Σ w_j(combination, θ) · component_j equals the load case formed directly, for every combination. */
    @Test
    void loadBasisSuperposesToEveryDirectCase() throws BadInputException {
        List<CombinationSpec> mine = List.of(
                new CombinationSpec("all", Map.of(LoadAction.DEAD, 1.1, LoadAction.WIND, 0.7, LoadAction.ICE, 0.4,
                        LoadAction.WIND_ON_ICE, 0.3, LoadAction.NODAL, 1.6)),
                new CombinationSpec("dead only", Map.of(LoadAction.DEAD, 1.0)));
        for (List<CombinationSpec> combos : List.of(List.<CombinationSpec>of(), mine)) {
            TowerLoads loads = TowerLoads.build(TOWER, spec(EN, ICE, combos, 5));
            LoadBasis basis = loads.basis();
            for (Combination c : loads.combinations()) {
                for (Double theta : c.hasWind() ? List.of(0.0, 31.7, 45.0, 199.9, 312.5) : java.util.Collections.<Double>singletonList(null)) {
                    double[] w = basis.weights(c, theta);
                    Map<Integer, double[]> sum = new HashMap<>();
                    for (int j = 0; j < basis.size(); j++) {
                        for (NodeForce l : basis.components().get(j).loads()) {
                            double[] f = sum.computeIfAbsent(l.node(), n -> new double[6]);
                            f[0] += w[j] * l.fx();
                            f[1] += w[j] * l.fy();
                            f[2] += w[j] * l.fz();
                            f[5] += w[j] * l.mz();
                        }
                    }
                    LoadCase direct = loads.loadCase(c, theta);
                    for (NodeForce l : direct.loads()) {
                        double[] f = sum.get(l.node());
                        String where = c.name() + " θ=" + theta + " node " + l.node();
                        assertEquals(l.fx(), f[0], 1e-8, where);
                        assertEquals(l.fy(), f[1], 1e-8, where);
                        assertEquals(l.fz(), f[2], 1e-8, where);
                        assertEquals(l.mz(), f[5], 1e-8, where);
                    }
                }
            }
        }
    }

    @Test
    void deadLoadIsSelfWeightPlusAncillaries() throws BadInputException {
        TowerLoads loads = TowerLoads.build(TOWER, spec(EN, ICE, List.of(), 5));
        double self = loads.selfWeight().stream().mapToDouble(NodeForce::fz).sum();
        double dead = loads.dead().stream().mapToDouble(NodeForce::fz).sum();
        // 3 kN + 0.2 kN/m × 24 m = 7.8 kN of ancillaries
        assertEquals(-7800, dead - self, 1e-9);
        assertEquals(-TOWER.steelMassWithAllowance() * 9.80665, self, 1e-6);
        assertTrue(loads.ice().stream().mapToDouble(NodeForce::fz).sum() < 0);
        // the nodal load in N and N·m
        assertEquals(List.of(new NodeForce(TOWER.frame().nodes().size(), 1000, 0, -2000, 0, 0, 500)), loads.nodal());
    }

    /** A square tower meets the same total wind every 90° (the faces map onto each other). */
    @Test
    void squareTowerWindIsPeriodicWithNinetyDegrees() throws BadInputException {
        TowerLoads loads = TowerLoads.build(TOWER, spec(EN, null, List.of(), 5));
        WindLoads wind = loads.wind().orElseThrow();
        for (double theta : new double[] {0, 12.5, 45, 67}) {
            double a = total(wind.panelForces(theta));
            assertEquals(a, total(wind.panelForces(theta + 90)), 1e-9 * a);
            assertEquals(a, total(wind.panelForces(theta + 270)), 1e-9 * a);
        }
    }

    private static double total(List<PanelForce> forces) {
        return forces.stream().mapToDouble(PanelForce::magnitude).sum();
    }

    @Test
    void problemsFoundWithTheTowerInHand() {
        LoadsSpec bad = new LoadsSpec(List.of(new NodalLoadSpec(99999, 1, 0, 0, 0, 0, 0)), null,
                List.of(new AncillarySpec.Point("mast head", 40, 1, 1, 1, 0, Face.NONE)), null,
                List.of(new CombinationSpec("w", Map.of(LoadAction.WIND, 1.0))), 5);
        BadInputException e = assertThrows(BadInputException.class, () -> TowerLoads.build(TOWER, bad));
        List<String> shown = e.problems().stream().map(Problem::toString).toList();
        assertTrue(shown.contains("loads.nodal[0].node: node 99999 does not exist; the tower's nodes are 1 to "
                + TOWER.frame().nodes().size()), shown.toString());
        assertTrue(shown.contains("loads.ancillaries[0].height: is above the tower top (27 m), was 40 m"), shown.toString());
        assertTrue(shown.contains("loads.combinations[0].wind: the model has no wind (loads.wind)"), shown.toString());
    }
}
