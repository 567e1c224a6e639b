package tetrapod.view;

import java.util.List;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Node;
import tetrapod.model.Vec3;

/** The tower's ancillaries as simple shapes: a ring round the tower for a point item, a bar up a face for a linear one. */
final class AncillaryGlyphs {

    static final Rgb COLOUR = Rgb.hex(0x8A5A2B);
    static final double WIDTH = 3.2;
    /** Steps of a linear item's bar, so that it follows the tower's taper. */
    private static final int STEPS = 12;

    private AncillaryGlyphs() { }

    /**
     * Adds each item's shape to {@code out} and its name to {@code labels}.
     *
     * @param clearance how far outside the tower's outline the shapes are drawn, m
     */
    static void add(SegmentInstances.Builder out, List<SceneLabel> labels, Frame frame, List<ViewAncillary> items,
                    double clearance) {
        Bounds all = Bounds.of(frame.nodes().stream().map(Node::position).toList());
        double cx = all.centre().x();
        double cy = all.centre().y();
        for (ViewAncillary a : items) {
            if (a.isPoint()) {
                double[] h = halfWidths(frame, a.zFrom(), cx, cy);
                double hx = h[0] + clearance;
                double hy = h[1] + clearance;
                double z = a.zFrom();
                Vec3[] c = {new Vec3(cx - hx, cy - hy, z), new Vec3(cx + hx, cy - hy, z), new Vec3(cx + hx, cy + hy, z),
                    new Vec3(cx - hx, cy + hy, z)};
                for (int k = 0; k < 4; k++) {
                    out.add(c[k], c[(k + 1) % 4], COLOUR, WIDTH, WIDTH, false);
                }
                labels.add(new SceneLabel(a.name(), LabelStyle.HELP,
                        new LabelAnchor.AtPoint(c[1], 8, 0, LabelAnchor.Align.LEFT)));
            } else {
                Vec3 previous = null;
                for (int k = 0; k <= STEPS; k++) {
                    double z = a.zFrom() + (a.zTo() - a.zFrom()) * k / STEPS;
                    Vec3 p = onFace(a.face(), halfWidths(frame, z, cx, cy), cx, cy, z, clearance);
                    if (previous != null) {
                        out.add(previous, p, COLOUR, WIDTH, WIDTH, false);
                    }
                    previous = p;
                }
                labels.add(new SceneLabel(a.name(), LabelStyle.HELP, new LabelAnchor.AtPoint(
                        onFace(a.face(), halfWidths(frame, a.zTo(), cx, cy), cx, cy, a.zTo(), clearance), 8, 0,
                        LabelAnchor.Align.LEFT)));
            }
        }
    }

    private static Vec3 onFace(Face face, double[] half, double cx, double cy, double z, double clearance) {
        return switch (face) {
            case X_PLUS -> new Vec3(cx + half[0] + clearance, cy, z);
            case X_MINUS -> new Vec3(cx - half[0] - clearance, cy, z);
            case Y_PLUS -> new Vec3(cx, cy + half[1] + clearance, z);
            case Y_MINUS, NONE -> new Vec3(cx, cy - half[1] - clearance, z);
        };
    }

    /**
     * Half the tower's width in x and in y at height {@code z}: of the nodes at the two node
     * levels round z, interpolated linearly between them (the outline of a tapering tower).
     */
    static double[] halfWidths(Frame frame, double z, double cx, double cy) {
        double below = Double.NEGATIVE_INFINITY;
        double above = Double.POSITIVE_INFINITY;
        for (Node n : frame.nodes()) {
            double nz = n.position().z();
            if (nz <= z && nz > below) {
                below = nz;
            }
            if (nz >= z && nz < above) {
                above = nz;
            }
        }
        if (below == Double.NEGATIVE_INFINITY) {
            below = above;
        }
        if (above == Double.POSITIVE_INFINITY) {
            above = below;
        }
        double[] lo = extent(frame, below, cx, cy);
        double[] hi = extent(frame, above, cx, cy);
        double t = above > below ? (z - below) / (above - below) : 0;
        return new double[] {lo[0] + t * (hi[0] - lo[0]), lo[1] + t * (hi[1] - lo[1])};
    }

    private static double[] extent(Frame frame, double level, double cx, double cy) {
        double hx = 0;
        double hy = 0;
        for (Node n : frame.nodes()) {
            if (Math.abs(n.position().z() - level) < 1e-9) {
                hx = Math.max(hx, Math.abs(n.position().x() - cx));
                hy = Math.max(hy, Math.abs(n.position().y() - cy));
            }
        }
        return new double[] {hx, hy};
    }
}
