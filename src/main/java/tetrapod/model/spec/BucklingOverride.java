package tetrapod.model.spec;

import java.util.List;
import java.util.Objects;
import tetrapod.model.Role;

/**
 * The user's correction of the buckling lengths Tetrapod derives from the geometry, for one member
 * role in some segments.
 *
 * @param segments            segment numbers (1 = the bottom segment); empty for every segment
 * @param minorAxisFactor     multiplies the length for buckling about the minor axis (v–v for
 *                            angles), dimensionless
 * @param geometricAxisFactor multiplies the length for buckling about the geometric axes (out of
 *                            the face's plane), dimensionless
 * @param crossing            the rule for the crossing point of X bracing
 */
public record BucklingOverride(Role role, List<Integer> segments, double minorAxisFactor,
                               double geometricAxisFactor, CrossingRule crossing) {

    public BucklingOverride {
        Objects.requireNonNull(role, "role");
        Objects.requireNonNull(crossing, "crossing");
        segments = segments == null ? List.of() : List.copyOf(segments);
        if (!(minorAxisFactor > 0) || !(geometricAxisFactor > 0)) {
            throw new IllegalArgumentException("buckling length factors must be > 0");
        }
    }

    /** Whether this override applies to a member of {@code role} in {@code segment}. */
    public boolean covers(Role memberRole, int segment) {
        return role == memberRole && (segments.isEmpty() || segments.contains(segment));
    }
}
