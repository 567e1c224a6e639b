package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The render contract through the built-in Java2D renderer, used when there is no OpenGL at all. */
class Java2dRenderTest extends RenderContract {
    @Override
    RenderRoute route() {
        return RenderRoute.JAVA2D;
    }

    @Test
    void itSaysWhichRouteDrewTheImage() {
        ViewData data = ViewFixtures.utilisation(frame, 0.3, 0, 0.3);
        Picture p = PictureRenderer.render(data, new RenderRequest(64, 48, SceneOptions.defaults(data), List.of(route())));
        assertEquals("render: built-in 2D renderer (Java2D)", p.routeLine());
        assertEquals("render: no OpenGL found (EGL: 0x10006 EGL: Library not found), used the built-in 2D renderer",
                PictureRenderer.fallbackLine(List.of("EGL: 0x10006 EGL: Library not found")));
    }
}
