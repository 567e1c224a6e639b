package tetrapod.view;

import tetrapod.model.Vec3;

/**
 * The mark of a member that breaks a requirement (a rule that does not depend on the load): an
 * "x" across its middle, whatever the member's colour, so that it reads as a shape and not as a
 * utilisation.
 */
final class RequirementMarks {

    private RequirementMarks() { }

    /**
     * Adds a cross of two arms, each {@code arm} long on either side of the midpoint of a–b, in the
     * plane of the member and the horizontal perpendicular to it (output {@code out}).
     */
    static void cross(SegmentInstances.Builder out, Vec3 a, Vec3 b, double arm, Rgb colour) {
        Vec3 mid = a.lerp(b, 0.5);
        Vec3 along = b.minus(a).unit();
        Vec3 side = Vec3.Z.cross(along);
        side = side.norm() < 1e-9 ? Vec3.X : side.unit();
        Vec3 p = along.plus(side).unit().times(arm);
        Vec3 q = along.minus(side).unit().times(arm);
        out.line(mid.minus(p), mid.plus(p), colour, 2.0);
        out.line(mid.minus(q), mid.plus(q), colour, 2.0);
    }
}
