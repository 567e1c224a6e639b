package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Node;
import tetrapod.model.Vec3;

class CameraTest {

    @ParameterizedTest(name = "{0} at {1} x {2}, yaw {3}, pitch {4}")
    @CsvSource({
        "ridge-lookout-square.json, 1600, 1200, -62, 16",
        "ridge-lookout-square.json, 400, 1200, 30, 60",
        "harbour-beacon-rectangular.json, 1920, 600, 135, -10",
        "hilltop-relay-k.json, 800, 800, 0, 85"})
    void theCameraFramesTheWholeTower(String model, int width, int height, double yawDeg, double pitchDeg) {
        Frame frame = ViewFixtures.frame(model);
        ViewData data = ViewData.geometryOnly(frame, OptionalDouble.of(45));
        Scene scene = SceneBuilder.build(data, SceneOptions.defaults(data));
        Camera camera = Camera.framing(scene.bounds(), width, height, Math.toRadians(yawDeg), Math.toRadians(pitchDeg));
        Projector p = new Projector(camera, width, height);
        double[] xy = new double[4];
        for (Node n : frame.nodes()) {
            assertTrue(p.project(n.x(), n.y(), n.z(), xy), "node " + n.id() + " is behind the eye");
            assertTrue(xy[0] >= 0 && xy[0] <= width && xy[1] >= 0 && xy[1] <= height,
                    "node " + n.id() + " projects outside the viewport at " + xy[0] + ", " + xy[1]);
            assertTrue(xy[2] > -1 && xy[2] < 1, "node " + n.id() + " is outside the depth range");
        }
        // framed tightly: some corner of the framed box reaches the margin in x or y
        double widest = 0;
        for (Vec3 corner : scene.bounds().corners()) {
            p.project(corner.x(), corner.y(), corner.z(), xy);
            widest = Math.max(widest, Math.max(Math.abs(2 * xy[0] / width - 1), Math.abs(2 * xy[1] / height - 1)));
        }
        assertEquals(Camera.FRAME_MARGIN, widest, 1e-3, "not framed tightly");
    }

    @Test
    void eyeAndScreenAxesFollowYawAndPitch() {
        Camera c = new Camera(new Vec3(1, 2, 3), 0, 0, 10, Camera.DEFAULT_FOV_Y, 5);
        SceneBuilderTest.assertClose(new Vec3(11, 2, 3), c.eye());
        SceneBuilderTest.assertClose(new Vec3(0, 1, 0), c.right());
        SceneBuilderTest.assertClose(new Vec3(0, 0, 1), c.up());
        Camera above = new Camera(Vec3.ZERO, Math.PI / 2, Math.PI / 6, 2, Camera.DEFAULT_FOV_Y, 5);
        // eye at distance 2, 30 deg up, in the +y direction: (0, 2 cos 30°, 2 sin 30°)
        SceneBuilderTest.assertClose(new Vec3(0, Math.sqrt(3), 1), above.eye());
        assertEquals(Camera.MAX_PITCH, c.orbit(0, 3).pitch(), 1e-12, "pitch stops short of the pole");
    }

    @Test
    void theTargetProjectsToTheViewportCentre() {
        Camera c = new Camera(new Vec3(3, -4, 12), 0.7, 0.3, 40, Camera.DEFAULT_FOV_Y, 30);
        double[] xy = new double[4];
        new Projector(c, 800, 600).project(3, -4, 12, xy);
        assertEquals(400, xy[0], 1e-3);
        assertEquals(300, xy[1], 1e-3);
    }

    @Test
    void aPointAboveTheTargetProjectsAboveTheCentreByTheFieldOfView() {
        // looking horizontally from distance d, a point h above the target is at
        // y = H/2 − (h / (d tan(fovY/2))) · H/2 pixels (y down)
        double d = 50;
        double h = 5;
        int height = 1000;
        Camera c = new Camera(Vec3.ZERO, 0, 0, d, Camera.DEFAULT_FOV_Y, 30);
        double[] xy = new double[4];
        new Projector(c, 1000, height).project(0, 0, h, xy);
        double expected = height / 2.0 - h / (d * Math.tan(Camera.DEFAULT_FOV_Y / 2)) * height / 2.0;
        assertEquals(expected, xy[1], 1e-2);
        assertEquals(500, xy[0], 1e-3);
    }
}
