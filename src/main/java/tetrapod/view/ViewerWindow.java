package tetrapod.view;

import static org.lwjgl.glfw.GLFW.*;
import static org.lwjgl.opengl.GL33C.*;
import static org.lwjgl.system.MemoryUtil.NULL;

import java.awt.image.BufferedImage;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;
import org.lwjgl.glfw.Callbacks;
import org.lwjgl.glfw.GLFWErrorCallback;
import org.lwjgl.opengl.GL;
import org.lwjgl.system.MemoryStack;

/**
 * The interactive window: GLFW's normal platform (a display is needed), an OpenGL 3.3 core
 * context with 4× multisampling, input through {@link InputMap} into a {@link ViewerSession},
 * drawn by the same {@link GlRenderer} as the headless images. Redraws only when something changed,
 * except when measuring the frame rate.
 */
public final class ViewerWindow {

    /** No window could be opened (no display, no OpenGL 3.3); the message has GLFW's text. */
    public static final class Unavailable extends Exception {
        private static final long serialVersionUID = 1L;

        public Unavailable(String message) {
            super(message);
        }
    }

    private final ViewData data;
    private final SceneOptions initial;
    private final Consumer<BufferedImage> snapshots;
    private final InputMap input = new InputMap();
    private ViewerSession session;
    private GlRenderer renderer;
    private long window = NULL;
    private boolean dirty = true;
    private double cursorScale = 1;

    /**
     * @param snapshots receives each image saved with the snapshot key (the caller writes it)
     */
    public ViewerWindow(ViewData data, SceneOptions initial, Consumer<BufferedImage> snapshots) {
        this.data = data;
        this.initial = initial;
        this.snapshots = snapshots;
    }

    /**
     * Opens a {@code width} × {@code height} window and runs until it is closed. With
     * {@code measureFrames} > 0 it instead orbits the tower for that many frames as fast as it can,
     * closes, and returns a line with the frame rate; otherwise it returns "".
     */
    public String run(int width, int height, int measureFrames) throws Unavailable {
        GlfwErrors errors = new GlfwErrors();
        GLFWErrorCallback previous = glfwSetErrorCallback(errors);
        boolean started = false;
        try {
            glfwInitHint(GLFW_PLATFORM, platform());  // a headless render may have asked for the null one
            if (!glfwInit()) {
                throw new Unavailable("cannot open a window: " + errors.text());
            }
            started = true;
            glfwDefaultWindowHints();
            glfwWindowHint(GLFW_SAMPLES, 4);
            glfwWindowHint(GLFW_CONTEXT_VERSION_MAJOR, 3);
            glfwWindowHint(GLFW_CONTEXT_VERSION_MINOR, 3);
            glfwWindowHint(GLFW_OPENGL_PROFILE, GLFW_OPENGL_CORE_PROFILE);
            glfwWindowHint(GLFW_OPENGL_FORWARD_COMPAT, GLFW_TRUE);
            window = glfwCreateWindow(width, height, "Tetrapod · " + data.frame().name(), NULL, NULL);
            if (window == NULL) {
                throw new Unavailable("cannot open a window: " + errors.text());
            }
            glfwMakeContextCurrent(window);
            glfwSwapInterval(measureFrames > 0 ? 0 : 1);
            if (GL.getFunctionProvider() == null) {
                GL.create();  // a headless render in this process destroyed LWJGL's GL state
            }
            GL.createCapabilities();
            glEnable(GL_MULTISAMPLE);
            renderer = new GlRenderer();
            int[] fb = framebufferSize();
            session = new ViewerSession(data, initial, fb[0], fb[1]);
            updateCursorScale();
            installCallbacks();
            return measureFrames > 0 ? measure(measureFrames) : loop();
        } finally {
            if (renderer != null) {
                renderer.close();
            }
            if (window != NULL) {
                Callbacks.glfwFreeCallbacks(window);
                glfwDestroyWindow(window);
            }
            if (started) {
                glfwTerminate();
            }
            GLFWErrorCallback mine = glfwSetErrorCallback(previous);
            if (mine != null) {
                mine.free();
            }
        }
    }

    /** X11 when only an X display is named (no noisy Wayland probe first), else GLFW's own choice. */
    private static int platform() {
        boolean wayland = System.getenv("WAYLAND_DISPLAY") != null;
        boolean x11 = System.getenv("DISPLAY") != null;
        return x11 && !wayland ? GLFW_PLATFORM_X11 : GLFW_ANY_PLATFORM;
    }

    private String loop() {
        while (!glfwWindowShouldClose(window)) {
            if (dirty) {
                draw();
                dirty = false;
            }
            glfwWaitEvents();
        }
        return "";
    }

    private String measure(int frames) {
        draw();  // the first frame compiles shaders and uploads: not counted
        glFinish();
        long start = System.nanoTime();
        for (int k = 0; k < frames && !glfwWindowShouldClose(window); k++) {
            session.apply(new ViewerAction.Orbit(Math.toRadians(2), 0));
            draw();
            glfwPollEvents();
        }
        glFinish();
        double seconds = (System.nanoTime() - start) / 1e9;
        return String.format(Locale.ROOT, "view: %d frames in %.2f s, %.1f frames per second (%d x %d px, %d members; %s)",
                frames, seconds, frames / seconds, session.width(), session.height(), data.frame().members().size(),
                HeadlessContext.describe("window"));
    }

    private void draw() {
        renderer.draw(session.scene(), session.camera(), session.width(), session.height());
        glfwSwapBuffers(window);
    }

    private void act(Optional<ViewerAction> action) {
        action.ifPresent(a -> {
            if (a instanceof ViewerAction.Close) {
                glfwSetWindowShouldClose(window, true);
            } else if (a instanceof ViewerAction.Snapshot) {
                snapshot();
            } else if (session.apply(a)) {
                dirty = true;
            }
        });
    }

    private void snapshot() {
        BufferedImage image;
        try (OffscreenTarget target = new OffscreenTarget(session.width(), session.height(), PictureRenderer.SAMPLES)) {
            renderer.draw(session.scene(), session.camera(), session.width(), session.height());
            image = target.read();
        }
        snapshots.accept(image);
        dirty = true;
    }

    private void installCallbacks() {
        glfwSetKeyCallback(window, (w, key, scancode, action, mods) -> {
            if (action != GLFW_RELEASE) {
                act(input.key(key, mods));
            }
        });
        glfwSetMouseButtonCallback(window, (w, button, action, mods) -> {
            double[] xy = cursor();
            if (action == GLFW_PRESS) {
                input.press(button, mods, xy[0], xy[1]);
            } else {
                act(input.release(button, xy[0], xy[1]));
            }
        });
        glfwSetCursorPosCallback(window, (w, x, y) -> act(input.move(x * cursorScale, y * cursorScale)));
        glfwSetScrollCallback(window, (w, dx, dy) -> act(input.scroll(dy)));
        glfwSetFramebufferSizeCallback(window, (w, fw, fh) -> {
            session.resize(fw, fh);
            updateCursorScale();
            dirty = true;
        });
        glfwSetWindowRefreshCallback(window, w -> dirty = true);
    }

    private double[] cursor() {
        try (MemoryStack stack = MemoryStack.stackPush()) {
            var x = stack.mallocDouble(1);
            var y = stack.mallocDouble(1);
            glfwGetCursorPos(window, x, y);
            return new double[] {x.get(0) * cursorScale, y.get(0) * cursorScale};
        }
    }

    private int[] framebufferSize() {
        try (MemoryStack stack = MemoryStack.stackPush()) {
            var w = stack.mallocInt(1);
            var h = stack.mallocInt(1);
            glfwGetFramebufferSize(window, w, h);
            return new int[] {w.get(0), h.get(0)};
        }
    }

    /** Cursor positions come in window units; the viewport is in framebuffer pixels (differs on HiDPI). */
    private void updateCursorScale() {
        try (MemoryStack stack = MemoryStack.stackPush()) {
            var w = stack.mallocInt(1);
            var h = stack.mallocInt(1);
            glfwGetWindowSize(window, w, h);
            int[] fb = framebufferSize();
            cursorScale = w.get(0) > 0 ? (double) fb[0] / w.get(0) : 1;
        }
    }
}
