package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Role;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

class SceneBuilderTest {

    private static final double TOL = 1e-5;  // instances are floats; coordinates are tens of metres

    private final Frame frame = ViewFixtures.ridge();

    @Test
    void oneMemberInstancePerMemberBetweenItsNodes() {
        Scene scene = SceneBuilder.build(ViewData.geometryOnly(frame, OptionalDouble.empty()),
                SceneOptions.defaults(ViewData.geometryOnly(frame, OptionalDouble.empty())));
        assertEquals(frame.members().size(), scene.members().count());
        Map<Integer, Integer> index = frame.nodeIndex();
        for (int k = 0; k < frame.members().size(); k++) {
            Member m = frame.members().get(k);
            assertClose(frame.nodes().get(index.get(m.i())).position(), scene.members().start(k));
            assertClose(frame.nodes().get(index.get(m.j())).position(), scene.members().end(k));
            assertEquals(new RoleScale().colour(m.role()), scene.members().colour(k));
            assertTrue(scene.members().caps(k));
        }
    }

    @Test
    void legsAreDrawnWiderThanBracingAndOverstressedMembersWiderStill() {
        int leg = ViewFixtures.withRole(frame, Role.LEG).get(0);
        int diagonal = ViewFixtures.withRole(frame, Role.DIAGONAL).get(0);
        ViewData data = ViewFixtures.utilisation(frame, 0.5, diagonal, 1.2);
        Scene scene = SceneBuilder.build(data, SceneOptions.defaults(data));
        assertEquals(UtilisationScale.OVERSTRESS, scene.members().colour(diagonal));
        assertEquals(SceneBuilder.width(Role.DIAGONAL) * SceneBuilder.OVERSTRESS_WIDTH_FACTOR,
                scene.members().startWidth(diagonal), 1e-6);
        assertTrue(scene.members().startWidth(leg) > SceneBuilder.width(Role.DIAGONAL));
        assertEquals(new UtilisationScale().colour(0.5), scene.members().colour(leg));
    }

    @Test
    void reactionArrowsPointAlongTheReactionEndAtTheNodeAndScaleWithIt() {
        List<Support> supports = frame.supports();
        // four legs: two in compression (Fz up), two in uplift, horizontal shears of different sizes
        List<NodeVector> reactions = List.of(
                new NodeVector(supports.get(0).node(), new Vec3(-10e3, 0, 400e3)),
                new NodeVector(supports.get(1).node(), new Vec3(0, -20e3, 200e3)),
                new NodeVector(supports.get(2).node(), new Vec3(-30e3, -40e3, -100e3)),
                new NodeVector(supports.get(3).node(), new Vec3(0, 0, -50e3)));
        ViewCase c = new ViewCase("wind", OptionalDouble.of(0), Map.of(), List.of(), reactions, List.of());
        ViewData data = new ViewData(frame, List.of(c), Colouring.ROLE);
        Scene scene = SceneBuilder.build(data, SceneOptions.defaults(data));

        Bounds b = Bounds.of(frame.nodes().stream().map(Node::position).toList());
        double size = Math.max(b.max().z() - b.min().z(),
                Math.hypot(b.max().x() - b.min().x(), b.max().y() - b.min().y()));
        double metresPerNewton = SceneBuilder.REACTION_LENGTH * size / 400e3;  // the largest is 400 kN
        Map<Integer, Integer> index = frame.nodeIndex();
        int verticals = 0;
        int horizontals = 0;
        for (Arrow a : scene.reactionArrows()) {
            NodeVector r = reactions.stream().filter(x -> x.node() == a.node()).findFirst().orElseThrow();
            Vec3 component = a.component().equals("Fz") ? new Vec3(0, 0, r.vector().z())
                    : new Vec3(r.vector().x(), r.vector().y(), 0);
            assertClose(frame.nodes().get(index.get(a.node())).position(), a.tip());
            Vec3 drawn = a.tip().minus(a.tail());
            assertClose(component.unit(), drawn.unit());
            assertEquals(component.norm() * metresPerNewton, drawn.norm(), 1e-9 * size);
            if (a.component().equals("Fz")) {
                verticals++;
            } else {
                horizontals++;
            }
        }
        assertEquals(4, verticals);
        assertEquals(3, horizontals, "the fourth support has no horizontal reaction");
        Arrow big = arrow(scene, supports.get(0).node(), "Fz");
        Arrow half = arrow(scene, supports.get(1).node(), "Fz");
        assertEquals(2.0, big.length() / half.length(), 1e-9);
        assertEquals("Fz = -100.0 kN uplift", ArrowGlyphs.label(arrow(scene, supports.get(2).node(), "Fz")));
        assertEquals("Fh = 50.0 kN", ArrowGlyphs.label(arrow(scene, supports.get(2).node(), "Fh")));
        assertTrue(scene.labels().stream().anyMatch(l -> l.text().equals("Fz = 400.0 kN")));
    }

    @Test
    void windArrowBlowsTowardsTheAzimuth() {
        for (double az : new double[] {0, 90, 225}) {
            ViewData data = ViewData.geometryOnly(frame, OptionalDouble.of(az));
            Scene scene = SceneBuilder.build(data, SceneOptions.defaults(data).membersOnly().withWind(true));
            // the wind arrow is the shaft and head in the decorations; the head's tip is its last point
            SegmentInstances d = scene.decorations();
            int head = d.count() - 1;
            assertEquals(0f, d.endWidth(head));
            Vec3 direction = d.end(head).minus(d.start(head - 1)).unit();
            assertClose(new Vec3(Math.cos(Math.toRadians(az)), Math.sin(Math.toRadians(az)), 0), direction);
            assertTrue(scene.labels().stream().anyMatch(l -> l.text().equals(String.format("wind %.0f°", az))));
        }
    }

    @Test
    void deformedShapeMovesNodesByTheScaledDisplacement() {
        List<NodeVector> displacements = new ArrayList<>();
        for (Node n : frame.nodes()) {
            displacements.add(new NodeVector(n.id(), new Vec3(0.001 * n.z(), 0, 0)));
        }
        ViewCase c = new ViewCase("sway", OptionalDouble.empty(), Map.of(), displacements, List.of(), List.of());
        ViewData data = new ViewData(frame, List.of(c), Colouring.ROLE);
        SceneOptions options = SceneOptions.defaults(data).withDeformed(true);
        Scene scene = SceneBuilder.build(data, new SceneOptions(0, Colouring.ROLE, true, 20, false, false, false,
                false, false, false));
        Map<Integer, Integer> index = frame.nodeIndex();
        for (int k = 0; k < frame.members().size(); k++) {
            Node i = frame.nodes().get(index.get(frame.members().get(k).i()));
            assertClose(i.position().plus(new Vec3(20 * 0.001 * i.z(), 0, 0)), scene.members().start(k));
        }
        // automatic: the largest displacement (0.001 × 30 m = 30 mm) drawn as about 5 % of the 30 m size,
        // rounded down to 1, 2 or 5 × 10^k: 0.05 × 30 / 0.03 = 50
        Scene auto = SceneBuilder.build(data, options);
        assertTrue(auto.labels().stream().anyMatch(l -> l.text().contains("deformed shape ×50")),
                auto.labels().toString());
        assertEquals(frame.members().size(), auto.members().count());
        assertTrue(auto.decorations().count() >= frame.members().size(), "the undeformed shape is drawn as a ghost");
    }

    @Test
    void roundingOfScales() {
        assertEquals(50, SceneBuilder.roundDown(73), 1e-12);
        assertEquals(0.2, SceneBuilder.roundDown(0.31), 1e-12);
        assertEquals(1, SceneBuilder.roundDown(1), 1e-12);
        assertEquals(2, GroundDecorations.roundStep(1.3), 1e-12);
        assertEquals(10, GroundDecorations.roundStep(5.5), 1e-12);
    }

    @Test
    void aColouringTheCaseDoesNotOfferIsRefused() {
        ViewData data = ViewData.geometryOnly(frame, OptionalDouble.empty());
        assertThrows(IllegalArgumentException.class,
                () -> SceneBuilder.build(data, SceneOptions.defaults(data).withColouring(Colouring.UTILISATION)));
        assertFalse(data.colourings(0).contains(Colouring.AXIAL));
    }

    private static Arrow arrow(Scene scene, int node, String component) {
        return scene.reactionArrows().stream().filter(a -> a.node() == node && a.component().equals(component))
                .findFirst().orElseThrow();
    }

    static void assertClose(Vec3 expected, Vec3 actual) {
        assertEquals(expected.x(), actual.x(), TOL, () -> expected + " vs " + actual);
        assertEquals(expected.y(), actual.y(), TOL, () -> expected + " vs " + actual);
        assertEquals(expected.z(), actual.z(), TOL, () -> expected + " vs " + actual);
    }
}
