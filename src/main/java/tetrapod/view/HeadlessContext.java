package tetrapod.view;

import static org.lwjgl.glfw.GLFW.*;
import static org.lwjgl.opengl.GL33C.*;
import static org.lwjgl.system.MemoryUtil.NULL;

import java.util.Locale;
import org.lwjgl.glfw.GLFWErrorCallback;
import org.lwjgl.opengl.GL;
import org.lwjgl.system.Configuration;

/**
 * An OpenGL 3.3 core context with no display: GLFW's null platform and an EGL or OSMesa context
 * on a hidden 64 × 64 window, drawn into through framebuffer objects. LWJGL is initialised
 * explicitly for the chosen context API, and everything is torn down on close, so that another
 * route can be tried in the same JVM. One at a time per process (GLFW is process-wide).
 */
final class HeadlessContext implements AutoCloseable {

    /** A route that could not give a context; the message says why, with GLFW's own text. */
    static final class Unavailable extends Exception {
        private static final long serialVersionUID = 1L;

        Unavailable(String message, Throwable cause) {
            super(message, cause);
        }
    }

    private final RenderRoute route;
    private final GlfwErrors errors;
    private final GLFWErrorCallback previous;
    private boolean glCreated;
    private boolean glfwStarted;
    private long window = NULL;

    private HeadlessContext(RenderRoute route) {
        this.route = route;
        this.errors = new GlfwErrors();
        this.previous = glfwSetErrorCallback(errors);
    }

    /** A current context by {@code route} (EGL or OSMESA). */
    static HeadlessContext open(RenderRoute route) throws Unavailable {
        if (route == RenderRoute.JAVA2D) {
            throw new IllegalArgumentException("Java2D is not an OpenGL route");
        }
        HeadlessContext c = null;
        try {
            c = new HeadlessContext(route);
            c.start();
            return c;
        } catch (Exception | LinkageError e) {
            String glfw = c == null ? "" : c.errors.text();
            if (c != null) {
                c.close();
            }
            String why = glfw.isEmpty() ? String.valueOf(e.getMessage()) : glfw;
            throw new Unavailable(name(route) + ": " + why, e);
        }
    }

    private void start() {
        Configuration.OPENGL_EXPLICIT_INIT.set(true);
        Configuration.OPENGL_CONTEXT_API.set(route == RenderRoute.EGL ? "EGL" : "OSMesa");
        try {
            GL.create();
        } catch (IllegalStateException e) {
            throw new IllegalStateException("cannot load " + (route == RenderRoute.EGL ? "libEGL" : "libOSMesa")
                    + " (" + e.getMessage() + ")", e);
        }
        glCreated = true;
        glfwInitHint(GLFW_PLATFORM, GLFW_PLATFORM_NULL);
        if (!glfwInit()) {
            throw new IllegalStateException("GLFW could not start its null platform");
        }
        glfwStarted = true;
        glfwDefaultWindowHints();
        glfwWindowHint(GLFW_VISIBLE, GLFW_FALSE);
        glfwWindowHint(GLFW_CONTEXT_CREATION_API,
                route == RenderRoute.EGL ? GLFW_EGL_CONTEXT_API : GLFW_OSMESA_CONTEXT_API);
        glfwWindowHint(GLFW_CLIENT_API, GLFW_OPENGL_API);
        glfwWindowHint(GLFW_CONTEXT_VERSION_MAJOR, 3);
        glfwWindowHint(GLFW_CONTEXT_VERSION_MINOR, 3);
        glfwWindowHint(GLFW_OPENGL_PROFILE, GLFW_OPENGL_CORE_PROFILE);
        window = glfwCreateWindow(64, 64, "tetrapod", NULL, NULL);
        if (window == NULL) {
            throw new IllegalStateException("GLFW could not make a window");
        }
        glfwMakeContextCurrent(window);
        GL.createCapabilities();
    }

    RenderRoute route() {
        return route;
    }

    /** E.g. "OpenGL 4.5 llvmpipe (software, EGL)". */
    String describe() {
        return describe(route == RenderRoute.EGL ? "EGL" : "OSMesa");
    }

    /** What the current context is, for the one line that says which route drew the image. */
    static String describe(String api) {
        String renderer = String.valueOf(glGetString(GL_RENDERER));
        int paren = renderer.indexOf(" (");
        String shortName = paren > 0 ? renderer.substring(0, paren) : renderer;
        String lower = renderer.toLowerCase(Locale.ROOT);
        boolean software = lower.contains("llvmpipe") || lower.contains("softpipe") || lower.contains("swrast")
                || lower.contains("swiftshader");
        return String.format(Locale.ROOT, "OpenGL %d.%d %s (%s%s)", glGetInteger(GL_MAJOR_VERSION),
                glGetInteger(GL_MINOR_VERSION), shortName, software ? "software, " : "", api);
    }

    static String name(RenderRoute route) {
        return route == RenderRoute.EGL ? "EGL" : "OSMesa";
    }

    @Override
    public void close() {
        if (glCreated) {
            GL.setCapabilities(null);
        }
        if (window != NULL) {
            glfwMakeContextCurrent(NULL);
            glfwDestroyWindow(window);
            window = NULL;
        }
        if (glfwStarted) {
            glfwTerminate();
            glfwStarted = false;
        }
        if (glCreated) {
            GL.destroy();
            glCreated = false;
        }
        // leave LWJGL as an ordinary program finds it (the window initialises it implicitly)
        Configuration.OPENGL_CONTEXT_API.set(null);
        Configuration.OPENGL_EXPLICIT_INIT.set(null);
        GLFWErrorCallback mine = glfwSetErrorCallback(previous);
        if (mine != null) {
            mine.free();
        }
    }
}
