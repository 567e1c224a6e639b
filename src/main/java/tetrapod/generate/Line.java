package tetrapod.generate;

import tetrapod.model.Vec3;

/** A straight line segment between two points, m. */
record Line(Vec3 from, Vec3 to) {

    /** The point of this line at height {@code z}; z is set exactly so that points on one level agree. */
    Vec3 atHeight(double z) {
        double t = (z - from.z()) / (to.z() - from.z());
        Vec3 p = from.lerp(to, t);
        return new Vec3(p.x(), p.y(), z);
    }

    /**
     * Where this line and {@code other} meet, for two coplanar, non-parallel lines: the midpoint of
     * the shortest segment between the two infinite lines (exact when they truly intersect).
     */
    Vec3 intersection(Line other) {
        Vec3 d1 = to.minus(from);
        Vec3 d2 = other.to.minus(other.from);
        Vec3 r = from.minus(other.from);
        double a = d1.dot(d1);
        double b = d1.dot(d2);
        double c = d2.dot(d2);
        double d = d1.dot(r);
        double e = d2.dot(r);
        double denominator = a * c - b * b;
        if (!(Math.abs(denominator) > 1e-12 * a * c)) {
            throw new IllegalArgumentException("parallel lines have no single intersection");
        }
        double t = (b * e - c * d) / denominator;
        double s = (a * e - b * d) / denominator;
        return from.plus(d1.times(t)).lerp(other.from.plus(d2.times(s)), 0.5);
    }
}
