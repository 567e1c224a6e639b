package tetrapod.view;

import java.util.List;
import java.util.Objects;

/**
 * An image to draw: its size in px, what to show, and the routes to try in order.
 *
 * @param routes tried in order until one draws; normally {@link #ALL_ROUTES}
 */
public record RenderRequest(int width, int height, SceneOptions options, List<RenderRoute> routes) {

    public static final List<RenderRoute> ALL_ROUTES = List.of(RenderRoute.EGL, RenderRoute.OSMESA, RenderRoute.JAVA2D);
    public static final int MAX_SIDE = 8192;

    public RenderRequest {
        Objects.requireNonNull(options, "options");
        routes = List.copyOf(routes);
        if (routes.isEmpty()) {
            throw new IllegalArgumentException("no render route to try");
        }
        if (width < 16 || height < 16 || width > MAX_SIDE || height > MAX_SIDE) {
            throw new IllegalArgumentException("image size must be 16 to " + MAX_SIDE + " px each way, was "
                    + width + " x " + height);
        }
    }

    /** A {@code width} × {@code height} image of {@code data}'s first case, every route tried. */
    public static RenderRequest of(ViewData data, int width, int height) {
        return new RenderRequest(width, height, SceneOptions.defaults(data), ALL_ROUTES);
    }

    public RenderRequest withOptions(SceneOptions o) {
        return new RenderRequest(width, height, o, routes);
    }

    public RenderRequest withRoutes(List<RenderRoute> r) {
        return new RenderRequest(width, height, options, r);
    }
}
