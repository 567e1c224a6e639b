package tetrapod.view;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Where the scene's labels and legend go on the image for one camera; shared by both renderers.
 * Corner labels (stacked when they share a corner) and the legend are placed first, then the axis
 * triad's labels, then the info box away from the tower, then the labels at points: axis and wind
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
        int gap = (int) Math.ceil(GAP * s);
        Map<LabelAnchor.Corner, Integer> stacked = new EnumMap<>(LabelAnchor.Corner.class);
        for (SceneLabel label : scene.labels()) {
            if (label.anchor() instanceof LabelAnchor.AtCorner at) {
                BufferedImage image = painter.text(label.text(), label.style());
                int offset = stacked.getOrDefault(at.corner(), 0);
                placed.add(corner(image, at.corner(), at.inset() * s, offset, projector));
                stacked.put(at.corner(), offset + image.getHeight() + gap);
            }
        }
        scene.legend().ifPresent(legend -> placed.add(
                corner(painter.legend(legend), LabelAnchor.Corner.RIGHT_MIDDLE, LEGEND_INSET * s, 0, projector)));
        List<ScreenRect> taken = new ArrayList<>();
        for (PlacedImage p : placed) {
            taken.add(rect(p));
        }
        if (scene.axisTriad()) {
            Camera camera = projector.camera();
            taken.add(AxisTriad.viewport(projector.width(), projector.height()));
            placed.addAll(AxisTriad.labels(camera, projector.width(), projector.height(), painter));
        }
        for (SceneLabel label : scene.labels()) {
            if (label.anchor() instanceof LabelAnchor.AwayFromTower away) {
                BufferedImage image = painter.text(label.text(), label.style());
                ScreenRect tower = InfoBoxPlacement.towerBounds(scene.members(), projector)
                        .orElse(ScreenRect.at(projector.width() / 2.0, projector.height() / 2.0, 0, 0));
                ScreenRect r = InfoBoxPlacement.place(projector.width(), projector.height(), image.getWidth(),
                        image.getHeight(), tower, taken, away.inset() * s);
                PlacedImage p = new PlacedImage(image, (int) Math.round(r.x0()), (int) Math.round(r.y0()));
                placed.add(p);
                taken.add(rect(p));
            }
        }
        for (boolean reactions : new boolean[] {false, true}) {
            for (SceneLabel label : scene.labels()) {
                if (label.anchor() instanceof LabelAnchor.AtPoint at && (label.style() == LabelStyle.REACTION) == reactions) {
                    PlacedImage p = atPoint(painter.text(label.text(), label.style()), at, projector, s);
                    if (p != null) {
                        placed.add(free(p, placed, gap, projector.height()));
                    }
                }
            }
        }
        return placed;
    }

    static ScreenRect rect(PlacedImage p) {
        return ScreenRect.at(p.x(), p.y(), p.image().getWidth(), p.image().getHeight());
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

    /**
     * {@code p}, or {@code p} moved up or down to the nearest place on an image {@code height} px
     * high where it is whole and covers none of {@code placed}; where there is none, {@code p}.
     */
    private static PlacedImage free(PlacedImage p, List<PlacedImage> placed, int gap, int height) {
        int step = p.image().getHeight() / 2 + gap;
        for (int k = 0; k <= 2 * MAX_SHIFTS; k++) {
            int dy = (k % 2 == 0 ? 1 : -1) * ((k + 1) / 2) * step;
            PlacedImage moved = new PlacedImage(p.image(), p.x(), p.y() + dy);
            boolean whole = moved.y() >= 0 && moved.y() + moved.image().getHeight() <= height;
            if (whole && placed.stream().noneMatch(q -> overlap(moved, q, gap))) {
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

    /** In {@code corner}, moved {@code offset} px away from the edge it stacks from (up at the bottom, down at the top). */
    private static PlacedImage corner(BufferedImage image, LabelAnchor.Corner corner, double inset, int offset,
                                      Projector p) {
        int i = (int) Math.round(inset);
        int right = p.width() - image.getWidth() - i;
        int bottom = p.height() - image.getHeight() - i - offset;
        int top = i + offset;
        return switch (corner) {
            case TOP_LEFT -> new PlacedImage(image, i, top);
            case TOP_RIGHT -> new PlacedImage(image, right, top);
            case BOTTOM_LEFT -> new PlacedImage(image, i, bottom);
            case BOTTOM_RIGHT -> new PlacedImage(image, right, bottom);
            case RIGHT_MIDDLE -> new PlacedImage(image, right, (p.height() - image.getHeight()) / 2);
        };
    }
}
