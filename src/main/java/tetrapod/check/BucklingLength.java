package tetrapod.check;

import java.util.Objects;

/**
 * The buckling lengths of one member in one load case.
 *
 * @param memberLength  the member's own length between its nodes, m
 * @param minorAxis     buckling about the minor principal axis (v–v of an angle; the radius i_v):
 *                      between the nodes along the member
 * @param geometricAxis buckling about the geometric axes (i_y, i_z), out of the face's plane:
 *                      between the points held out of plane (the ends of the whole collinear
 *                      line of members, and a crossing when it holds)
 */
public record BucklingLength(double memberLength, BucklingSpan minorAxis, BucklingSpan geometricAxis) {

    public BucklingLength {
        Objects.requireNonNull(minorAxis, "minorAxis");
        Objects.requireNonNull(geometricAxis, "geometricAxis");
        if (!(memberLength > 0)) {
            throw new IllegalArgumentException("member length must be > 0 m");
        }
    }

    /** Both axes over the member's own length with no eccentric end (a leg, a general member). */
    public static BucklingLength between(double memberLength) {
        BucklingSpan span = new BucklingSpan(memberLength, 0, 0);
        return new BucklingLength(memberLength, span, span);
    }
}
