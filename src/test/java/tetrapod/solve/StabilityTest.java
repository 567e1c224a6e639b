package tetrapod.solve;

import tetrapod.model.NodeForce;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.common.UnstableStructureException;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Restraint;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/**
 * The lattice model's own instabilities are restrained and reported; genuine mechanisms are not,
 * and become an {@link UnstableStructureException} naming the free node(s).
 */
class StabilityTest {

    private static Vec3 position(Frame frame, int id) {
        return frame.nodes().get(frame.nodeIndex().get(id)).position();
    }

    /** Unit normal of face 0 (corners 0, 1 at y < 0) of a tapered tower, from its three corner points. */
    private static Vec3 faceNormal(Frame frame, TowerFixture t) {
        Vec3 a = position(frame, t.baseCorners()[0]);
        Vec3 b = position(frame, t.baseCorners()[1]);
        Vec3 c = position(frame, TowerFixture.cornerId(1, 0, t));
        return b.minus(a).cross(c.minus(a)).unit();
    }

    /**
     * A "V": two pin-ended bars from two pinned supports meet at node 3 in the plane through
     * (0,0,0), (4,0,0), (2,1,3), whose normal (4,0,0) × (2,1,3) = (0, −12, 4) is no global axis.
     */
    private static Frame tiltedV(Idealisation idealisation) {
        var bar = TestFrames.section("bar", 2.0e-3, 1e-6, 1e-6, 1e-8);
        return TestFrames.frame("tilted V", idealisation, TestFrames.STEEL,
                List.of(new Node(1, 0, 0, 0), new Node(2, 4, 0, 0), new Node(3, 2, 1, 3)),
                List.of(TestFrames.bar(1, 1, 3, bar), TestFrames.bar(2, 2, 3, bar)),
                List.of(new Support(1, Restraint.PINNED), new Support(2, Restraint.PINNED)));
    }

    private static final Vec3 TILTED_NORMAL = new Vec3(0, -12, 4).unit();

    @Test
    void whereBarsMeetInATiltedPlaneTheNodeIsRestrainedNormalToIt() throws Exception {
        for (Idealisation idealisation : Idealisation.values()) {
            StructuralModel model = StructuralModel.of(tiltedV(idealisation));
            List<AutoRestraint> translations = model.autoRestraints().stream().filter(a -> !a.isRotation()).toList();
            assertEquals(1, translations.size(), idealisation + ": one translation restrained");
            AutoRestraint r = translations.get(0);
            assertEquals(3, r.node());
            assertEquals(AutoRestraint.SKEW, r.dof(), "the normal is no global axis");
            assertEquals(1, Math.abs(r.direction().dot(TILTED_NORMAL)), 1e-12, "restrained along the plane's normal");
            assertEquals(StabilityInspector.PLANE_REASON, r.reason());
            long rotations = model.autoRestraints().stream().filter(a -> a.node() == 3 && a.isRotation()).count();
            assertEquals(idealisation.hasRotations() ? 3 : 0, rotations, "only pin-ended bars meet at node 3");
        }
    }

    @Test
    void withSixDofsTheRedundantMidpointIsHeldByTheContinuousHorizontal() throws Exception {
        // legs beam-columns, bracing pin-ended (continuous legs): the bracing continuity stays
        TowerFixture t = new TowerFixture(Idealisation.FRAME, 3, 6, 3, 12).redundantInFirstPanel();
        Frame frame = t.build();
        StructuralModel model = StructuralModel.of(frame);
        Vec3 mid = position(frame, t.baseCorners()[0]).lerp(position(frame, t.baseCorners()[1]), 0.5);
        int redundantNode = frame.nodes().stream().filter(n -> n.position().distanceTo(mid) < 1e-12).findFirst().orElseThrow().id();
        assertTrue(model.autoRestraints().stream().noneMatch(a -> a.node() == redundantNode && !a.isRotation()));
        assertEquals(3, model.autoRestraints().stream().filter(a -> a.node() == redundantNode && a.isRotation()).count(),
                "its rotations, which no member reaches, are restrained");
        Solution s = Solver.factor(model).solve(new LoadVector("weight", List.of(NodeForce.force(redundantNode, 0, 0, -1e3))));
        assertEquals(0, s.largestAutoRestraintForce(), 1e-9);
        assertEquals(1e3, s.reactions().stream().mapToDouble(NodeForce::fz).sum(), 1e-6, "statics: ΣRz = −ΣFz");
    }

    @Test
    void inATrussTheSameNodeIsHeldByTheContinuousMemberInstead() throws Exception {
        TowerFixture t = new TowerFixture(Idealisation.TRUSS, 3, 6, 3, 12).redundantInFirstPanel();
        Frame frame = t.build();
        StructuralModel model = StructuralModel.of(frame);
        Vec3 mid = position(frame, t.baseCorners()[0]).lerp(position(frame, t.baseCorners()[1]), 0.5);
        int redundantNode = frame.nodes().stream().filter(n -> n.position().distanceTo(mid) < 1e-12).findFirst().orElseThrow().id();
        assertTrue(model.autoRestraints().stream().noneMatch(a -> a.node() == redundantNode));
        assertTrue(model.continuityNodes().stream().anyMatch(c -> c.node() == redundantNode));
        // its own weight now reaches the supports through the horizontal, not the ground of the model
        Solution s = Solver.factor(model).solve(new LoadVector("weight", List.of(NodeForce.force(redundantNode, 0, 0, -1e3))));
        assertEquals(0, s.largestAutoRestraintForce(), 1e-9);
        assertEquals(1e3, s.reactions().stream().mapToDouble(NodeForce::fz).sum(), 1e-6);
    }

    @Test
    void aLoadAlongAnAutoRestrainedDirectionIsRefusedNotLost() throws Exception {
        StructuralModel model = StructuralModel.of(tiltedV(Idealisation.TRUSS));
        FactoredSystem system = Solver.factor(model);
        double p = 1234;
        Vec3 f = TILTED_NORMAL.times(p);
        Solution s = system.solve(new LoadVector("normal", List.of(NodeForce.force(3, f.x(), f.y(), f.z()))));
        assertEquals(p, s.largestAutoRestraintForce(), 1e-9 * p, "the lattice cannot carry it");
        assertEquals(p, Math.abs(s.autoRestraintForce(0)), 1e-9 * p);
        // statics on the loads and the supports alone: the supports carry nothing, so the residual is
        // |F| / Σ|F|, and |F| / Σ|F| ≥ 1/√3 for any single force
        assertTrue(s.equilibriumError() > 0.5, "automatic restraints never count as supports: " + s.equilibriumError());
        UnstableStructureException e = assertThrows(UnstableStructureException.class, () -> s.requireLoadCarried("normal"));
        assertTrue(e.getMessage().contains("node 3") && e.getMessage().contains("'normal'")
                && e.getMessage().contains("1.234 kN") && e.getMessage().contains("continuous-legs"), e.getMessage());
        assertEquals(List.of(new UnstableStructureException.FreeDof(3, AutoRestraint.SKEW)), e.freeDofs());
    }

    @Test
    void theLimitIsOneMillionthOfTheCaseLoad() throws Exception {
        StructuralModel model = StructuralModel.of(tiltedV(Idealisation.TRUSS));
        FactoredSystem system = Solver.factor(model);
        Vec3 inPlane = new Vec3(0, 1, 3).unit(); // (0, 1, 3) · (0, −12, 4) = 0
        // Σ|F| ≈ 1.26e4 N (in-plane part 1e4 N along (0, 1, 3)/√10), so the limit is ≈ 0.0126 N:
        // a normal part of 0.005 N is kept, one of 0.02 N is refused
        double[] shares = {0, 0.5e-6, 2e-6};
        boolean[] refused = {false, false, true};
        for (int k = 0; k < shares.length; k++) {
            double share = shares[k];
            // Σ|F| of the load below, with the normal part `share` of the in-plane part's size
            Vec3 f = inPlane.times(1e4).plus(TILTED_NORMAL.times(1e4 * share));
            Solution s = system.solve(new LoadVector("mostly in plane", List.of(NodeForce.force(3, f.x(), f.y(), f.z()))));
            double total = Math.abs(f.x()) + Math.abs(f.y()) + Math.abs(f.z());
            assertEquals(total, s.totalLoad(), 1e-12 * total, "Σ|F| over nodes and directions");
            assertEquals(refused[k], 1e4 * share > LoadPath.LOST_LOAD_RATIO * total, "the case is on the intended side");
            if (refused[k]) {
                assertThrows(UnstableStructureException.class, () -> s.requireLoadCarried("c"), "share " + share);
            } else {
                s.requireLoadCarried("c");
                assertTrue(s.equilibriumError() < 1e-6, "share " + share + ": " + s.equilibriumError());
            }
        }
    }

    @Test
    void nodeSplittingAStraightLegGetsTwoRestraintsAcrossTheLeg() throws Exception {
        TowerFixture t = new TowerFixture(Idealisation.TRUSS, 2, 5, 3, 8).splitFirstLeg();
        Frame frame = t.build();
        StructuralModel model = StructuralModel.of(frame);
        Vec3 legAxis = position(frame, TowerFixture.cornerId(1, 0, t)).minus(position(frame, t.baseCorners()[0])).unit();
        Vec3 mid = position(frame, t.baseCorners()[0]).lerp(position(frame, TowerFixture.cornerId(1, 0, t)), 0.5);
        int split = frame.nodes().stream().filter(n -> n.position().distanceTo(mid) < 1e-12).findFirst().orElseThrow().id();
        List<AutoRestraint> atNode = model.autoRestraints().stream().filter(a -> a.node() == split).toList();
        assertEquals(2, atNode.size());
        assertEquals(0, atNode.get(0).direction().dot(legAxis), 1e-12);
        assertEquals(0, atNode.get(1).direction().dot(legAxis), 1e-12);
        assertEquals(0, atNode.get(0).direction().dot(atNode.get(1).direction()), 1e-12);
        assertEquals(StabilityInspector.LINE_REASON, atNode.get(0).reason());
        Solver.factor(model); // stable
    }

    @Test
    void frameNodesWithOnlyPinEndedMembersLoseTheirRotations() throws Exception {
        TowerFixture t = new TowerFixture(Idealisation.FRAME, 2, 5, 3, 8).support(Restraint.FIXED);
        StructuralModel model = StructuralModel.of(t.build());
        // X bracing: each of the 8 crossing nodes has rx, ry, rz restrained (plus its face normal)
        long pinned = model.autoRestraints().stream().filter(a -> a.reason().equals(StabilityInspector.PIN_REASON)).count();
        assertEquals(8 * 3, pinned);
        assertEquals(0, model.autoRestraints().stream().filter(a -> a.reason().equals(StabilityInspector.SPIN_REASON)).count(),
                "fixed bases stop the legs spinning");
        Solver.factor(model);
    }

    @Test
    void legsOnPinnedBasesWouldSpinAboutTheirAxesAndAreRestrainedOncePerLeg() throws Exception {
        TowerFixture t = new TowerFixture(Idealisation.FRAME, 3, 6, 2, 12).support(Restraint.PINNED);
        Frame frame = t.build();
        StructuralModel model = StructuralModel.of(frame);
        List<AutoRestraint> spin = model.autoRestraints().stream().filter(a -> a.reason().equals(StabilityInspector.SPIN_REASON)).toList();
        assertEquals(4, spin.size(), "one per straight leg");
        for (int c = 0; c < 4; c++) {
            int base = t.baseCorners()[c];
            Vec3 axis = position(frame, t.topCorners()[c]).minus(position(frame, base)).unit();
            AutoRestraint r = spin.stream().filter(a -> a.node() == base).findFirst().orElseThrow();
            assertEquals(AutoRestraint.SKEW_ROTATION, r.dof(), "a tapered leg's axis is skew");
            assertEquals(1, Math.abs(r.direction().dot(axis)), 1e-12);
        }
        Solver.factor(model);
    }

    @Test
    void aTowerOnOnePinnedSupportIsUnstableBecauseNoSupportRestrainsIt() {
        Frame frame = new TowerFixture(Idealisation.TRUSS, 3, 6, 3, 12).supportedCorners(0).build();
        UnstableStructureException e = assertThrows(UnstableStructureException.class,
                () -> Solver.factor(StructuralModel.of(frame)));
        assertTrue(e.getMessage().contains(MechanismDiagnosis.NO_SUPPORT), e.getMessage());
        assertTrue(e.getMessage().matches(".*node \\d+ \\((ux|uy|uz).*"), e.getMessage());
        assertFalse(e.freeDofs().isEmpty());
    }

    @Test
    void aTowerWithoutSupportsIsUnstable() {
        Frame frame = new TowerFixture(Idealisation.FRAME, 2, 6, 3, 8).supportedCorners().build();
        UnstableStructureException e = assertThrows(UnstableStructureException.class,
                () -> Solver.factor(StructuralModel.of(frame)));
        assertTrue(e.getMessage().contains(MechanismDiagnosis.NO_SUPPORT), e.getMessage());
    }

    @Test
    void aKBracedPanelWithoutItsHorizontalIsAMechanismNamingANodeAboveIt() {
        TowerFixture t = new TowerFixture(Idealisation.TRUSS, 4, 6, 3, 16).pattern(TowerFixture.Pattern.K)
                .withoutHorizontalsAt(2);
        Frame frame = t.build();
        UnstableStructureException e = assertThrows(UnstableStructureException.class,
                () -> Solver.factor(StructuralModel.of(frame)));
        assertTrue(e.getMessage().contains(MechanismDiagnosis.MECHANISM), e.getMessage());
        // the free nodes are at or above level 2: the part above the unbraced panel sways
        double level2 = 16.0 * 2 / 4;
        assertFalse(e.freeDofs().isEmpty());
        for (var free : e.freeDofs()) {
            assertTrue(position(frame, free.node()).z() >= level2 - 1e-9, "node " + free.node() + " in " + e.getMessage());
            assertTrue(free.dof().equals("ux") || free.dof().equals("uy") || free.dof().equals("uz"), free.dof());
        }
    }

    @Test
    void theSameKPanelInAFrameWithContinuousLegsIsStable() throws Exception {
        Frame frame = new TowerFixture(Idealisation.FRAME, 4, 6, 3, 16).pattern(TowerFixture.Pattern.K)
                .withoutHorizontalsAt(2).support(Restraint.FIXED).build();
        Solver.factor(StructuralModel.of(frame)); // the legs' bending carries the panel shear
    }

    @Test
    void anUnconnectedNodeIsNamed() {
        Frame tower = new TowerFixture(Idealisation.TRUSS, 2, 6, 3, 8).build();
        List<Node> nodes = new ArrayList<>(tower.nodes());
        nodes.add(new Node(999, 20, 20, 20));
        Frame frame = new Frame("with a stray node", tower.idealisation(), tower.material(), nodes, tower.members(), tower.supports());
        UnstableStructureException e = assertThrows(UnstableStructureException.class,
                () -> Solver.factor(StructuralModel.of(frame)));
        assertTrue(e.getMessage().contains("node 999"), e.getMessage());
        assertTrue(e.getMessage().contains("not connected to any member"), e.getMessage());
    }

    @Test
    void aNearMechanismThatPassesThePivotTestIsCaughtByTheDisplacementGuard() throws Exception {
        // tripod (see TripodTest) whose vertical bar is 1e-9 as stiff as the others: stable, but a
        // huge load moves the apex absurdly far (more than 1000 × the structure size)
        var stiff = TestFrames.section("bar", 2.0e-3, 1e-6, 1e-6, 1e-8);
        var soft = TestFrames.section("soft", 2.0e-12, 1e-6, 1e-6, 1e-8);
        List<Member> members = List.of(TestFrames.bar(1, 1, 4, stiff), TestFrames.bar(2, 2, 4, stiff), TestFrames.bar(3, 3, 4, soft));
        Frame frame = TestFrames.frame("soft tripod", Idealisation.TRUSS, TestFrames.STEEL,
                List.of(new Node(1, 3, 0, 0), new Node(2, 0, 3, 0), new Node(3, 0, 0, 0), new Node(4, 0, 0, 4)), members,
                List.of(new Support(1, Restraint.PINNED), new Support(2, Restraint.PINNED), new Support(3, Restraint.PINNED)));
        FactoredSystem system = Solver.factor(StructuralModel.of(frame));
        UnstableStructureException e = assertThrows(UnstableStructureException.class,
                () -> system.solve(new LoadVector("huge", List.of(NodeForce.force(4, 0, 0, -1e9)))));
        assertTrue(e.getMessage().contains("node 4"), e.getMessage());
    }
}
