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

    /** In a corner of the image, {@code inset} reference px from both edges. */
    record AtCorner(Corner corner, double inset) implements LabelAnchor {
        public AtCorner {
            Objects.requireNonNull(corner, "corner");
        }
    }
}
