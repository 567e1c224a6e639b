package tetrapod.view;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import tetrapod.model.Vec3;

/** An axis-aligned box in world space, m. */
public record Bounds(Vec3 min, Vec3 max) {

    public Bounds {
        if (min.x() > max.x() || min.y() > max.y() || min.z() > max.z()) {
            throw new IllegalArgumentException("bounds min " + min + " above max " + max);
        }
    }

    /** The smallest box holding every point (at least one). */
    public static Bounds of(Collection<Vec3> points) {
        if (points.isEmpty()) {
            throw new IllegalArgumentException("bounds of no points");
        }
        double[] lo = {Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE};
        double[] hi = {-Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        for (Vec3 p : points) {
            lo[0] = Math.min(lo[0], p.x());
            lo[1] = Math.min(lo[1], p.y());
            lo[2] = Math.min(lo[2], p.z());
            hi[0] = Math.max(hi[0], p.x());
            hi[1] = Math.max(hi[1], p.y());
            hi[2] = Math.max(hi[2], p.z());
        }
        return new Bounds(new Vec3(lo[0], lo[1], lo[2]), new Vec3(hi[0], hi[1], hi[2]));
    }

    public Vec3 centre() {
        return min.lerp(max, 0.5);
    }

    /** Half the diagonal: the radius of a sphere about the centre holding the box; at least 1 mm. */
    public double radius() {
        return Math.max(0.5 * min.distanceTo(max), 1e-3);
    }

    /** The eight corners. */
    public List<Vec3> corners() {
        List<Vec3> list = new ArrayList<>(8);
        for (int k = 0; k < 8; k++) {
            list.add(new Vec3((k & 1) == 0 ? min.x() : max.x(), (k & 2) == 0 ? min.y() : max.y(),
                    (k & 4) == 0 ? min.z() : max.z()));
        }
        return list;
    }
}
