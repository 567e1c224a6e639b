package tetrapod.solve;

import tetrapod.model.NodeForce;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Node;
import tetrapod.model.Restraint;
import tetrapod.model.Section;
import tetrapod.model.Support;

/**
 * A statically determinate space truss (a tripod) solved by the method of joints by hand, here in
 * the test. Apex D (0, 0, 4) m on three bars to pinned supports A (3, 0, 0), B (0, 3, 0),
 * C (0, 0, 0). Bar lengths DA = DB = 5 m (3-4-5 triangles), DC = 4 m.
 */
class TripodTest {

    private static final double EA = 210e9 * 2.0e-3;

    private static Frame tripod() {
        Section s = TestFrames.section("bar", 2.0e-3, 1e-6, 1e-6, 1e-8);
        return TestFrames.frame("tripod", Idealisation.TRUSS, TestFrames.STEEL,
                List.of(new Node(1, 3, 0, 0), new Node(2, 0, 3, 0), new Node(3, 0, 0, 0), new Node(4, 0, 0, 4)),
                List.of(TestFrames.bar(1, 1, 4, s), TestFrames.bar(2, 2, 4, s), TestFrames.bar(3, 3, 4, s)),
                List.of(new Support(1, Restraint.PINNED), new Support(2, Restraint.PINNED), new Support(3, Restraint.PINNED)));
    }

    @Test
    void barForcesReactionsAndApexDisplacementByTheMethodOfJoints() throws Exception {
        double px = 10e3;
        double py = -6e3;
        double pz = -50e3;
        Solution s = Solver.factor(StructuralModel.of(tripod()))
                .solve(new LoadVector("P", List.of(NodeForce.force(4, px, py, pz))));

        // Joint D: unit vectors from D towards A, B, C are (3,0,−4)/5, (0,3,−4)/5, (0,0,−1);
        // tension N pulls D towards the far end:  Σ N·e + P = 0.
        //   x: 0.6·N_A + Px = 0            → N_A = −Px/0.6
        //   y: 0.6·N_B + Py = 0            → N_B = −Py/0.6
        //   z: −0.8·N_A − 0.8·N_B − N_C + Pz = 0 → N_C = Pz − 0.8·(N_A + N_B)
        double nA = -px / 0.6;
        double nB = -py / 0.6;
        double nC = pz - 0.8 * (nA + nB);
        assertEquals(nA, s.memberForces(1).axial(), 1e-9 * Math.abs(pz), "N_DA");
        assertEquals(nB, s.memberForces(2).axial(), 1e-9 * Math.abs(pz), "N_DB");
        assertEquals(nC, s.memberForces(3).axial(), 1e-9 * Math.abs(pz), "N_DC");

        // Supports: a bar in tension pulls its support towards D; the support pushes back, so the
        // reaction on the structure is N times the unit vector from D towards the support,
        // e.g. R_A = N_A·(0.6, 0, −0.8).
        NodeForce rA = s.reaction(1);
        assertEquals(0.6 * nA, rA.fx(), 1e-9 * Math.abs(pz), "R_A x");
        assertEquals(-0.8 * nA, rA.fz(), 1e-9 * Math.abs(pz), "R_A z");
        assertEquals(-nC, s.reaction(3).fz(), 1e-9 * Math.abs(pz), "R_C z");

        // Compatibility: elongation δ = N·L/EA = u_D · (unit from support to D)
        //   C: u_z = δ_C;  A: −0.6·u_x + 0.8·u_z = δ_A;  B: −0.6·u_y + 0.8·u_z = δ_B
        double dA = nA * 5 / EA;
        double dB = nB * 5 / EA;
        double dC = nC * 4 / EA;
        double uz = dC;
        double ux = (0.8 * uz - dA) / 0.6;
        double uy = (0.8 * uz - dB) / 0.6;
        NodeDisplacement d = s.displacement(4);
        double scale = Math.abs(ux) + Math.abs(uy) + Math.abs(uz);
        assertEquals(ux, d.ux(), 1e-9 * scale, "u_x");
        assertEquals(uy, d.uy(), 1e-9 * scale, "u_y");
        assertEquals(uz, d.uz(), 1e-9 * scale, "u_z");
        assertEquals(0, s.equilibriumError(), 1e-12);
    }
}
