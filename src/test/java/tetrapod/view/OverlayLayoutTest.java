package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/**
 * Labels on the picture (issue 16, item 7): the reaction labels of the four leg bases, the wind
 * and the axis labels never cover one another, in the report's picture size and a small one.
 */
class OverlayLayoutTest {

    private final Frame frame = ViewFixtures.ridge();

    @Test
    void reactionWindAndAxisLabelsDoNotOverlap() {
        List<Support> supports = frame.supports();
        List<NodeVector> reactions = new ArrayList<>();
        for (int k = 0; k < supports.size(); k++) {
            // equal and nearly equal forces, so that labels of the same length sit side by side
            reactions.add(new NodeVector(supports.get(k).node(), new Vec3(-30e3 - k, 25e3, 250e3 - k * 1e3)));
        }
        ViewCase c = new ViewCase("wind", OptionalDouble.of(225), Map.of(), List.of(), reactions, List.of());
        ViewData data = new ViewData(frame, List.of(c), Colouring.ROLE);
        Scene scene = SceneBuilder.build(data, SceneOptions.defaults(data).withWind(true));
        long reactionLabels = scene.labels().stream().filter(l -> l.style() == LabelStyle.REACTION).count();
        assertEquals(8, reactionLabels, "a vertical and a horizontal label per leg");
        for (int[] size : new int[][] {{1600, 1200}, {640, 480}}) {
            assertEquals(List.of(), overlaps(layout(scene, size[0], size[1])), size[0] + "x" + size[1]);
        }
    }

    /** The test can fail: labels anchored at one point are spread apart, not drawn on top of each other. */
    @Test
    void labelsAtOnePointAreSpreadApart() {
        Scene scene = fiveLabelsAtTheTop(k -> "Fz = 100.0 kN", 0, LabelAnchor.Align.CENTRE);
        List<PlacedImage> placed = layout(scene, 1600, 1200);
        assertTrue(placed.size() >= 5);
        assertEquals(List.of(), overlaps(placed));
    }

    /**
     * A label moved off a taken place stays on the image: five labels at the tower's top, which the
     * framing puts near the image's upper edge, are all drawn whole (one was pushed above the edge).
     */
    @Test
    void labelsMovedToAFreePlaceStayOnTheImage() {
        Scene scene = fiveLabelsAtTheTop(k -> "ladder " + k, -40, LabelAnchor.Align.LEFT);
        for (int[] size : new int[][] {{1600, 1200}, {640, 480}}) {
            List<PlacedImage> placed = layout(scene, size[0], size[1]);
            assertEquals(List.of(), overlaps(placed), size[0] + "x" + size[1]);
            for (PlacedImage p : placed) {
                assertTrue(p.y() >= 0 && p.y() + p.image().getHeight() <= size[1],
                        size[0] + "x" + size[1] + ": a label at y " + p.y() + ", " + p.image().getHeight() + " px high");
            }
        }
    }

    /**
     * The window's overlays (caption, legend, help with the status line stacked above it, the axis
     * triad's letters, the picked member's box, the wind label) never cover one another, in the
     * first view and after orbiting, zooming and panning (issue 16 item 8).
     */
    @Test
    void theWindowsOverlaysDoNotOverlap() {
        ViewData data = ViewData.geometryOnly(frame, OptionalDouble.of(30));
        int width = 1280;
        int height = 960;
        ViewerSession s = new ViewerSession(data, SceneOptions.defaults(data), width, height);
        int leg = ViewFixtures.withRole(frame, tetrapod.model.Role.LEG).get(3);
        Vec3 a = s.scene().members().start(leg);
        Vec3 b = s.scene().members().end(leg);
        double[] xy = new double[4];
        new Projector(s.camera(), width, height).project((a.x() + b.x()) / 2, (a.y() + b.y()) / 2, (a.z() + b.z()) / 2, xy);
        s.apply(new ViewerAction.Pick(xy[0], xy[1]));
        assertTrue(s.picked().isPresent());
        s.apply(new ViewerAction.StepCase(1));
        assertTrue(!s.status().isEmpty(), "a status line to place");
        for (ViewerAction move : List.of(new ViewerAction.Zoom(1), new ViewerAction.Zoom(0.4), new ViewerAction.Pan(-200, 80),
                new ViewerAction.Zoom(3), new ViewerAction.Pan(300, 0))) {
            s.apply(move);
            // each move clears the status line: say it again
            s.apply(new ViewerAction.StepCase(1));
            for (double yaw : new double[] {0, 0.8, 1.9, 3.3}) {
                s.apply(new ViewerAction.Orbit(yaw, 0));
                s.apply(new ViewerAction.StepCase(1));
                List<PlacedImage> placed = OverlayLayout.place(s.scene(), new Projector(s.camera(), width, height),
                        new LabelPainter(height));
                assertEquals(List.of(), overlaps(placed), move + ", turned " + yaw);
            }
        }
    }

    /** The frame by role with five reaction-style labels at its top node, {@code dy} reference px off it. */
    private Scene fiveLabelsAtTheTop(java.util.function.IntFunction<String> text, double dy, LabelAnchor.Align align) {
        ViewData data = ViewData.geometryOnly(frame, OptionalDouble.empty());
        Vec3 top = frame.nodes().get(frame.nodes().size() - 1).position();
        List<SceneLabel> labels = new ArrayList<>();
        for (int k = 0; k < 5; k++) {
            labels.add(new SceneLabel(text.apply(k), LabelStyle.REACTION, new LabelAnchor.AtPoint(top, 0, dy, align)));
        }
        return SceneBuilder.build(data, SceneOptions.defaults(data)).withLabels(labels);
    }

    private static List<PlacedImage> layout(Scene scene, int width, int height) {
        Camera camera = Camera.framing(scene.bounds(), width, height, Camera.DEFAULT_YAW, Camera.DEFAULT_PITCH);
        return OverlayLayout.place(scene, new Projector(camera, width, height), new LabelPainter(height));
    }

    /** Pairs of placed images whose rectangles intersect (computed here, not by the layout's own test). */
    private static List<String> overlaps(List<PlacedImage> placed) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < placed.size(); i++) {
            for (int j = i + 1; j < placed.size(); j++) {
                PlacedImage a = placed.get(i);
                PlacedImage b = placed.get(j);
                boolean apartX = a.x() + a.image().getWidth() <= b.x() || b.x() + b.image().getWidth() <= a.x();
                boolean apartY = a.y() + a.image().getHeight() <= b.y() || b.y() + b.image().getHeight() <= a.y();
                if (!apartX && !apartY) {
                    out.add("[" + a.x() + ", " + a.y() + "] and [" + b.x() + ", " + b.y() + "]");
                }
            }
        }
        return out;
    }
}
