package tetrapod.view;

/** The render contract through OpenGL: GLFW's null platform with Mesa's surfaceless EGL (CI installs Mesa). */
class EglRenderTest extends RenderContract {
    @Override
    RenderRoute route() {
        return RenderRoute.EGL;
    }
}
