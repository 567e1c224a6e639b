package tetrapod.view;

import org.junit.jupiter.api.extension.RegisterExtension;
import tetrapod.testing.NativeRequirement;

/** The render contract through OpenGL: GLFW's null platform with an OSMesa context (CI installs libosmesa6). */
class OsMesaRenderTest extends RenderContract {

    @RegisterExtension
    static final NativeRequirement OSMESA = openGl(RenderRoute.OSMESA, "libosmesa6");

    @Override
    RenderRoute route() {
        return RenderRoute.OSMESA;
    }
}
