package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.testing.NativeRequirement;

/**
 * What every render route must do, run once per route (OpenGL by EGL, by OSMesa, Java2D): a tower
 * with one member forced over utilisation 1.0 must show that member in the overstress colour where
 * it projects (computed with the camera the image was drawn with), nothing in that colour anywhere
 * else, and the background wherever no line projects.
 */
abstract class RenderContract {

    static final int W = 800;
    static final int H = 600;
    /** Largest 8-bit channel difference accepted for "this colour" (multisampling blends only edges). */
    static final int SAME_COLOUR = 24;

    /** The only route the test lets the renderer use. */
    abstract RenderRoute route();

    /** An OpenGL route as a test's requirement: present when it makes a context, from {@code packages}. */
    static NativeRequirement openGl(RenderRoute route, String packages) {
        return NativeRequirement.probed(packages, () -> {
            LwjglMessages.silence();
            try (HeadlessContext context = HeadlessContext.open(route)) {
                return Optional.empty();
            } catch (HeadlessContext.Unavailable e) {
                return Optional.of("no OpenGL context through " + e.getMessage());
            }
        });
    }

    final Frame frame = ViewFixtures.ridge();

    Picture render(ViewData data, SceneOptions options) {
        Picture picture = PictureRenderer.render(data, new RenderRequest(W, H, options, List.of(route())));
        assertEquals(route(), picture.route());
        assertEquals(W, picture.image().getWidth());
        assertEquals(H, picture.image().getHeight());
        return picture;
    }

    /** The member nearest the eye among those drawn at least 80 px long: nothing can hide it. */
    int frontMember() {
        ViewData data = ViewFixtures.utilisation(frame, 0.3, 0, 0.3);
        Scene scene = SceneBuilder.build(data, SceneOptions.defaults(data).membersOnly());
        Projector p = projector(scene);
        double[] a = new double[4];
        double[] b = new double[4];
        int best = -1;
        double bestDepth = Double.MAX_VALUE;
        for (int k = 0; k < scene.members().count(); k++) {
            project(p, scene.members(), k, a, b);
            double depth = 0.5 * (a[2] + b[2]);
            if (Math.hypot(b[0] - a[0], b[1] - a[1]) > 80 && depth < bestDepth) {
                best = k;
                bestDepth = depth;
            }
        }
        return best;
    }

    static Projector projector(Scene scene) {
        return new Projector(Camera.framing(scene.bounds(), W, H, Camera.DEFAULT_YAW, Camera.DEFAULT_PITCH), W, H);
    }

    static void project(Projector p, SegmentInstances s, int k, double[] a, double[] b) {
        p.project(s.start(k).x(), s.start(k).y(), s.start(k).z(), a);
        p.project(s.end(k).x(), s.end(k).y(), s.end(k).z(), b);
    }

    @Test
    void theOverstressedMemberShowsInTheOverstressColourWhereItProjectsAndNowhereElse() {
        int over = frontMember();
        ViewData data = ViewFixtures.utilisation(frame, 0.3, over, 1.25);
        Picture picture = render(data, SceneOptions.defaults(data).membersOnly());
        BufferedImage image = picture.image();
        Projector p = new Projector(picture.camera(), W, H);
        double[] a = new double[4];
        double[] b = new double[4];
        project(p, picture.scene().members(), over, a, b);
        int samples = 0;
        int hits = 0;
        for (double t = 0.2; t <= 0.8001; t += 0.02) {
            int x = (int) Math.floor(a[0] + t * (b[0] - a[0]));
            int y = (int) Math.floor(a[1] + t * (b[1] - a[1]));
            samples++;
            if (UtilisationScale.OVERSTRESS.channelDistance(image.getRGB(x, y) & 0xffffff) <= SAME_COLOUR) {
                hits++;
            }
        }
        assertTrue(hits >= 0.8 * samples, "overstress colour at " + hits + " of " + samples + " points along the member");

        double reach = p.pixels(SceneBuilder.width(frame.members().get(over).role()) * SceneBuilder.OVERSTRESS_WIDTH_FACTOR)
                * 0.75 + 3;
        int elsewhere = 0;
        for (int y = 0; y < H; y += 2) {
            for (int x = 0; x < W; x += 2) {
                if (UtilisationScale.OVERSTRESS.channelDistance(image.getRGB(x, y) & 0xffffff) <= SAME_COLOUR
                        && distance(a, b, x + 0.5, y + 0.5) > reach) {
                    elsewhere++;
                }
            }
        }
        assertEquals(0, elsewhere, "pixels in the overstress colour away from the overstressed member");
    }

    @Test
    void theBackgroundShowsWhereNoLineProjectsAndTheImageIsNotBlank() {
        ViewData data = ViewFixtures.utilisation(frame, 0.6, frontMember(), 1.5);
        Picture picture = render(data, SceneOptions.defaults(data).membersOnly());
        BufferedImage image = picture.image();
        Projector p = new Projector(picture.camera(), W, H);
        List<SegmentInstances> drawn = List.of(picture.scene().members(), picture.scene().decorations());
        int background = Scene.BACKGROUND.packed();
        int far = 0;
        int painted = 0;
        double[] a = new double[4];
        double[] b = new double[4];
        for (int y = 1; y < H; y += 6) {
            for (int x = 1; x < W; x += 6) {
                int rgb = image.getRGB(x, y) & 0xffffff;
                boolean isBackground = Scene.BACKGROUND.channelDistance(rgb) <= 3;
                if (!isBackground) {
                    painted++;
                }
                boolean near = false;
                for (SegmentInstances s : drawn) {
                    for (int k = 0; k < s.count() && !near; k++) {
                        project(p, s, k, a, b);
                        double halfWidth = p.pixels(Math.max(s.startWidth(k), s.endWidth(k))) / 2;
                        near = distance(a, b, x + 0.5, y + 0.5) <= 1.5 * halfWidth + 2;
                    }
                }
                if (!near) {
                    far++;
                    assertTrue(isBackground, String.format("pixel %d, %d is %06X where nothing projects (background %06X)",
                            x, y, rgb, background));
                }
            }
        }
        assertTrue(far > 1000, "too few pixels away from the tower to judge the background: " + far);
        assertTrue(painted > 0.01 * (W / 6) * (H / 6), "image nearly blank: " + painted + " painted samples");
    }

    @Test
    void theFullPictureHasTheOverstressedMemberLegendAndLabels() {
        int over = frontMember();
        ViewData data = ViewFixtures.utilisation(frame, 0.3, over, 1.25);
        Picture picture = render(data, SceneOptions.defaults(data));
        BufferedImage image = picture.image();
        int overstress = 0;
        int dark = 0;
        for (int y = 0; y < H; y++) {
            for (int x = 0; x < W; x++) {
                int rgb = image.getRGB(x, y) & 0xffffff;
                if (UtilisationScale.OVERSTRESS.channelDistance(rgb) <= SAME_COLOUR) {
                    overstress++;
                }
                if (((rgb >> 16) & 0xff) < 60 && ((rgb >> 8) & 0xff) < 60 && (rgb & 0xff) < 60) {
                    dark++;  // caption and label text, reaction arrows
                }
            }
        }
        assertTrue(overstress > 100, "overstress pixels: " + overstress);
        assertTrue(dark > 500, "dark (text) pixels: " + dark);
        // the legend's overstress swatch sits in the right-hand quarter of the image
        int swatch = 0;
        for (int y = 0; y < H; y++) {
            for (int x = 3 * W / 4; x < W; x++) {
                if (UtilisationScale.OVERSTRESS.channelDistance(image.getRGB(x, y) & 0xffffff) <= SAME_COLOUR) {
                    swatch++;
                }
            }
        }
        assertTrue(swatch > 20, "no overstress swatch in the legend");
    }

    /** Issue 16 item 8: the x, y, z triad is still there, in its inset, after zooming in, panning and orbiting. */
    @Test
    void theAxisTriadShowsInItsInsetAfterZoomPanAndOrbit() {
        ViewData data = ViewFixtures.utilisation(frame, 0.3, 0, 0.3);
        ViewerSession s = new ViewerSession(data, SceneOptions.defaults(data), W, H);
        s.apply(new ViewerAction.Zoom(0.1));
        s.apply(new ViewerAction.Pan(250, -120));
        s.apply(new ViewerAction.Orbit(0.5, 0.35));
        ScreenRect inset = AxisTriad.viewport(W, H);
        try (PictureRenderer renderer = PictureRenderer.start(List.of(route()))) {
            Picture with = renderer.draw(s.scene(), s.camera(), W, H);
            Picture without = renderer.draw(s.scene().withAxisTriad(false), s.camera(), W, H);
            assertEquals(route(), with.route());
            for (Rgb axis : List.of(GroundDecorations.AXIS_X, GroundDecorations.AXIS_Y, GroundDecorations.AXIS_Z)) {
                int n = count(with.image(), inset, axis);
                assertTrue(n > 15, axis + " pixels in the inset: " + n);
            }
            assertEquals(0, count(without.image(), inset, GroundDecorations.AXIS_X), "the x colour only comes from the triad");
        }
    }

    /** Issue 16 item 8: the picked member's near-black outline shows along it and nowhere else. */
    @Test
    void thePickedMemberIsOutlinedAlongItsLength() {
        int front = frontMember();
        ViewData data = ViewFixtures.utilisation(frame, 0.3, front, 0.3);
        Scene plain = SceneBuilder.build(data, SceneOptions.defaults(data).membersOnly());
        Scene scene = plain.withDecorations(PickHighlight.of(plain.members(), front));
        Camera camera = Camera.framing(scene.bounds(), W, H, Camera.DEFAULT_YAW, Camera.DEFAULT_PITCH);
        try (PictureRenderer renderer = PictureRenderer.start(List.of(route()))) {
            BufferedImage image = renderer.draw(scene, camera, W, H).image();
            BufferedImage before = renderer.draw(plain, camera, W, H).image();
            Projector p = new Projector(camera, W, H);
            double[] a = new double[4];
            double[] b = new double[4];
            project(p, scene.members(), front, a, b);
            double reach = p.pixels(scene.decorations().startWidth(scene.decorations().count() - 3)) / 2 + 3;
            int along = 0;
            int elsewhere = 0;
            int outlineBefore = 0;
            for (int y = 0; y < H; y++) {
                for (int x = 0; x < W; x++) {
                    if (PickHighlight.OUTLINE.channelDistance(before.getRGB(x, y) & 0xffffff) <= SAME_COLOUR) {
                        outlineBefore++;
                    }
                    if (PickHighlight.OUTLINE.channelDistance(image.getRGB(x, y) & 0xffffff) <= SAME_COLOUR) {
                        if (distance(a, b, x + 0.5, y + 0.5) <= reach) {
                            along++;
                        } else {
                            elsewhere++;
                        }
                    }
                }
            }
            assertEquals(0, outlineBefore, "no outline colour without a pick");
            assertTrue(along > 60, "outline pixels along the picked member: " + along);
            assertEquals(0, elsewhere, "outline pixels away from the picked member");
        }
    }

    private static int count(BufferedImage image, ScreenRect r, Rgb colour) {
        int n = 0;
        for (int y = (int) r.y0(); y < (int) r.y1(); y++) {
            for (int x = (int) r.x0(); x < (int) r.x1(); x++) {
                if (colour.channelDistance(image.getRGB(x, y) & 0xffffff) <= SAME_COLOUR) {
                    n++;
                }
            }
        }
        return n;
    }

    /** Distance in px from (x, y) to the segment from a to b. */
    static double distance(double[] a, double[] b, double x, double y) {
        double t = PickingTest.closest(a, b, new double[] {x, y});
        return Math.hypot(x - (a[0] + t * (b[0] - a[0])), y - (a[1] + t * (b[1] - a[1])));
    }
}
