package tetrapod.view;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;

/**
 * Draws a {@link ViewData} into an image without a display: OpenGL through each route of the
 * request in turn, and Java2D when none gives a context. Every failure is kept for the line that
 * says which route drew the image. Not for concurrent use (GLFW is process-wide).
 */
public final class PictureRenderer {

    /** Samples per pixel of the off-screen framebuffer (fewer if the implementation offers fewer). */
    static final int SAMPLES = 4;

    private PictureRenderer() { }

    public static Picture render(ViewData data, RenderRequest request) {
        Scene scene = SceneBuilder.build(data, request.options());
        Camera camera = Camera.framing(scene.bounds(), request.width(), request.height(), Camera.DEFAULT_YAW,
                Camera.DEFAULT_PITCH);
        return render(scene, camera, request.width(), request.height(), request.routes());
    }

    /** The line for an image drawn by Java2D after the OpenGL routes failed as {@code failures} say. */
    static String fallbackLine(List<String> failures) {
        return failures.isEmpty() ? "render: built-in 2D renderer (Java2D)"
                : "render: no OpenGL found (" + String.join("; ", failures) + "), used the built-in 2D renderer";
    }

    /** Draws {@code scene} as {@code camera} sees it, trying {@code routes} in order. */
    public static Picture render(Scene scene, Camera camera, int width, int height, List<RenderRoute> routes) {
        List<String> failures = new ArrayList<>();
        for (RenderRoute route : routes) {
            if (route == RenderRoute.JAVA2D) {
                BufferedImage image = SoftwareRenderer.render(scene, camera, width, height);
                return new Picture(image, scene, camera, route, fallbackLine(failures));
            }
            try (HeadlessContext context = HeadlessContext.open(route)) {
                String description = context.describe();
                BufferedImage image;
                try (GlRenderer renderer = new GlRenderer();
                     OffscreenTarget target = new OffscreenTarget(width, height, SAMPLES)) {
                    renderer.draw(scene, camera, width, height);
                    image = target.read();
                }
                return new Picture(image, scene, camera, route, "render: " + description);
            } catch (HeadlessContext.Unavailable e) {
                failures.add(e.getMessage());
            } catch (RuntimeException | LinkageError e) {
                failures.add(HeadlessContext.name(route) + ": drawing failed: " + e.getMessage());
            }
        }
        throw new IllegalStateException("no render route drew the image: " + String.join("; ", failures));
    }
}
