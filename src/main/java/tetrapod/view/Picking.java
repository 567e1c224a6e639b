package tetrapod.view;

import java.util.OptionalInt;

/**
 * Which member is under a pixel: every member segment projected with the camera that drew it,
 * the nearest within its half width plus a tolerance; when several are as near, the one nearest
 * the eye. Pure Java, the same projection as the shaders.
 */
public final class Picking {

    /** Pixels of slack beyond a member's drawn half width. */
    public static final double TOLERANCE_PX = 4;
    /** Distances closer than this (px) count as equal and the depth decides. */
    private static final double SAME_DISTANCE_PX = 0.75;

    private Picking() { }

    /** The index of the member of {@code scene} at image pixel ({@code x}, {@code y}), or empty. */
    public static OptionalInt memberAt(Scene scene, Projector projector, double x, double y) {
        SegmentInstances members = scene.members();
        double[] a = new double[4];
        double[] b = new double[4];
        int best = -1;
        double bestDistance = Double.MAX_VALUE;
        double bestDepth = Double.MAX_VALUE;
        for (int k = 0; k < members.count(); k++) {
            var s = members.start(k);
            var e = members.end(k);
            if (!projector.project(s.x(), s.y(), s.z(), a) || !projector.project(e.x(), e.y(), e.z(), b)) {
                continue;
            }
            double dx = b[0] - a[0];
            double dy = b[1] - a[1];
            double lengthSquared = dx * dx + dy * dy;
            double t = lengthSquared > 0 ? ((x - a[0]) * dx + (y - a[1]) * dy) / lengthSquared : 0;
            t = Math.max(0, Math.min(1, t));
            double distance = Math.hypot(x - (a[0] + t * dx), y - (a[1] + t * dy));
            double reach = projector.pixels(Math.max(members.startWidth(k), members.endWidth(k))) / 2 + TOLERANCE_PX;
            if (distance > reach) {
                continue;
            }
            double depth = a[2] + t * (b[2] - a[2]);
            boolean nearer = distance < bestDistance - SAME_DISTANCE_PX
                    || (distance <= bestDistance + SAME_DISTANCE_PX && depth < bestDepth);
            if (nearer) {
                best = k;
                bestDistance = distance;
                bestDepth = depth;
            }
        }
        return best < 0 ? OptionalInt.empty() : OptionalInt.of(best);
    }
}
