package tetrapod.view;

/** The render contract through OpenGL: GLFW's null platform with an OSMesa context (CI installs libosmesa6). */
class OsMesaRenderTest extends RenderContract {
    @Override
    RenderRoute route() {
        return RenderRoute.OSMESA;
    }
}
