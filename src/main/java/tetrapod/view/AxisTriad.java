package tetrapod.view;

import java.util.ArrayList;
import java.util.List;
import tetrapod.model.Vec3;

/**
 * The x, y, z directions in a small square inset at the top right of the window, seen from the
 * main camera's direction (yaw and pitch) but never zoomed or panned, so that orbiting turns it and
 * nothing moves it off screen. Arrows of unit length from the origin; widths in reference px of
 * the inset (1000 per inset height), so that both renderers draw it alike. Pure Java.
 */
public final class AxisTriad {

    /** The inset's side as a fraction of the window height. */
    static final double SIZE = 0.16;
    /** Smallest side, px. */
    static final int MIN_SIDE = 48;
    /** Distance from the window's top and right edges, reference px. */
    static final double INSET = 12;
    /** The inset camera's distance from the origin in arrow lengths: arrows and labels fit with room. */
    static final double EYE_DISTANCE = 6;
    static final double SHAFT_WIDTH = 24;
    static final double HEAD_WIDTH = 90;
    static final double HEAD_LENGTH = 0.3;

    private static final Vec3[] DIRECTIONS = {Vec3.X, Vec3.Y, Vec3.Z};
    private static final Rgb[] COLOURS = {GroundDecorations.AXIS_X, GroundDecorations.AXIS_Y, GroundDecorations.AXIS_Z};
    private static final String[] NAMES = {"x", "y", "z"};

    private AxisTriad() { }

    /** The inset's square on a {@code width} × {@code height} window, px, y down. */
    public static ScreenRect viewport(int width, int height) {
        int side = Math.max(MIN_SIDE, (int) Math.round(SIZE * height));
        double inset = Math.round(INSET * height / 1000.0);
        return ScreenRect.at(width - inset - side, inset, side, side);
    }

    /** The inset's camera: the main camera's direction, looking at the origin from a fixed distance. */
    public static Camera camera(Camera main) {
        return new Camera(Vec3.ZERO, main.yaw(), main.pitch(), EYE_DISTANCE, Camera.DEFAULT_FOV_Y, 2);
    }

    /** The three arrows, from the origin, one unit long. */
    public static SegmentInstances segments() {
        SegmentInstances.Builder out = SegmentInstances.builder(6);
        for (int k = 0; k < 3; k++) {
            Vec3 neck = DIRECTIONS[k].times(1 - HEAD_LENGTH);
            out.add(Vec3.ZERO, neck, COLOURS[k], SHAFT_WIDTH, SHAFT_WIDTH, false);
            out.add(neck, DIRECTIONS[k], COLOURS[k], HEAD_WIDTH, 0, false);
        }
        return out.build();
    }

    /** The projector of the inset for {@code main}. */
    static Projector projector(Camera main, ScreenRect viewport) {
        int side = (int) viewport.width();
        return new Projector(camera(main), side, side);
    }

    /**
     * The x, y, z labels placed on the window: beyond each arrow's projected tip, pushed out from the
     * origin by half the label's diagonal so that a foreshortened arrow's label clears the others.
     */
    static List<PlacedImage> labels(Camera main, int width, int height, LabelPainter painter) {
        ScreenRect v = viewport(width, height);
        Projector p = projector(main, v);
        List<PlacedImage> out = new ArrayList<>();
        double[] o = new double[4];
        double[] xy = new double[4];
        p.project(0, 0, 0, o);
        for (int k = 0; k < 3; k++) {
            Vec3 tip = DIRECTIONS[k];
            if (!p.project(tip.x(), tip.y(), tip.z(), xy)) {
                continue;
            }
            var image = painter.text(NAMES[k], LabelStyle.AXIS);
            double dx = xy[0] - o[0];
            double dy = xy[1] - o[1];
            double length = Math.hypot(dx, dy);
            double push = 0.5 * Math.hypot(image.getWidth(), image.getHeight()) + 2;
            double ux = length > 1e-6 ? dx / length : Math.sqrt(0.5);
            double uy = length > 1e-6 ? dy / length : -Math.sqrt(0.5);  // an arrow end-on: label up and right
            double cx = o[0] + ux * (length + push);
            double cy = o[1] + uy * (length + push);
            out.add(new PlacedImage(image, (int) Math.round(v.x0() + cx - image.getWidth() / 2.0),
                    (int) Math.round(v.y0() + cy - image.getHeight() / 2.0)));
        }
        return out;
    }
}
