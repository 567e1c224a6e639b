package tetrapod.view;

/**
 * The screen quad of one segment instance, computed exactly as shaders/segment.vert computes it:
 * the ends projected, widened perpendicular to the projected direction by half their widths and,
 * with caps, lengthened by half a width at each end. For the software renderer and the tests.
 */
final class SegmentQuad {

    /** Corners in drawing order around the quad: start−, start+, end+, end− (x, y pairs, px). */
    final double[] corners = new double[8];
    /** Depth of the start and the end, [-1, 1]. */
    double startDepth;
    double endDepth;
    private final double[] a = new double[4];
    private final double[] b = new double[4];

    /** Computes the quad of instance {@code k}; false when an end is behind the eye (not drawn). */
    boolean compute(Projector projector, SegmentInstances segments, int k) {
        var s = segments.start(k);
        var e = segments.end(k);
        if (!projector.project(s.x(), s.y(), s.z(), a) || !projector.project(e.x(), e.y(), e.z(), b)) {
            return false;
        }
        double dx = b[0] - a[0];
        double dy = b[1] - a[1];
        double len = Math.hypot(dx, dy);
        double ux = len > 1e-6 ? dx / len : 1;
        double uy = len > 1e-6 ? dy / len : 0;
        double nx = -uy;
        double ny = ux;
        double w0 = projector.pixels(segments.startWidth(k)) / 2;
        double w1 = projector.pixels(segments.endWidth(k)) / 2;
        double c0 = segments.caps(k) ? w0 : 0;
        double c1 = segments.caps(k) ? w1 : 0;
        double sx = a[0] - ux * c0;
        double sy = a[1] - uy * c0;
        double ex = b[0] + ux * c1;
        double ey = b[1] + uy * c1;
        corners[0] = sx - nx * w0;
        corners[1] = sy - ny * w0;
        corners[2] = sx + nx * w0;
        corners[3] = sy + ny * w0;
        corners[4] = ex + nx * w1;
        corners[5] = ey + ny * w1;
        corners[6] = ex - nx * w1;
        corners[7] = ey - ny * w1;
        startDepth = a[2];
        endDepth = b[2];
        return true;
    }
}
