package tetrapod.model;

import java.util.Objects;

/**
 * A member between nodes {@code i} and {@code j} (node ids). Local x runs from i to j;
 * {@code orientation} is the unit vector of the local y axis (perpendicular to x); z = x × y.
 * For angles local y is the major principal axis u–u and local z the minor axis v–v.
 *
 * @param segment   1 = the bottom segment (segments[0] in the spec); 0 for explicit frames
 * @param panel     1 = the bottom panel of its segment; 0 for explicit frames
 * @param axialOnly true when the member carries axial force only (every member of a truss,
 *                  bracing of a frame)
 */
public record Member(int id, int i, int j, Role role, int segment, int panel, Face face,
                     Section section, boolean axialOnly, Vec3 orientation) {

    public Member {
        Objects.requireNonNull(role, "role");
        Objects.requireNonNull(face, "face");
        Objects.requireNonNull(section, "section");
        Objects.requireNonNull(orientation, "orientation");
        if (i == j) {
            throw new IllegalArgumentException("member " + id + " joins node " + i + " to itself");
        }
    }
}
