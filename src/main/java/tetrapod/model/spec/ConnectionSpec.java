package tetrapod.model.spec;

import java.util.List;
import java.util.Objects;
import tetrapod.model.Role;

/**
 * The end connection of the members of one role in some segments: one line of bolts along the
 * member. Lengths in mm, as the model file gives them.
 *
 * @param segments            segment numbers (1 = the bottom segment); empty for every segment
 * @param bolts               number of bolts in the line at each end
 * @param diameter            nominal bolt diameter d, mm (a metric coarse size M12 … M72)
 * @param holeClearance       hole diameter minus bolt diameter, mm
 * @param endDistance         e1: from the end bolt to the member's end, along the force, mm
 * @param edgeDistance        e2: from the bolt line to the free edge (the toe of the connected
 *                            leg), across the force, mm
 * @param pitch               p1: between bolts along the force, mm
 * @param shearPlanes         shear planes per bolt (1 for a lapped angle)
 * @param threadsInShearPlane whether the threaded part of the bolt is in the shear plane
 * @param holesInSection      bolt holes cut by one cross-section of the member (for the net area)
 * @param connectedLeg        which leg of an angle the bolts pass through
 */
public record ConnectionSpec(Role role, List<Integer> segments, int bolts, double diameter, BoltGrade grade,
                             double holeClearance, double endDistance, double edgeDistance, double pitch,
                             int shearPlanes, boolean threadsInShearPlane, int holesInSection,
                             ConnectedLeg connectedLeg) {

    public ConnectionSpec {
        Objects.requireNonNull(role, "role");
        Objects.requireNonNull(grade, "grade");
        Objects.requireNonNull(connectedLeg, "connectedLeg");
        segments = segments == null ? List.of() : List.copyOf(segments);
        if (bolts < 1 || shearPlanes < 1 || holesInSection < 0) {
            throw new IllegalArgumentException("a connection needs at least one bolt and one shear plane");
        }
        for (double v : new double[] {diameter, endDistance, edgeDistance, pitch}) {
            if (!(v > 0) || !Double.isFinite(v)) {
                throw new IllegalArgumentException("connection dimensions must be > 0 mm");
            }
        }
        if (!(holeClearance >= 0)) {
            throw new IllegalArgumentException("hole clearance must be >= 0 mm");
        }
    }

    /** Nominal diameters of the ISO metric coarse threads a bolt or anchor rod may have, mm (M12 … M72). */
    public static final List<Integer> METRIC_SIZES_MM = List.of(12, 14, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 42, 45,
            48, 52, 56, 60, 64, 68, 72);

    /** End and edge distance assumed when not given: 1.5 d0 (common practice; EN 1993-1-8 Table 3.3 asks ≥ 1.2 d0). */
    public static final double ASSUMED_DISTANCE_PER_HOLE = 1.5;
    /** Pitch assumed when not given: 3.0 d0 (common practice; EN 1993-1-8 Table 3.3 asks ≥ 2.2 d0). */
    public static final double ASSUMED_PITCH_PER_HOLE = 3.0;

    /**
     * Hole clearance assumed when not given, mm: normal round holes of EN 1090-2 Table 11 (recalled
     * from memory): 1 mm for M12 and M14, 2 mm for M16 to M24, 3 mm from M27.
     */
    public static double assumedHoleClearance(double diameterMm) {
        return diameterMm < 15 ? 1.0 : diameterMm < 26 ? 2.0 : 3.0;
    }

    /** Bolt holes cut by one cross-section assumed when not given: 2 for legs (one per flange), 1 otherwise. */
    public static int assumedHolesInSection(Role role) {
        return role == Role.LEG ? 2 : 1;
    }

    /**
     * A connection of {@code bolts} bolts of diameter (mm) and grade with every other value assumed
     * (common practice, stated in docs/methods.md (Checks)): clearance by EN 1090-2, e1 = e2 = 1.5 d0,
     * p1 = 3 d0, one shear plane, threads in the shear plane, holes by role, the long leg connected.
     */
    public static ConnectionSpec assumed(Role role, List<Integer> segments, int bolts, double diameterMm,
                                         BoltGrade grade) {
        double clearance = assumedHoleClearance(diameterMm);
        double d0 = diameterMm + clearance;
        return new ConnectionSpec(role, segments, bolts, diameterMm, grade, clearance, ASSUMED_DISTANCE_PER_HOLE * d0,
                ASSUMED_DISTANCE_PER_HOLE * d0, ASSUMED_PITCH_PER_HOLE * d0, 1, true, assumedHolesInSection(role),
                ConnectedLeg.LONG);
    }

    /** Whether this connection applies to a member of {@code role} in {@code segment}. */
    public boolean covers(Role memberRole, int segment) {
        return role == memberRole && (segments.isEmpty() || segments.contains(segment));
    }
}
