package tetrapod.view;

import java.awt.image.BufferedImage;
import java.util.Objects;

/**
 * A drawn image, the camera it was seen with (so that its pixels can be related to the model), the
 * route that drew it, and one line saying so for people, e.g.
 * {@code render: OpenGL 4.5 llvmpipe (software, EGL)}.
 */
public record Picture(BufferedImage image, Scene scene, Camera camera, RenderRoute route, String routeLine) {
    public Picture {
        Objects.requireNonNull(image, "image");
        Objects.requireNonNull(scene, "scene");
        Objects.requireNonNull(camera, "camera");
        Objects.requireNonNull(route, "route");
        Objects.requireNonNull(routeLine, "routeLine");
    }
}
