package tetrapod.view;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;

/** Where the scene's labels and legend go on the image for one camera; shared by both renderers. */
final class OverlayLayout {

    private static final double LEGEND_INSET = 16;

    private OverlayLayout() { }

    static List<PlacedImage> place(Scene scene, Projector projector, LabelPainter painter) {
        List<PlacedImage> placed = new ArrayList<>();
        double s = painter.scale();
        double[] p = new double[4];
        for (SceneLabel label : scene.labels()) {
            BufferedImage image = painter.text(label.text(), label.style());
            int w = image.getWidth();
            int h = image.getHeight();
            if (label.anchor() instanceof LabelAnchor.AtPoint at) {
                if (!projector.project(at.point().x(), at.point().y(), at.point().z(), p)) {
                    continue;
                }
                double x = p[0] + at.dx() * s;
                double y = p[1] + at.dy() * s - h / 2.0;
                x -= switch (at.align()) {
                    case LEFT -> 0;
                    case CENTRE -> w / 2.0;
                    case RIGHT -> w;
                };
                placed.add(new PlacedImage(image, (int) Math.round(x), (int) Math.round(y)));
            } else if (label.anchor() instanceof LabelAnchor.AtCorner at) {
                placed.add(corner(image, at.corner(), at.inset() * s, projector));
            }
        }
        scene.legend().ifPresent(legend -> placed.add(
                corner(painter.legend(legend), LabelAnchor.Corner.RIGHT_MIDDLE, LEGEND_INSET * s, projector)));
        return placed;
    }

    private static PlacedImage corner(BufferedImage image, LabelAnchor.Corner corner, double inset, Projector p) {
        int i = (int) Math.round(inset);
        int right = p.width() - image.getWidth() - i;
        int bottom = p.height() - image.getHeight() - i;
        return switch (corner) {
            case TOP_LEFT -> new PlacedImage(image, i, i);
            case TOP_RIGHT -> new PlacedImage(image, right, i);
            case BOTTOM_LEFT -> new PlacedImage(image, i, bottom);
            case BOTTOM_RIGHT -> new PlacedImage(image, right, bottom);
            case RIGHT_MIDDLE -> new PlacedImage(image, right, (p.height() - image.getHeight()) / 2);
        };
    }
}
