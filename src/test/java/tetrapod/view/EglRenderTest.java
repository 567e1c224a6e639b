package tetrapod.view;

import org.junit.jupiter.api.extension.RegisterExtension;
import tetrapod.testing.NativeRequirement;

/** The render contract through OpenGL: GLFW's null platform with Mesa's surfaceless EGL (CI installs Mesa). */
class EglRenderTest extends RenderContract {

    @RegisterExtension
    static final NativeRequirement EGL = openGl(RenderRoute.EGL, "libegl1 libegl-mesa0 libgl1-mesa-dri");

    @Override
    RenderRoute route() {
        return RenderRoute.EGL;
    }
}
