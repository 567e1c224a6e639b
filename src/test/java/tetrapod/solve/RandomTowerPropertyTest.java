package tetrapod.solve;

import tetrapod.model.NodeForce;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Node;
import tetrapod.model.Restraint;

/**
 * Invariants on randomly generated towers (seeded): the sparse solution equals an independent
 * dense solution, loads and reactions are in equilibrium, superposition holds, and symmetric
 * towers respond symmetrically.
 */
class RandomTowerPropertyTest {

    private static final double RELATIVE = 1e-9;

    /** A random tower and two random load vectors, all from one seed. */
    record Case(long seed, Frame frame, LoadVector first, LoadVector second) {
        @Override
        public String toString() {
            return "seed " + seed + " " + frame.idealisation() + " " + frame.nodes().size() + " nodes";
        }
    }

    static Stream<Case> towers() {
        return IntStream.range(0, 24).mapToObj(RandomTowerPropertyTest::randomCase);
    }

    static Case randomCase(long seed) {
        Random random = new Random(seed * 0x9E3779B97F4A7C15L); // spread small seeds: java.util.Random correlates them
        Idealisation idealisation = random.nextBoolean() ? Idealisation.TRUSS : Idealisation.FRAME;
        double base = 3 + 5 * random.nextDouble();
        double top = base * (0.3 + 0.7 * random.nextDouble());
        int panels = 2 + random.nextInt(5);
        double height = base * (1.5 + 3 * random.nextDouble());
        TowerFixture.Pattern pattern = TowerFixture.Pattern.values()[random.nextInt(3)];
        Restraint support = idealisation == Idealisation.FRAME && random.nextBoolean() ? Restraint.FIXED : Restraint.PINNED;
        TowerFixture fixture = new TowerFixture(idealisation, panels, base, top, height).pattern(pattern).support(support);
        if (pattern == TowerFixture.Pattern.X && random.nextBoolean()) {
            fixture.redundantInFirstPanel();
        }
        if (random.nextInt(3) == 0) {
            fixture.splitFirstLeg();
        }
        Frame frame = fixture.build();
        if (random.nextBoolean()) { // scramble the node order: the solver must not care
            List<Node> nodes = new ArrayList<>(frame.nodes());
            Collections.shuffle(nodes, random);
            frame = new Frame(frame.name(), frame.idealisation(), frame.material(), nodes, frame.members(), frame.supports());
        }
        return new Case(seed, frame, randomLoads(frame, random, "F1"), randomLoads(frame, random, "F2"));
    }

    /**
     * Random loads at nodes that can carry them in every direction, judged from the geometry here
     * (not from the solver's list): a beam-column reaches the node or its members span space.
     * Moments only where a beam-column reaches and every support is fixed (on pinned supports a
     * straight leg could spin about its own axis). A load the model cannot carry is refused by
     * {@link LoadPath}, tested elsewhere.
     */
    private static LoadVector randomLoads(Frame frame, Random random, String name) {
        List<NodeForce> loads = new ArrayList<>();
        boolean fixed = frame.supports().stream().allMatch(s -> s.restraint() == Restraint.FIXED);
        List<Node> carrying = new ArrayList<>();
        List<Boolean> beamReached = new ArrayList<>();
        for (Node n : frame.nodes()) {
            double[] m = new double[9];
            boolean beam = false;
            for (var member : frame.members()) {
                if (member.i() != n.id() && member.j() != n.id()) {
                    continue;
                }
                beam |= frame.idealisation().hasRotations() && !member.axialOnly();
                Node other = frame.nodes().get(frame.nodeIndex().get(member.i() == n.id() ? member.j() : member.i()));
                double[] e = {other.x() - n.x(), other.y() - n.y(), other.z() - n.z()};
                double len = Math.sqrt(e[0] * e[0] + e[1] * e[1] + e[2] * e[2]);
                for (int r = 0; r < 3; r++) {
                    for (int c = 0; c < 3; c++) {
                        m[3 * r + c] += e[r] * e[c] / (len * len);
                    }
                }
            }
            double det = m[0] * (m[4] * m[8] - m[5] * m[7]) - m[1] * (m[3] * m[8] - m[5] * m[6])
                    + m[2] * (m[3] * m[7] - m[4] * m[6]);
            if (beam || det > 1e-6) {
                carrying.add(n);
                beamReached.add(beam);
            }
        }
        for (int k = 0; k < 6; k++) {
            int pick = random.nextInt(carrying.size());
            Node n = carrying.get(pick);
            boolean moments = fixed && beamReached.get(pick);
            loads.add(new NodeForce(n.id(), 1e4 * random.nextGaussian(), 1e4 * random.nextGaussian(),
                    1e4 * random.nextGaussian(), moments ? 1e3 * random.nextGaussian() : 0,
                    moments ? 1e3 * random.nextGaussian() : 0, moments ? 1e3 * random.nextGaussian() : 0));
        }
        return new LoadVector(name, loads);
    }

    private static double[] loadArray(Frame frame, LoadVector v) {
        double[] a = new double[6 * frame.nodes().size()];
        var index = frame.nodeIndex();
        for (NodeForce f : v.loads()) {
            for (int k = 0; k < 6; k++) {
                a[6 * index.get(f.node()) + k] += f.component(k);
            }
        }
        return a;
    }

    /**
     * The reference finds its own restraints from its own stiffness ({@link ReferenceRestraints}):
     * zero-stiffness directions at single nodes, then whole null modes (spinning legs). The
     * product restrains a spin at one node of the chain, the reference constrains the whole mode,
     * so only quantities independent of that choice are compared: every translation, the whole
     * displacement vector after removing its component along the null modes (the rotations about
     * a spinning leg's axis are arbitrary otherwise), every member end force, every support
     * reaction. A null mode costs no energy, so it moves no member end force and no reaction.
     */
    @ParameterizedTest
    @MethodSource("towers")
    void sparseSolutionEqualsIndependentDenseSolution(Case c) throws Exception {
        StructuralModel model = StructuralModel.of(c.frame());
        Solution s = Solver.factor(model).solve(c.first());
        DenseReference dense = new DenseReference(c.frame(), model.continuityNodes());
        ReferenceRestraints restraints = ReferenceRestraints.find(dense.system(), dense.held());
        double[] loads = loadArray(c.frame(), c.first());
        DenseReference.Solved ref = dense.solve(restraints.free(), restraints.modes(), loads);

        List<Node> nodes = c.frame().nodes();
        double[] actual = new double[6 * nodes.size()];
        for (int n = 0; n < nodes.size(); n++) {
            for (int k = 0; k < 6; k++) {
                actual[6 * n + k] = s.displacement(nodes.get(n).id()).component(k);
            }
        }
        double[] withoutModes = actual.clone();
        for (double[] phi : restraints.modes()) {
            double along = NaturalElement.dot(phi, actual);
            for (int q = 0; q < actual.length; q++) {
                withoutModes[q] -= along * phi[q];
            }
        }
        double maxTranslation = largest(ref.u(), 0);
        double maxRotation = largest(ref.u(), 3);
        for (int q = 0; q < actual.length; q++) {
            boolean translation = q % 6 < 3;
            double tolerance = RELATIVE * (translation ? maxTranslation : maxRotation);
            String where = "node " + nodes.get(q / 6).id() + " dof " + q % 6;
            if (translation) {
                assertEquals(ref.u()[q], actual[q], tolerance, where + " (independent dense solve)");
            }
            assertEquals(ref.u()[q], withoutModes[q], tolerance, where + " without the null modes (independent dense solve)");
        }
        double maxF = 0;
        for (double[][] f : ref.memberEnd().values()) {
            for (double[] end : f) {
                for (double v : end) {
                    maxF = Math.max(maxF, Math.abs(v));
                }
            }
        }
        for (MemberEndForces f : s.memberForces()) {
            double[][] expected = ref.memberEnd().get(f.member());
            for (int k = 0; k < 6; k++) {
                assertEquals(expected[0][k], f.atI().component(k), RELATIVE * maxF, "member " + f.member() + " i " + k);
                assertEquals(expected[1][k], f.atJ().component(k), RELATIVE * maxF, "member " + f.member() + " j " + k);
            }
        }
        // K·u − F of the reference: the support reactions at supported nodes and nothing anywhere
        // else (the loads are carriable: no restraint, the reference's or the product's, carries any)
        double loadScale = 0;
        for (double f : loads) {
            loadScale = Math.max(loadScale, Math.abs(f));
        }
        Map<Integer, NodeForce> reactions = new HashMap<>();
        s.reactions().forEach(r -> reactions.put(r.node(), r));
        for (Node n : nodes) {
            double[] expected = ref.residualAt(n.id());
            NodeForce reaction = reactions.get(n.id());
            for (int k = 0; k < 6; k++) {
                assertEquals(expected[k], reaction == null ? 0 : reaction.component(k), RELATIVE * loadScale,
                        "K·u − F of the reference vs the support reaction at node " + n.id() + " " + k);
            }
        }
        for (NodeForce a : s.autoRestraintForces()) {
            for (int k = 0; k < 6; k++) {
                assertEquals(0, a.component(k), RELATIVE * loadScale, "product auto-restraint force at node " + a.node());
            }
        }
        assertTrue(s.equilibriumError() < 1e-9, "equilibrium error " + s.equilibriumError());
    }

    /**
     * The product's auto-restraints at each node span exactly the reference's zero-stiffness
     * directions there (translations and rotations apart); its spin restraints (one node per
     * chain) are compared with the reference's null modes: as many, each mode turns the
     * restrained node about the restrained axis only, and together they pin every mode (the
     * matrix of restraint rows times modes is non-singular).
     */
    @ParameterizedTest
    @MethodSource("towers")
    void autoRestraintsSpanTheReferenceZeroStiffnessDirections(Case c) {
        StructuralModel model = StructuralModel.of(c.frame());
        DenseReference dense = new DenseReference(c.frame(), model.continuityNodes());
        ReferenceRestraints reference = ReferenceRestraints.find(dense.system(), dense.held());
        List<AutoRestraint> spins = new ArrayList<>();
        for (Node n : c.frame().nodes()) {
            List<double[]> product = new ArrayList<>();
            for (AutoRestraint a : model.autoRestraints()) {
                if (a.node() != n.id()) {
                    continue;
                }
                if (a.reason().equals(StabilityInspector.SPIN_REASON)) {
                    spins.add(a);
                } else {
                    product.add(sixVector(a));
                }
            }
            List<double[]> expected = reference.nullDirections().get(model.nodeIndex(n.id()));
            for (int part = 0; part < 2; part++) {
                String what = "node " + n.id() + (part == 0 ? " translations" : " rotations");
                assertSameSpan(within(expected, part), within(product, part), what);
            }
        }
        assertEquals(reference.modes().size(), spins.size(),
                "null modes of the reference vs spin restraints; next scaled eigenvalue " + reference.nextEigenvalue());
        DMatrixRMaj pinned = new DMatrixRMaj(spins.size(), spins.size());
        for (int r = 0; r < spins.size(); r++) {
            AutoRestraint spin = spins.get(r);
            int b = 6 * model.nodeIndex(spin.node());
            double[] axis = {spin.direction().x(), spin.direction().y(), spin.direction().z()};
            for (int m = 0; m < spins.size(); m++) {
                double[] phi = reference.modes().get(m);
                double[] turn = {phi[b + 3], phi[b + 4], phi[b + 5]};
                double about = NaturalElement.dot(turn, axis);
                pinned.set(r, m, about);
                double[] off = {turn[0] - about * axis[0], turn[1] - about * axis[1], turn[2] - about * axis[2],
                        phi[b], phi[b + 1], phi[b + 2]};
                assertEquals(0, Math.sqrt(NaturalElement.dot(off, off)), 1e-9,
                        "mode " + m + " at spin-restrained node " + spin.node() + ": motion other than about the axis");
            }
        }
        if (!spins.isEmpty()) {
            DMatrixRMaj gram = new DMatrixRMaj(spins.size(), spins.size());
            CommonOps_DDRM.multTransA(pinned, pinned, gram);
            double smallest = Math.sqrt(Math.max(0, new SymmetricEigen(gram).value(0)));
            assertTrue(smallest > 1e-3, "the spin restraints leave a null mode free: smallest singular value " + smallest);
        }
    }
    /** Largest |u| over the translations (first = 0) or the rotations (first = 3). */
    private static double largest(double[] u, int first) {
        double max = 0;
        for (int q = first; q < u.length; q += 6) {
            for (int k = 0; k < 3; k++) {
                max = Math.max(max, Math.abs(u[q + k]));
            }
        }
        return max;
    }

    /** An auto-restraint's direction as a 6-vector at its node. */
    private static double[] sixVector(AutoRestraint a) {
        double[] v = new double[6];
        int offset = a.isRotation() ? 3 : 0;
        v[offset] = a.direction().x();
        v[offset + 1] = a.direction().y();
        v[offset + 2] = a.direction().z();
        return v;
    }

    /** The 3-vectors of the translation (part 0) or rotation (part 1) components of those 6-vectors that have any. */
    private static List<double[]> within(List<double[]> sixVectors, int part) {
        List<double[]> out = new ArrayList<>();
        for (double[] v : sixVectors) {
            double[] three = Arrays.copyOfRange(v, 3 * part, 3 * part + 3);
            if (NaturalElement.dot(three, three) > 0.5) {
                out.add(three);
            }
        }
        return out;
    }

    /** Equal dimension and equal orthogonal projector onto the span of each list. */
    private static void assertSameSpan(List<double[]> expected, List<double[]> actual, String what) {
        assertEquals(expected.size(), actual.size(), what + ": number of zero-stiffness directions");
        double[] pe = projector(expected);
        double[] pa = projector(actual);
        for (int q = 0; q < 9; q++) {
            assertEquals(pe[q], pa[q], 1e-6, what + ": projector entry " + q);
        }
    }

    /** Σ v vᵀ over an orthonormal basis of span(vectors), 3×3 row-major. */
    private static double[] projector(List<double[]> vectors) {
        List<double[]> basis = new ArrayList<>();
        for (double[] v : vectors) {
            basis.add(ReferenceRestraints.orthonormalised(v.clone(), basis));
        }
        double[] p = new double[9];
        for (double[] v : basis) {
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    p[3 * r + c] += v[r] * v[c];
                }
            }
        }
        return p;
    }

    @ParameterizedTest
    @MethodSource("towers")
    void superpositionHolds(Case c) throws Exception {
        FactoredSystem system = Solver.factor(StructuralModel.of(c.frame()));
        double a = 1.7;
        double b = -0.6;
        List<Solution> s = system.solveAll(List.of(c.first(), c.second(), c.first().combine(a, c.second(), b, "a·F1 + b·F2")));
        double maxU = 0;
        for (NodeDisplacement d : s.get(2).displacements()) {
            for (int k = 0; k < 6; k++) {
                maxU = Math.max(maxU, Math.abs(d.component(k)));
            }
        }
        for (Node n : c.frame().nodes()) {
            for (int k = 0; k < 6; k++) {
                double expected = a * s.get(0).displacement(n.id()).component(k) + b * s.get(1).displacement(n.id()).component(k);
                assertEquals(expected, s.get(2).displacement(n.id()).component(k), RELATIVE * maxU, "node " + n.id());
            }
        }
        for (int r = 0; r < s.get(2).reactions().size(); r++) {
            for (int k = 0; k < 6; k++) {
                double expected = a * s.get(0).reactions().get(r).component(k) + b * s.get(1).reactions().get(r).component(k);
                assertEquals(expected, s.get(2).reactions().get(r).component(k), RELATIVE * 1e5, "reaction " + r);
            }
        }
        for (Solution each : s) {
            assertTrue(each.equilibriumError() < 1e-9, each.loads().name() + " equilibrium " + each.equilibriumError());
        }
    }

    /** Equal vertical loads at the four top corners of a square X-braced tower (4-fold symmetric). */
    @Test
    void squareTowerUnderVerticalLoadGivesFourEqualReactions() throws Exception {
        for (Idealisation idealisation : Idealisation.values()) {
            TowerFixture fixture = new TowerFixture(idealisation, 4, 6, 2.5, 16);
            Frame frame = fixture.build();
            double p = -200e3;
            List<NodeForce> loads = new ArrayList<>();
            for (int id : fixture.topCorners()) {
                loads.add(NodeForce.force(id, 0, 0, p / 4));
            }
            Solution s = Solver.factor(StructuralModel.of(frame)).solve(new LoadVector("vertical", loads));
            for (NodeForce r : s.reactions()) {
                // statics and symmetry: each support takes a quarter of the vertical load
                assertEquals(-p / 4, r.fz(), 1e-9 * Math.abs(p), idealisation + " Rz at " + r.node());
                assertEquals(Math.hypot(s.reactions().get(0).fx(), s.reactions().get(0).fy()),
                        Math.hypot(r.fx(), r.fy()), 1e-9 * Math.abs(p), idealisation + " |H| at " + r.node());
            }
            assertTrue(s.equilibriumError() < 1e-9);
        }
    }

    /** Turning a horizontal load by 90° about z turns the reactions with it: corner c → c + 1. */
    @Test
    void squareTowerReactionsRotateWithTheLoad() throws Exception {
        for (Idealisation idealisation : Idealisation.values()) {
            TowerFixture fixture = new TowerFixture(idealisation, 5, 7, 3, 20).pattern(TowerFixture.Pattern.K);
            Frame frame = fixture.build();
            double h = 30e3;
            List<NodeForce> alongX = new ArrayList<>();
            List<NodeForce> alongY = new ArrayList<>();
            for (int id : fixture.topCorners()) {
                alongX.add(NodeForce.force(id, h / 4, 0, -h / 10));
                alongY.add(NodeForce.force(id, 0, h / 4, -h / 10));
            }
            FactoredSystem system = Solver.factor(StructuralModel.of(frame));
            List<Solution> s = system.solveAll(List.of(new LoadVector("x", alongX), new LoadVector("y", alongY)));
            int[] base = fixture.baseCorners();
            for (int c = 0; c < 4; c++) {
                NodeForce rx = s.get(0).reaction(base[c]);
                NodeForce ry = s.get(1).reaction(base[(c + 1) % 4]);
                // rotation by +90° about z: (x, y, z) → (−y, x, z)
                assertEquals(-rx.fy(), ry.fx(), 1e-9 * h, idealisation + " corner " + c + " x");
                assertEquals(rx.fx(), ry.fy(), 1e-9 * h, idealisation + " corner " + c + " y");
                assertEquals(rx.fz(), ry.fz(), 1e-9 * h, idealisation + " corner " + c + " z");
            }
            // the hand method's sign: the windward legs lift (uplift), the leeward legs press down
            assertTrue(s.get(0).reaction(base[0]).fz() < 0 && s.get(0).reaction(base[1]).fz() > 0);
        }
    }

    /**
     * A tall, flexible tower of realistic proportions (150 m, 12 m base, 75 panels; |K|·|u| far
     * above the loads) must still balance to 1e-9.
     */
    @Test
    void aTallFlexibleTowerStaysInEquilibrium() throws Exception {
        TowerFixture fixture = new TowerFixture(Idealisation.FRAME, 75, 12, 2.5, 150).support(Restraint.PINNED);
        Frame frame = fixture.build();
        List<NodeForce> loads = new ArrayList<>();
        for (int id : fixture.topCorners()) {
            loads.add(NodeForce.force(id, 20e3, 5e3, -40e3));
        }
        Solution s = Solver.factor(StructuralModel.of(frame)).solve(new LoadVector("top", loads));
        assertTrue(s.displacement(fixture.topCorners()[0]).ux() > 1, "a flexible tower: the top moves metres");
        assertTrue(s.equilibriumError() < 1e-9, "equilibrium " + s.equilibriumError());
        double rz = 0;
        for (NodeForce r : s.reactions()) {
            rz += r.fz();
        }
        assertEquals(160e3, rz, 1e-9 * 160e3, "ΣRz = −ΣFz (statics)");
    }
}
