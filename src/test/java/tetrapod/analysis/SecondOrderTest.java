package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import tetrapod.load.CaseKey;
import tetrapod.model.NodeForce;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * Second-order effects by EN 1993-1-1 5.2.2(5)B (issue 14 item 4): a slender tower with a heavy top
 * (invented test data) has α_cr below 10, so every wind force is multiplied by 1/(1 − 1/α_cr).
 */
class SecondOrderTest {

    private static final String SLENDER = """
        { "name": "slender test mast",
          "base": { "widthX": 1.2, "widthY": 1.2 },
          "segments": [ { "height": 36.0, "panels": 24, "bracing": "x", "horizontals": "all",
              "sections": { "leg": "L60x6", "diagonal": "L40x4", "horizontal": "L40x4" } } ],
          "loads": { "wind": { "method": "uniform", "pressure": 0.3, "forceCoefficient": 1.0 },
                     "ancillaries": [ { "kind": "point", "name": "top mass", "height": 36.0, "weight": %s,
                                        "area": 0.1, "forceCoefficient": 1.0 } ],
                     "combinations": [ { "name": "strength", "dead": 1.35, "wind": 1.5 } ],
                     "sweepStep": 45.0 } }
        """;

    @Test
    void belowTenTheWindIsAmplifiedAndTheCaseReactionsShowIt() throws Exception {
        TestTowers.Analysed a = TestTowers.analyse(SLENDER.formatted("30.0"));
        SecondOrder so = a.result().secondOrder();
        assertTrue(so.alphaCr() > 1 && so.alphaCr() < 10, "α_cr " + so.alphaCr());
        assertTrue(so.applied());
        assertEquals(1 / (1 - 1 / so.alphaCr()), so.amplification(), 1e-12);          // EN 1993-1-1 (5.4)
        FactoredSystem system = Solver.factor(StructuralModel.of(a.result().tower().frame()));
        for (SolvedCase c : a.result().cases()) {
            CaseKey key = a.loads().caseKeys().stream().filter(k -> k.id().equals(c.id())).findFirst().orElseThrow();
            SolvedCase first = Analysis.solveCase(system, a.loads().loadCase(key, 1.0));
            // the dead load has no horizontal part: the whole horizontal reaction is the wind's, amplified
            assertEquals(so.amplification() * horizontal(first), horizontal(c), 1e-9 * Math.abs(horizontal(first)) + 1e-6,
                    c.id());
            // each case records the amplification of its wind and the α_cr of its first-order forces
            assertEquals(key.combination().hasWind() ? so.amplification() : 1.0, c.windAmplification(), 0, c.id());
            assertEquals(first.alphaCr(), c.alphaCr(), 1e-9 * first.alphaCr(), c.id());
            assertTrue(c.alphaCr() >= so.alphaCr(), "the run's factor comes from the smallest α_cr: " + c.id());
        }
    }

    @Test
    void atTenOrMoreNothingIsAmplified() throws Exception {
        SecondOrder so = TestTowers.analyse(SLENDER.formatted("0.5")).result().secondOrder();
        assertTrue(so.alphaCr() >= 10, "α_cr " + so.alphaCr());
        assertEquals(1.0, so.amplification(), 0);
    }

    private static double horizontal(SolvedCase c) {
        double fx = 0;
        double fy = 0;
        for (NodeForce r : c.solution().reactions()) {
            fx += r.fx();
            fy += r.fy();
        }
        return Math.hypot(fx, fy);
    }
}
