package tetrapod.generate;

import java.util.Optional;
import tetrapod.model.Vec3;

/** Local y axes of members (unit, perpendicular to the member axis). */
final class Orientations {

    /** Below this |sin| between member axis and z the member counts as vertical. */
    private static final double VERTICAL_SINE = 1e-9;

    private Orientations() { }

    /**
     * Default rule: the horizontal unit vector Z × x (perpendicular to the member, lying level), or
     * global X for a vertical member.
     */
    static Vec3 standard(Vec3 from, Vec3 to) {
        Vec3 x = to.minus(from).unit();
        Vec3 side = Vec3.Z.cross(x);
        return side.norm() < VERTICAL_SINE ? Vec3.X : side.unit();
    }

    /**
     * A leg: the level direction from the leg towards the tower axis (x = y = 0), made
     * perpendicular to the leg; for an angle leg, its symmetry axis u–u.
     */
    static Vec3 leg(Vec3 from, Vec3 to) {
        Vec3 x = to.minus(from).unit();
        Vec3 middle = from.lerp(to, 0.5);
        Vec3 inward = new Vec3(-middle.x(), -middle.y(), 0);
        return perpendicularPart(inward, x).orElseGet(() -> standard(from, to));
    }

    /**
     * {@code wanted} with its component along unit {@code axis} removed, as a unit vector; empty
     * when {@code wanted} is (nearly) parallel to the axis or zero.
     */
    static Optional<Vec3> perpendicularPart(Vec3 wanted, Vec3 axis) {
        double size = wanted.norm();
        if (!(size > 0)) {
            return Optional.empty();
        }
        Vec3 perpendicular = wanted.minus(axis.times(wanted.dot(axis)));
        return perpendicular.norm() < 1e-6 * size ? Optional.empty() : Optional.of(perpendicular.unit());
    }
}
