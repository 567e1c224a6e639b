package tetrapod.view;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;

/**
 * Where the scene's labels and legend go on the image for one camera; shared by both renderers.
 * Corner labels and the legend are placed first, then the labels at points: axis and wind
 * labels, then the reaction labels; a label at a point that would cover one already placed is
 * moved up or down, by its own height at a time, to the nearest free place.
 */
final class OverlayLayout {

    private static final double LEGEND_INSET = 16;

    private OverlayLayout() { }

    /** How far a label may be moved to a free place, in its own heights either way. */
    private static final int MAX_SHIFTS = 8;
    /** Clear space kept between labels, reference px. */
    private static final double GAP = 2;

    static List<PlacedImage> place(Scene scene, Projector projector, LabelPainter painter) {
        List<PlacedImage> placed = new ArrayList<>();
        double s = painter.scale();
        for (SceneLabel label : scene.labels()) {
            if (label.anchor() instanceof LabelAnchor.AtCorner at) {
                placed.add(corner(painter.text(label.text(), label.style()), at.corner(), at.inset() * s, projector));
            }
        }
        scene.legend().ifPresent(legend -> placed.add(
                corner(painter.legend(legend), LabelAnchor.Corner.RIGHT_MIDDLE, LEGEND_INSET * s, projector)));
        int gap = (int) Math.ceil(GAP * s);
        for (boolean reactions : new boolean[] {false, true}) {
            for (SceneLabel label : scene.labels()) {
                if (label.anchor() instanceof LabelAnchor.AtPoint at && (label.style() == LabelStyle.REACTION) == reactions) {
                    PlacedImage p = atPoint(painter.text(label.text(), label.style()), at, projector, s);
                    if (p != null) {
                        placed.add(free(p, placed, gap));
                    }
                }
            }
        }
        return placed;
    }

    private static PlacedImage atPoint(BufferedImage image, LabelAnchor.AtPoint at, Projector projector, double s) {
        double[] p = new double[4];
        if (!projector.project(at.point().x(), at.point().y(), at.point().z(), p)) {
            return null;
        }
        int w = image.getWidth();
        double x = p[0] + at.dx() * s;
        double y = p[1] + at.dy() * s - image.getHeight() / 2.0;
        x -= switch (at.align()) {
            case LEFT -> 0;
            case CENTRE -> w / 2.0;
            case RIGHT -> w;
        };
        return new PlacedImage(image, (int) Math.round(x), (int) Math.round(y));
    }

    /** {@code p}, or {@code p} moved up or down to the nearest place where it covers none of {@code placed}. */
    private static PlacedImage free(PlacedImage p, List<PlacedImage> placed, int gap) {
        int step = p.image().getHeight() / 2 + gap;
        for (int k = 0; k <= 2 * MAX_SHIFTS; k++) {
            int dy = (k % 2 == 0 ? 1 : -1) * ((k + 1) / 2) * step;
            PlacedImage moved = new PlacedImage(p.image(), p.x(), p.y() + dy);
            if (placed.stream().noneMatch(q -> overlap(moved, q, gap))) {
                return moved;
            }
        }
        return p;
    }

    /** Whether two placed images come closer than {@code gap} px. */
    static boolean overlap(PlacedImage a, PlacedImage b, int gap) {
        return a.x() < b.x() + b.image().getWidth() + gap && b.x() < a.x() + a.image().getWidth() + gap
                && a.y() < b.y() + b.image().getHeight() + gap && b.y() < a.y() + a.image().getHeight() + gap;
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
