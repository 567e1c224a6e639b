package tetrapod.view;

/** Ways to draw an image without a display, tried in this order by default. */
public enum RenderRoute {
    /** OpenGL through GLFW's null platform with an EGL context (Mesa's surfaceless EGL, or a GPU's). */
    EGL,
    /** OpenGL through GLFW's null platform with an OSMesa context (Mesa's off-screen software renderer). */
    OSMESA,
    /** No OpenGL: the same scene drawn by Java2D. */
    JAVA2D
}
