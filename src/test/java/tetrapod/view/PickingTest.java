package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;

class PickingTest {

    private final Frame frame = ViewFixtures.ridge();
    private final ViewData data = ViewData.geometryOnly(frame, OptionalDouble.empty());
    private final Scene scene = SceneBuilder.build(data, SceneOptions.defaults(data));
    private final Camera camera = Camera.framing(scene.bounds(), 2400, 1800, Camera.DEFAULT_YAW, Camera.DEFAULT_PITCH);
    private final Projector projector = new Projector(camera, 2400, 1800);

    @Test
    void clickingAMembersMidpointPicksItWhenNothingElseIsNear() {
        int checked = 0;
        for (int k = 0; k < frame.members().size(); k++) {
            double[] mid = midpoint(k);
            if (nearestOther(k, mid) < 12) {
                continue;  // another member crosses here; covered by the depth test below
            }
            OptionalInt picked = Picking.memberAt(scene, projector, mid[0], mid[1]);
            assertEquals(OptionalInt.of(k), picked, "member index " + k);
            checked++;
        }
        assertTrue(checked > 10, "too few isolated members to test: " + checked);
    }

    @Test
    void clickingEmptySpacePicksNothing() {
        assertEquals(OptionalInt.empty(), Picking.memberAt(scene, projector, 5, 5));
        assertEquals(OptionalInt.empty(), Picking.memberAt(scene, projector, 2395, 900));
    }

    @Test
    void whereMembersCrossTheOneNearerTheEyeIsPicked() {
        // the near and far legs seen one behind the other: look along the diagonal through two legs
        // from a direction where they overlap; any overlap point must pick the member of smaller depth
        double[] a = new double[4];
        double[] b = new double[4];
        int found = 0;
        for (int k = 0; k < frame.members().size() && found < 20; k++) {
            double[] mid = midpoint(k);
            OptionalInt picked = Picking.memberAt(scene, projector, mid[0], mid[1]);
            assertTrue(picked.isPresent());
            int p = picked.getAsInt();
            if (p != k) {
                // the picked member passes within reach and is at least as near the eye there
                projector.project(scene.members().start(p).x(), scene.members().start(p).y(),
                        scene.members().start(p).z(), a);
                projector.project(scene.members().end(p).x(), scene.members().end(p).y(),
                        scene.members().end(p).z(), b);
                double depthOfK = mid[2];
                double t = closest(a, b, mid);
                double depthOfP = a[2] + t * (b[2] - a[2]);
                double distanceK = 0;
                double distanceP = Math.hypot(mid[0] - (a[0] + t * (b[0] - a[0])), mid[1] - (a[1] + t * (b[1] - a[1])));
                assertTrue(depthOfP <= depthOfK + 1e-6 || distanceP < distanceK + 0.75,
                        "member " + p + " was picked over " + k + " though it is further away");
                found++;
            }
        }
    }

    private double[] midpoint(int k) {
        var s = scene.members().start(k);
        var e = scene.members().end(k);
        double[] xy = new double[4];
        projector.project((s.x() + e.x()) / 2, (s.y() + e.y()) / 2, (s.z() + e.z()) / 2, xy);
        return xy;
    }

    private double nearestOther(int k, double[] point) {
        double best = Double.MAX_VALUE;
        double[] a = new double[4];
        double[] b = new double[4];
        for (int j = 0; j < scene.members().count(); j++) {
            if (j == k) {
                continue;
            }
            var s = scene.members().start(j);
            var e = scene.members().end(j);
            projector.project(s.x(), s.y(), s.z(), a);
            projector.project(e.x(), e.y(), e.z(), b);
            double t = closest(a, b, point);
            best = Math.min(best, Math.hypot(point[0] - (a[0] + t * (b[0] - a[0])), point[1] - (a[1] + t * (b[1] - a[1]))));
        }
        return best;
    }

    static double closest(double[] a, double[] b, double[] p) {
        double dx = b[0] - a[0];
        double dy = b[1] - a[1];
        double l2 = dx * dx + dy * dy;
        return l2 == 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / l2));
    }
}
