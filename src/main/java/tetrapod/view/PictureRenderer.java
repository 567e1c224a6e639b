package tetrapod.view;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Draws {@link ViewData} into images without a display: OpenGL through the first route that gives
 * a context, and Java2D when none does (if the routes allow it). Every failure is kept for the one
 * line that says which route drew the image.
 *
 * <p>The context is made on a thread of its own as soon as the renderer is {@link #start started},
 * so that it can come up while the caller is still reading the model; all OpenGL work happens on
 * that thread. One renderer may draw many images; close it to free the context. GLFW is
 * process-wide: use one renderer at a time.
 */
public final class PictureRenderer implements AutoCloseable {

    /** Samples per pixel of the off-screen framebuffer (fewer if the implementation offers fewer). */
    static final int SAMPLES = 4;

    /** What the OpenGL thread came up with: a context and renderer, or the reasons there is none. */
    private record Opened(HeadlessContext context, GlRenderer renderer, String description, List<String> failures) { }

    private final List<RenderRoute> routes;
    private final ExecutorService glThread;
    private final Future<Opened> opening;
    private final List<String> drawFailures = new ArrayList<>();

    private PictureRenderer(List<RenderRoute> routes) {
        this.routes = List.copyOf(routes);
        this.glThread = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "tetrapod-opengl");
            t.setDaemon(true);
            return t;
        });
        this.opening = glThread.submit(() -> open(this.routes));
    }

    /** Starts making a context by the OpenGL routes among {@code routes}, in order, at once. */
    public static PictureRenderer start(List<RenderRoute> routes) {
        if (routes.isEmpty()) {
            throw new IllegalArgumentException("no render route to try");
        }
        LwjglMessages.silence();
        return new PictureRenderer(routes);
    }

    /** Draws one image of {@code data} as {@code request} says, and frees everything. */
    public static Picture render(ViewData data, RenderRequest request) {
        try (PictureRenderer renderer = start(request.routes())) {
            return renderer.draw(data, request);
        }
    }

    /** Draws {@code data} as {@code request} says (its routes are those this renderer started with). */
    public Picture draw(ViewData data, RenderRequest request) {
        Scene scene = SceneBuilder.build(data, request.options());
        Camera camera = Camera.framing(scene.bounds(), request.width(), request.height(), Camera.DEFAULT_YAW,
                Camera.DEFAULT_PITCH);
        return draw(scene, camera, request.width(), request.height());
    }

    /** Draws {@code scene} as {@code camera} sees it on a {@code width} × {@code height} image. */
    public Picture draw(Scene scene, Camera camera, int width, int height) {
        Opened opened = opened();
        List<String> failures = new ArrayList<>(opened.failures());
        failures.addAll(drawFailures);
        if (opened.context() != null) {
            // labels are rasterised here, on the caller's thread, while the OpenGL thread is busy
            List<PlacedImage> overlay = OverlayLayout.place(scene, new Projector(camera, width, height),
                    new LabelPainter(height));
            try {
                BufferedImage image = glThread.submit(() -> {
                    try (OffscreenTarget target = new OffscreenTarget(width, height, SAMPLES)) {
                        opened.renderer().draw(scene, camera, width, height, overlay);
                        return target.read();
                    }
                }).get();
                return new Picture(image, scene, camera, opened.context().route(), "render: " + opened.description());
            } catch (ExecutionException e) {
                String why = HeadlessContext.name(opened.context().route()) + ": drawing failed: " + e.getCause();
                drawFailures.add(why);
                failures.add(why);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted while drawing", e);
            }
        }
        if (routes.contains(RenderRoute.JAVA2D)) {
            return new Picture(SoftwareRenderer.render(scene, camera, width, height), scene, camera, RenderRoute.JAVA2D,
                    fallbackLine(failures));
        }
        throw new IllegalStateException("no render route drew the image: " + String.join("; ", failures));
    }

    /** The line for an image drawn by Java2D after the OpenGL routes failed as {@code failures} say. */
    static String fallbackLine(List<String> failures) {
        return failures.isEmpty() ? "render: built-in 2D renderer (Java2D)"
                : "render: no OpenGL found (" + String.join("; ", failures) + "), used the built-in 2D renderer";
    }

    private Opened opened() {
        try {
            return opening.get();
        } catch (ExecutionException e) {
            return new Opened(null, null, "", List.of("OpenGL: " + e.getCause()));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while making an OpenGL context", e);
        }
    }

    /** On the OpenGL thread: the first route that gives a context and compiles the shaders. */
    private static Opened open(List<RenderRoute> routes) {
        List<String> failures = new ArrayList<>();
        for (RenderRoute route : routes) {
            if (route == RenderRoute.JAVA2D) {
                break;
            }
            HeadlessContext context = null;
            try {
                context = HeadlessContext.open(route);
                GlRenderer renderer = new GlRenderer();
                return new Opened(context, renderer, context.describe(), failures);
            } catch (HeadlessContext.Unavailable e) {
                failures.add(e.getMessage());
            } catch (RuntimeException | LinkageError e) {
                failures.add(HeadlessContext.name(route) + ": " + e.getMessage());
                if (context != null) {
                    context.close();
                }
            }
        }
        return new Opened(null, null, "", failures);
    }

    @Override
    public void close() {
        try {
            glThread.submit(() -> {
                Opened o = opened();
                if (o.context() != null) {
                    o.renderer().close();
                    o.context().close();
                }
            }).get();
        } catch (ExecutionException e) {
            throw new IllegalStateException("could not free the OpenGL context", e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } finally {
            glThread.shutdown();
        }
    }
}
