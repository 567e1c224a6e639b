package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Node;
import tetrapod.model.Vec3;

/** The top displacement shown beside the deformed shape (issue 16 item 8): hand-set displacements. */
class TopDisplacementTest {

    private final Frame frame = ViewFixtures.ridge();

    private List<Node> byHeight() {
        List<Node> nodes = new ArrayList<>(frame.nodes());
        nodes.sort(Comparator.comparingDouble(Node::z).reversed());
        return nodes;
    }

    private List<NodeVector> displacements() {
        List<Node> nodes = byHeight();
        Node top = nodes.get(0);
        Node topToo = nodes.stream().filter(n -> n.z() == top.z() && n.id() != top.id()).findFirst().orElseThrow();
        Node low = nodes.get(nodes.size() - 1);
        // 30 mm and 40 mm across: 50 mm horizontally (3-4-5); the 0.5 m vertical part does not count;
        // the lower node moves a whole metre but is not on the top level
        return List.of(new NodeVector(top.id(), new Vec3(0.03, -0.04, 0.5)),
                new NodeVector(topToo.id(), new Vec3(0.01, 0, 0)),
                new NodeVector(low.id(), new Vec3(1, 0, 0)));
    }

    @Test
    void theLargestHorizontalDisplacementOfTheTopLevelNodes() {
        OptionalDouble top = TopDisplacement.of(frame, displacements());
        assertEquals(0.050, top.orElseThrow(), 1e-12);
    }

    @Test
    void noTopNodeDisplacedMeansNoFigure() {
        Node low = byHeight().get(frame.nodes().size() - 1);
        assertTrue(TopDisplacement.of(frame, List.of(new NodeVector(low.id(), new Vec3(1, 0, 0)))).isEmpty());
    }

    @Test
    void theDeformedCaptionShowsScaleAndTopDisplacementInMillimetres() {
        ViewCase c = new ViewCase("wind 0", OptionalDouble.of(0), Map.of(), displacements(), List.of(), List.of());
        ViewData data = new ViewData(frame, List.of(c), Colouring.ROLE);
        Scene scene = SceneBuilder.build(data, SceneOptions.defaults(data).withDeformed(true));
        String caption = scene.labels().stream().filter(l -> l.style() == LabelStyle.CAPTION).findFirst()
                .orElseThrow().text();
        assertTrue(caption.contains("deformed shape ×"), caption);
        assertTrue(caption.contains("top displacement 50.0 mm"), caption);
    }

    @Test
    void aModeShapeHasNoDisplacementInMillimetres() {
        ViewData data = new ViewData(frame, List.of(ViewCase.shape("mode 1", displacements())), Colouring.ROLE);
        Scene scene = SceneBuilder.build(data, SceneOptions.defaults(data).withDeformed(true));
        assertTrue(scene.labels().stream().noneMatch(l -> l.text().contains("mm")));
    }
}
