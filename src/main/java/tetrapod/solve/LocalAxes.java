package tetrapod.solve;

import tetrapod.model.Vec3;

/**
 * A member's local axes as unit vectors in tower (global) axes: {@code x} from end i to end j,
 * {@code y} the member's orientation vector made exactly perpendicular to x, {@code z = x × y}.
 * The rows of the 3×3 rotation λ that turns global components into local ones are x, y, z.
 */
record LocalAxes(Vec3 x, Vec3 y, Vec3 z) {

    /** Below this |y⊥|, an orientation is taken as parallel to the member (relative, unit vectors). */
    private static final double PARALLEL_TOLERANCE = 1e-6;

    /**
     * Axes of the member from {@code from} to {@code to} (input, not modified) with local y along
     * {@code orientation} after removing its component along x (Gram–Schmidt).
     *
     * @throws IllegalArgumentException when the member has zero length, or when the orientation is
     *                                  (nearly) parallel to the member
     */
    static LocalAxes of(Vec3 from, Vec3 to, Vec3 orientation) {
        Vec3 x = direction(from, to);
        Vec3 yRaw = orientation.minus(x.times(orientation.dot(x)));
        if (!(yRaw.norm() > PARALLEL_TOLERANCE * Math.max(orientation.norm(), Double.MIN_NORMAL))) {
            throw new IllegalArgumentException("orientation " + orientation + " is parallel to the member");
        }
        Vec3 y = yRaw.unit();
        return new LocalAxes(x, y, x.cross(y));
    }

    /** Axes for a member whose y and z do not matter (axial only): y is any unit normal to x. */
    static LocalAxes axialOnly(Vec3 from, Vec3 to) {
        Vec3 x = direction(from, to);
        Vec3 helper = Math.abs(x.z()) < 0.9 ? Vec3.Z : Vec3.X;
        Vec3 y = helper.minus(x.times(helper.dot(x))).unit();
        return new LocalAxes(x, y, x.cross(y));
    }

    static Vec3 direction(Vec3 from, Vec3 to) {
        Vec3 d = to.minus(from);
        if (!(d.norm() > 0)) {
            throw new IllegalArgumentException("zero-length member at " + from);
        }
        return d.unit();
    }

    /** λ as a row-major 3×3 array (rows x, y, z). */
    double[] rotation() {
        return new double[] {
            x.x(), x.y(), x.z(),
            y.x(), y.y(), y.z(),
            z.x(), z.y(), z.z() };
    }
}
