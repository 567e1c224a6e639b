package tetrapod.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.NodeForce;
import tetrapod.model.Restraint;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/** The elastic critical load factor against Euler's column loads. */
class CriticalLoadTest {

    private static final double E = 210e9;
    private static final double I = 4e-6;
    private static final double L = 6;

    /** A column of {@code elements} beam-columns along z, with the given end supports. */
    private static Frame column(int elements, Restraint base, Restraint top) {
        var section = TestFrames.section("column", 4e-3, I, I, 1e-5);
        List<Node> nodes = new ArrayList<>();
        List<Member> members = new ArrayList<>();
        for (int k = 0; k <= elements; k++) {
            nodes.add(new Node(k + 1, 0, 0, L * k / elements));
            if (k > 0) {
                members.add(TestFrames.beam(k, k, k + 1, section, Vec3.X));
            }
        }
        List<Support> supports = new ArrayList<>(List.of(new Support(1, base)));
        if (top != null) {
            supports.add(new Support(elements + 1, top));
        }
        return TestFrames.frame("column", Idealisation.FRAME, TestFrames.STEEL, nodes, members, supports);
    }

    private static double alpha(Frame frame, double p) throws Exception {
        FactoredSystem system = Solver.factor(StructuralModel.of(frame));
        int top = frame.nodes().size();
        Solution s = system.solve(new LoadVector("P", List.of(NodeForce.force(top, 0, 0, -p))));
        return CriticalLoad.factor(system, CriticalLoad.axialForces(s));
    }

    /** Cantilever: P_cr = π² E I / (2L)² (Euler, effective length 2L). */
    @Test
    void aCantileverBucklesAtEulersLoad() throws Exception {
        double p = 10e3;
        double euler = Math.PI * Math.PI * E * I / (4 * L * L);
        double a = alpha(column(24, Restraint.FIXED, null), p);
        assertEquals(euler / p, a, 0.01 * euler / p, "α_cr = P_cr / P");
    }

    /**
     * Several sets of forces in one Lanczos pass ({@link CriticalLoad#factors}): each the Euler value
     * of its own load (π² E I / (2L)², as above; tension never buckles), and each to the last bit the
     * value found alone.
     */
    @Test
    void severalCasesTogetherGiveEachItsOwnFactor() throws Exception {
        Frame frame = column(24, Restraint.FIXED, null);
        FactoredSystem system = Solver.factor(StructuralModel.of(frame));
        int top = frame.nodes().size();
        double p = 10e3;
        List<double[]> axial = new ArrayList<>();
        for (double load : new double[] {p, 2 * p, -p, 0.5 * p}) {
            Solution s = system.solve(new LoadVector("P", List.of(NodeForce.force(top, 0, 0, -load))));
            axial.add(CriticalLoad.axialForces(s));
        }
        double[] together = CriticalLoad.factors(system, axial);
        double euler = Math.PI * Math.PI * E * I / (4 * L * L);
        assertEquals(euler / p, together[0], 0.01 * euler / p);
        assertEquals(euler / (2 * p), together[1], 0.01 * euler / (2 * p));
        assertEquals(Double.POSITIVE_INFINITY, together[2], "tension");
        assertEquals(euler / (0.5 * p), together[3], 0.01 * euler / (0.5 * p));
        for (int k = 0; k < axial.size(); k++) {
            assertEquals(Double.doubleToLongBits(CriticalLoad.factor(system, axial.get(k))),
                    Double.doubleToLongBits(together[k]), "case " + k + ": the same bits as alone");
        }
    }

    /**
     * The amplification 1/(1 − 1/α_cr) of EN 1993-1-1 5.2.2(5)B, with α_cr from this solver, against
     * the exact second-order tip sway of a cantilever under P and a tip force H: δ/δ₀ =
     * 3 (tan u − u)/u³, u = L √(P/EI) (S. P. Timoshenko and J. M. Gere, Theory of Elastic Stability,
     * 2nd ed., 1961, §1.11, beam-column with a lateral end load; recalled): within 2 % up to P = 0.4 P_cr.
     */
    @Test
    void theAmplificationOfCriticalLoadFactorMatchesTheExactCantileverSway() throws Exception {
        double euler = Math.PI * Math.PI * E * I / (4 * L * L);
        for (double share : new double[] {0.1, 0.2, 0.3, 0.4}) {
            double p = share * euler;
            double amplification = 1 / (1 - 1 / alpha(column(24, Restraint.FIXED, null), p));
            double u = L * Math.sqrt(p / (E * I));
            double exact = 3 * (Math.tan(u) - u) / (u * u * u);
            assertEquals(exact, amplification, 0.02 * exact, "P = " + share + " P_cr");
        }
    }

    /** Pin-ended column (top held across, free along its axis): P_cr = π² E I / L². */
    @Test
    void aPinEndedColumnBucklesAtEulersLoad() throws Exception {
        double p = 10e3;
        double euler = Math.PI * Math.PI * E * I / (L * L);
        Restraint guided = new Restraint(true, true, false, false, false, true);
        double a = alpha(column(24, Restraint.PINNED, guided), p);
        assertEquals(euler / p, a, 0.01 * euler / p, "α_cr = P_cr / P");
    }

    @Test
    void tensionNeverBuckles() throws Exception {
        Frame frame = column(8, Restraint.FIXED, null);
        FactoredSystem system = Solver.factor(StructuralModel.of(frame));
        Solution s = system.solve(new LoadVector("pull", List.of(NodeForce.force(frame.nodes().size(), 0, 0, 1e4))));
        assertTrue(Double.isInfinite(CriticalLoad.factor(system, CriticalLoad.axialForces(s))));
    }

    /**
     * A prismatic X-braced tower (2 m square, 20 m, 10 panels, continuous legs, fixed base, one
     * plan diagonal at every level so that the square cannot distort) under equal vertical loads at
     * its four top corners buckles as a built-up cantilever. Engesser: P_cr = P_e / (1 + P_e / S_v)
     * (S.P. Timoshenko, J.M. Gere, Theory of Elastic Stability, 2nd ed., §2.17–2.18, laced columns;
     * recalled from memory), P_e = π² E I / (2H)², I = A_leg b² + 4 (I_u + I_v)/2 (legs at 45°),
     * S_v = 2 faces · 2 E A_d b² h / d³ (two diagonals a panel). The formula leaves out the
     * horizontals and the legs' continuity, which stiffen the tower's sway (its static top
     * deflection is 8 % below the formula's), so α_cr lies within 10 % above it; and within 2 % of
     * the Euler load of a cantilever with the tower's own sway stiffness, π² EI / (4H²) with EI =
     * H³ / (3 δ) from the top deflection δ under a unit top load.
     */
    @Test
    void aBracedTowerBucklesAsABuiltUpColumn() throws Exception {
        double b = 2;
        double height = 20;
        int panels = 10;
        TowerFixture fixture = new TowerFixture(Idealisation.FRAME, panels, b, b, height).support(Restraint.FIXED);
        Frame bare = fixture.build();
        List<Member> members = new ArrayList<>(bare.members());
        for (int level = 1; level <= panels; level++) {
            members.add(new Member(members.size() + 1, TowerFixture.cornerId(level, 0, fixture),
                    TowerFixture.cornerId(level, 2, fixture), tetrapod.model.Role.PLAN, 1, 0, tetrapod.model.Face.NONE,
                    TowerFixture.BRACE, true, Vec3.Z));
        }
        Frame frame = new Frame(bare.name(), bare.idealisation(), bare.material(), bare.nodes(), members, bare.supports());
        FactoredSystem system = Solver.factor(StructuralModel.of(frame));
        double p = 100e3;
        List<NodeForce> vertical = new ArrayList<>();
        List<NodeForce> lateral = new ArrayList<>();
        for (int id : fixture.topCorners()) {
            vertical.add(NodeForce.force(id, 0, 0, -p / 4));
            lateral.add(NodeForce.force(id, 0.25, 0, 0));
        }
        double alpha = CriticalLoad.factor(system, CriticalLoad.axialForces(system.solve(new LoadVector("top", vertical))));

        var leg = TowerFixture.LEG.properties();
        double inertia = leg.area() * b * b + 4 * (leg.iu() + leg.iv()) / 2;
        double pe = Math.PI * Math.PI * E * inertia / (4 * height * height);
        double h = height / panels;
        double d = Math.hypot(b, h);
        double sv = 2 * 2 * E * TowerFixture.BRACE.properties().area() * b * b * h / (d * d * d);
        double engesser = pe / (1 + pe / sv) / p;
        assertTrue(alpha >= engesser && alpha <= 1.10 * engesser, "α_cr " + alpha + " against Engesser " + engesser);

        double delta = system.solve(new LoadVector("unit", lateral)).displacement(fixture.topCorners()[0]).ux();
        double ownEuler = Math.PI * Math.PI * (height * height * height / (3 * delta)) / (4 * height * height) / p;
        assertEquals(ownEuler, alpha, 0.02 * ownEuler, "the Euler load of the tower's own sway stiffness");
    }
}
