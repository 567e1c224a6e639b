package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.load.AncillaryForce;
import tetrapod.load.AzimuthWind;
import tetrapod.load.CaseKey;
import tetrapod.load.Combination;
import tetrapod.model.spec.LoadAction;
import tetrapod.load.PanelForce;
import tetrapod.model.Support;
import tetrapod.model.NodeForce;

/** The azimuth sweep: superposition against direct solves, equilibrium, symmetry (issue 4 item 7). */
class SweepTest {

    private static final String EN1991_WIND = """
        { "wind": { "method": "en1991", "basicSpeed": 27.0, "terrain": "II" },
          "ancillaries": [ { "kind": "point", "name": "antenna", "height": 19.0, "weight": 1.5, "area": 0.8,
                             "forceCoefficient": 1.2, "face": "+x" } ],
          "sweepStep": 5.0 }
        """;

    @Test
    void superposedReactionsEqualADirectSolveAtArbitraryAzimuths() throws Exception {
        TestTowers.Analysed a = TestTowers.analyse(TestTowers.squareTower(EN1991_WIND));
        var system = tetrapod.solve.Solver.factor(a.result().model());
        int supports = a.result().tower().frame().supports().size();
        for (Combination c : a.loads().combinations()) {
            if (!c.hasWind()) {
                continue;
            }
            for (double azimuth : new double[] {0.0, 17.3, 45.0, 133.7, 233.0, 359.9}) {
                double[] weights = a.loads().basis().weights(c, azimuth);
                double[] superposed = a.result().responses().reactions(weights, new double[6 * supports]);
                var direct = Analysis.solveCase(system, a.loads().loadCase(new CaseKey(c, azimuth))).solution();
                double scale = 0;
                for (NodeForce r : direct.reactions()) {
                    scale = Math.max(scale, r.force().norm());
                }
                for (int s = 0; s < supports; s++) {
                    NodeForce r = direct.reactions().get(s);
                    for (int k = 0; k < 3; k++) {
                        // Linearity: the response to Σ w_k F_k is Σ w_k response(F_k), to round-off.
                        assertEquals(r.component(k), superposed[6 * s + k], 1e-9 * scale,
                                c.name() + " at " + azimuth + " deg, support " + s + ", component " + k);
                    }
                }
            }
        }
    }

    @Test
    void totalHorizontalReactionBalancesTheWindAtEveryAzimuth() throws Exception {
        TestTowers.Analysed a = TestTowers.analyse(TestTowers.squareTower(EN1991_WIND));
        Combination windOnly = new Combination("W", Map.of(LoadAction.WIND, 1.0));
        int supports = a.result().tower().frame().supports().size();
        var wind = a.loads().wind().orElseThrow();
        for (double azimuth : a.loads().azimuths()) {
            double[] r = a.result().responses().reactions(a.loads().basis().weights(windOnly, azimuth),
                    new double[6 * supports]);
            double rx = 0;
            double ry = 0;
            for (int s = 0; s < supports; s++) {
                rx += r[6 * s];
                ry += r[6 * s + 1];
            }
            AzimuthWind w = wind.azimuth(azimuth);
            double fx = 0;
            double fy = 0;
            for (PanelForce p : w.panels()) {
                fx += p.fx();
                fy += p.fy();
            }
            for (AncillaryForce f : w.ancillaries()) {
                fx += f.fx();
                fy += f.fy();
            }
            // Global equilibrium: Σ reactions + Σ applied wind = 0.
            double scale = Math.hypot(fx, fy);
            assertTrue(scale > 1e3, "the wind must be real, was " + scale + " N");
            assertEquals(-fx, rx, 1e-9 * scale, "at " + azimuth + " deg");
            assertEquals(-fy, ry, 1e-9 * scale, "at " + azimuth + " deg");
        }
    }

    @Test
    void aSquareTowersLegReactionsRepeatEveryQuarterTurn() throws Exception {
        TestTowers.Analysed a = TestTowers.analyse(TestTowers.squareTower(
                "{ \"wind\": { \"method\": \"en1991\", \"basicSpeed\": 27.0, \"terrain\": \"II\" }, \"sweepStep\": 5.0 }"));
        List<LegBaseSweep> sweeps = a.result().sweep();
        String combination = sweeps.get(0).combination();
        List<LegBaseSweep> legs = sweeps.stream().filter(s -> s.combination().equals(combination)).toList();
        assertEquals(4, legs.size());
        int n = legs.get(0).azimuthDeg().size();
        int quarter = n / 4;
        double scale = 0;
        for (LegBaseSweep leg : legs) {
            for (double fz : leg.fz()) {
                scale = Math.max(scale, Math.abs(fz));
            }
        }
        for (int i = 0; i < n; i++) {
            double[] now = new double[4];
            double[] later = new double[4];
            for (int k = 0; k < 4; k++) {
                now[k] = legs.get(k).fz().get(i);
                later[k] = legs.get(k).fz().get((i + quarter) % n);
            }
            Arrays.sort(now);
            Arrays.sort(later);
            for (int k = 0; k < 4; k++) {
                // A square tower looks the same after a quarter turn: the set of leg forces repeats.
                assertEquals(now[k], later[k], 1e-6 * scale, "azimuth " + legs.get(0).azimuthDeg().get(i));
            }
        }
    }

    @Test
    void supportsAreTheFourLegBases() throws Exception {
        TestTowers.Analysed a = TestTowers.analyse(TestTowers.squareTower(EN1991_WIND));
        assertEquals(List.of(1, 2, 3, 4), a.result().tower().frame().supports().stream().map(Support::node).toList());
    }
}
