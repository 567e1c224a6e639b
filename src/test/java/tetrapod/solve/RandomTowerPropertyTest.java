package tetrapod.solve;

import tetrapod.model.NodeForce;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.stream.IntStream;
import java.util.stream.Stream;
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

    @ParameterizedTest
    @MethodSource("towers")
    void sparseSolutionEqualsIndependentDenseSolution(Case c) throws Exception {
        StructuralModel model = StructuralModel.of(c.frame());
        Solution s = Solver.factor(model).solve(c.first());
        DenseReference ref = new DenseReference(c.frame(), DenseReference.constraintsOf(model.autoRestraints()),
                model.continuityNodes(),
                loadArray(c.frame(), c.first()));

        double maxU = 0;
        for (double v : ref.u) {
            maxU = Math.max(maxU, Math.abs(v));
        }
        for (Node n : c.frame().nodes()) {
            double[] expected = ref.displacement(n.id());
            NodeDisplacement actual = s.displacement(n.id());
            for (int k = 0; k < 6; k++) {
                assertEquals(expected[k], actual.component(k), RELATIVE * maxU, "node " + n.id() + " dof " + k);
            }
        }
        double maxF = 0;
        for (double[][] f : ref.memberEnd.values()) {
            for (double[] end : f) {
                for (double v : end) {
                    maxF = Math.max(maxF, Math.abs(v));
                }
            }
        }
        for (MemberEndForces f : s.memberForces()) {
            double[][] expected = ref.memberEnd.get(f.member());
            for (int k = 0; k < 6; k++) {
                assertEquals(expected[0][k], f.atI().component(k), RELATIVE * maxF, "member " + f.member() + " i " + k);
                assertEquals(expected[1][k], f.atJ().component(k), RELATIVE * maxF, "member " + f.member() + " j " + k);
            }
        }
        // reaction + auto-restraint force at a node = (K·u − F) there
        double[][] restraintForce = new double[c.frame().nodes().size()][6];
        for (NodeForce r : s.reactions()) {
            add(restraintForce[model.nodeIndex(r.node())], r);
        }
        for (NodeForce a : s.autoRestraintForces()) {
            add(restraintForce[model.nodeIndex(a.node())], a);
        }
        for (Node n : c.frame().nodes()) {
            double[] expected = ref.residualAt(n.id());
            for (int k = 0; k < 6; k++) {
                if (c.frame().idealisation() == Idealisation.TRUSS && k >= 3) {
                    continue; // the reference holds truss rotations with multipliers of its own
                }
                assertEquals(expected[k], restraintForce[model.nodeIndex(n.id())][k], RELATIVE * 1e5,
                        "restraint force at node " + n.id() + " " + k);
            }
        }
        assertTrue(s.equilibriumError() < 1e-9, "equilibrium error " + s.equilibriumError());
    }

    private static void add(double[] into, NodeForce f) {
        for (int k = 0; k < 6; k++) {
            into[k] += f.component(k);
        }
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
