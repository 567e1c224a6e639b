package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.generate.Tower;
import tetrapod.model.Face;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.AncillarySpec;
import tetrapod.model.spec.Asce7Edition;
import tetrapod.model.spec.Exposure;
import tetrapod.model.spec.TerrainCategory;

/**
 * Superposition of the sweep basis: at arbitrary azimuths Σ c_k(θ) B_k equals the wind load formed
 * directly, node by node, for every method, on a rectangular tapered tower with tubes, K and single
 * bracing, directional factors, ancillaries and ice.
 */
class WindBasisTest {

    private static final Tower TOWER = Towers.mixed(6.0, 4.2);
    private static final List<AncillarySpec> ITEMS = List.of(
            new AncillarySpec.Point("dish", 25.5, 1.2, 1.1, 1.4, 0.0, Face.X_PLUS),
            new AncillarySpec.Point("platform", 27.0, 4.0, 2.5, 1.8, 0.3, Face.NONE),
            new AncillarySpec.Linear("feeder", 0.0, 26.0, 0.15, 0.12, 1.2, 0.0, Face.Y_MINUS));
    private static final double[] AZIMUTHS = {0, 7.3, 17.3, 45, 90, 123.4, 180, 200.05, 289.9, 333.3, 359.9};

    static List<WindProfile> profiles() {
        return List.of(
                new En1991Wind(TerrainCategory.CAT_III, 27, 1, 1.1, 1, 1.25, 0.95,
                        List.of(0.8, 0.8, 0.9, 1.0, 1.0, 0.9, 0.8, 0.7, 0.7, 0.8, 0.9, 1.0)),
                Asce7Wind.of(Asce7Edition.ASCE_7_22, Exposure.D, 45),
                new UniformWind(1500, 2.2));
    }

    @ParameterizedTest
    @MethodSource("profiles")
    void basisSumEqualsTheDirectLoadAtAnyAzimuth(WindProfile profile) {
        for (Asce7Ice ice : List.of(Asce7Ice.NONE, new Asce7Ice(0.02, 900, true))) {
            WindLoads wind = WindLoads.of(profile, TOWER, ice, Ancillaries.of(TOWER, ITEMS));
            WindBasis basis = wind.basis();
            assertTrue(basis.size() <= 10, "at most ten basis vectors, had " + basis.size());
            for (double theta : AZIMUTHS) {
                Map<Integer, double[]> superposed = new HashMap<>();
                double[] c = basis.coefficients(theta);
                for (int k = 0; k < basis.size(); k++) {
                    for (NodeForce l : basis.vectors().get(k).loads()) {
                        double[] f = superposed.computeIfAbsent(l.node(), n -> new double[3]);
                        f[0] += c[k] * l.fx();
                        f[1] += c[k] * l.fy();
                        f[2] += c[k] * l.fz();
                    }
                }
                List<NodeForce> direct = wind.at(theta);
                double scale = direct.stream().mapToDouble(l -> Math.hypot(l.fx(), l.fy())).max().orElse(1);
                for (NodeForce l : direct) {
                    double[] f = superposed.getOrDefault(l.node(), new double[3]);
                    assertEquals(l.fx(), f[0], 1e-12 * scale, "fx at node " + l.node() + ", θ = " + theta);
                    assertEquals(l.fy(), f[1], 1e-12 * scale, "fy at node " + l.node() + ", θ = " + theta);
                    assertEquals(0, f[2], 0);
                }
                assertEquals(direct.size(), superposed.size(), "same loaded nodes at θ = " + theta);
            }
        }
    }

    /** The distribution keeps every force: the nodal loads add up to the panel and ancillary forces. */
    @ParameterizedTest
    @MethodSource("profiles")
    void nodalLoadsAddUpToThePanelAndAncillaryForces(WindProfile profile) {
        WindLoads wind = WindLoads.of(profile, TOWER, Asce7Ice.NONE, Ancillaries.of(TOWER, ITEMS));
        for (double theta : AZIMUTHS) {
            AzimuthWind w = wind.azimuth(theta);
            double fx = w.panels().stream().mapToDouble(PanelForce::fx).sum()
                    + w.ancillaries().stream().mapToDouble(AncillaryForce::fx).sum();
            double fy = w.panels().stream().mapToDouble(PanelForce::fy).sum()
                    + w.ancillaries().stream().mapToDouble(AncillaryForce::fy).sum();
            List<NodeForce> loads = wind.at(theta);
            assertEquals(fx, OnePanelTowerTest.sum(loads, 0), 1e-9 * Math.max(1, Math.abs(fx)));
            assertEquals(fy, OnePanelTowerTest.sum(loads, 1), 1e-9 * Math.max(1, Math.abs(fy)));
        }
    }
}
