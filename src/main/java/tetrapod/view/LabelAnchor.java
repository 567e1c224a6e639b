package tetrapod.view;

import java.util.Objects;
import tetrapod.model.Vec3;

/** Where a label goes on the image. Offsets in reference px (see the package conventions). */
public sealed interface LabelAnchor {

    enum Align { LEFT, CENTRE, RIGHT }

    enum Corner { TOP_LEFT, TOP_RIGHT, BOTTOM_LEFT, BOTTOM_RIGHT, RIGHT_MIDDLE }

    /** Beside a world point: the label's {@code align} side (vertically its middle) at the point + offset. */
    record AtPoint(Vec3 point, double dx, double dy, Align align) implements LabelAnchor {
        public AtPoint {
            Objects.requireNonNull(point, "point");
            Objects.requireNonNull(align, "align");
        }
    }

    /**
     * At the corner or side of the image farthest from the tower's projected bounding box,
     * {@code inset} reference px from the edges ({@link InfoBoxPlacement}).
     */
    record AwayFromTower(double inset) implements LabelAnchor { }

    /**
     * In a corner of the image, {@code inset} reference px from both edges; labels in the same corner
     * stack (in a bottom corner the later one goes above, in a top corner below).
     */
    record AtCorner(Corner corner, double inset) implements LabelAnchor {
        public AtCorner {
            Objects.requireNonNull(corner, "corner");
        }
    }
}
