package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import tetrapod.model.Face;
import tetrapod.model.Frame;

/**
 * Ancillaries drawn at their heights (issue 16, item 7), on the ridge example: base 6.0 m, 4.5 m
 * at 12 m, 3.0 m at 22 m, 2.0 m at 30 m (its model file), straight tapers between.
 */
class AncillaryGlyphsTest {

    private static final double TOL = 1e-9;
    private final Frame frame = ViewFixtures.ridge();

    @Test
    void theOutlineFollowsTheSegmentWidthsOfTheModelFile() {
        double[][] expected = {{0, 3.0}, {6, (3.0 + 2.25) / 2}, {12, 2.25}, {17, (2.25 + 1.5) / 2}, {30, 1.0}};
        for (double[] e : expected) {
            double[] half = AncillaryGlyphs.halfWidths(frame, e[0], 0, 0);
            assertEquals(e[1], half[0], TOL, "half width in x at z = " + e[0]);
            assertEquals(e[1], half[1], TOL, "half width in y at z = " + e[0]);
        }
    }

    @Test
    void aPlatformIsARingAtItsHeightAndAStairABarUpItsFace() {
        ViewData data = ViewData.geometryOnly(frame, OptionalDouble.empty()).withAncillaries(List.of(
                new ViewAncillary("platform", 30, 30, Face.NONE), new ViewAncillary("stair", 0, 30, Face.Y_MINUS)));
        Scene scene = SceneBuilder.build(data, SceneOptions.defaults(data));
        SegmentInstances deco = scene.decorations();
        int ring = 0;
        int bar = 0;
        for (int k = 0; k < deco.count(); k++) {
            if (!deco.colour(k).equals(AncillaryGlyphs.COLOUR)) {
                continue;
            }
            Vec3Pair p = new Vec3Pair(deco.start(k), deco.end(k));
            if (p.a().z() == 30 && p.b().z() == 30) {
                ring++;
                assertTrue(Math.abs(p.a().x()) > 1.0 && Math.abs(p.a().y()) > 1.0, "outside the 2 m top: " + p);
            } else {
                bar++;
                // on the -y face, outside it: y below minus the half width at that height
                double half = AncillaryGlyphs.halfWidths(frame, p.a().z(), 0, 0)[1];
                assertTrue(p.a().y() < -half && Math.abs(p.a().x()) < TOL, "on the -y face: " + p);
            }
        }
        assertEquals(4, ring, "a ring of four sides");
        assertTrue(bar >= 2, "a bar up the face");
        assertTrue(scene.labels().stream().anyMatch(l -> l.text().equals("platform")), "named");
    }

    private record Vec3Pair(tetrapod.model.Vec3 a, tetrapod.model.Vec3 b) { }
}
