package tetrapod.check;

import java.util.Objects;
import tetrapod.common.Units;
import tetrapod.model.Role;
import tetrapod.model.spec.BoltGrade;
import tetrapod.model.spec.ConnectedLeg;
import tetrapod.model.spec.ConnectionSpec;

/**
 * The end connection of a member in SI units: one line of bolts along the member at each end.
 *
 * @param bolts               bolts in the line; 0 when the connection's bolts are not checked
 *                            (a leg splice assumed to be designed for the leg)
 * @param diameter            nominal bolt diameter d, m
 * @param holeDiameter        d0, m
 * @param endDistance         e1, m
 * @param edgeDistance        e2, m
 * @param pitch               p1, m
 * @param holesInSection      holes cut by one cross-section (net area)
 * @param assumed             true when the model file gave no connection for the member and the
 *                            role's assumed one is used
 */
public record Connection(int bolts, double diameter, BoltGrade grade, double holeDiameter, double endDistance,
                         double edgeDistance, double pitch, int shearPlanes, boolean threadsInShearPlane,
                         int holesInSection, ConnectedLeg connectedLeg, boolean assumed) {

    /** Bracing is assumed bolted by two M16 8.8 bolts, redundants by one (common practice). */
    static final double ASSUMED_BRACING_BOLT_MM = 16;
    /** Leg holes are assumed for M20 bolts (common practice). */
    static final double ASSUMED_LEG_BOLT_MM = 20;

    public Connection {
        Objects.requireNonNull(grade, "grade");
        Objects.requireNonNull(connectedLeg, "connectedLeg");
        if (bolts < 0 || holesInSection < 0 || shearPlanes < 1) {
            throw new IllegalArgumentException("bolts and holes must be >= 0, shear planes >= 1");
        }
        if (!(diameter > 0) || !(holeDiameter >= diameter) || !(endDistance > 0) || !(edgeDistance > 0) || !(pitch > 0)) {
            throw new IllegalArgumentException("connection dimensions must be > 0 and d0 >= d");
        }
    }

    /** From the model file's connection (mm → m). */
    public static Connection of(ConnectionSpec spec, boolean assumed) {
        return new Connection(spec.bolts(), spec.diameter() * Units.MM, spec.grade(),
                (spec.diameter() + spec.holeClearance()) * Units.MM, spec.endDistance() * Units.MM,
                spec.edgeDistance() * Units.MM, spec.pitch() * Units.MM, spec.shearPlanes(), spec.threadsInShearPlane(),
                spec.holesInSection(), spec.connectedLeg(), assumed);
    }

    /**
     * The connection assumed for a member of {@code role} that the model file does not cover
     * (common practice, stated in docs/methods.md (Checks)): bracing, plan and general members two
     * M16 8.8 bolts, redundants one; legs two M20 holes in the section and splice bolts not
     * checked (a leg splice is assumed to be designed for the leg).
     */
    public static Connection assumed(Role role) {
        return switch (role) {
            case LEG -> {
                Connection holes = of(ConnectionSpec.assumed(role, null, 1, ASSUMED_LEG_BOLT_MM, BoltGrade.G8_8), true);
                yield holes.withBolts(0);
            }
            case REDUNDANT -> of(ConnectionSpec.assumed(role, null, 1, ASSUMED_BRACING_BOLT_MM, BoltGrade.G8_8), true);
            default -> of(ConnectionSpec.assumed(role, null, 2, ASSUMED_BRACING_BOLT_MM, BoltGrade.G8_8), true);
        };
    }

    private Connection withBolts(int count) {
        return new Connection(count, diameter, grade, holeDiameter, endDistance, edgeDistance, pitch, shearPlanes,
                threadsInShearPlane, holesInSection, connectedLeg, assumed);
    }

    public boolean boltsChecked() {
        return bolts > 0;
    }

    /** Ultimate tensile strength of the bolts f_ub, Pa (EN 1993-1-8 Table 3.1). */
    public double boltUltimate() {
        return BoltStrengths.ultimate(grade);
    }

    /** Area of a bolt in a shear plane: the tensile stress area through threads, else the shank, m². */
    public double shearArea() {
        return threadsInShearPlane ? MetricThreads.stressArea(diameter) : MetricThreads.grossArea(diameter);
    }

    /** Area at the thread root through threads, else the shank, m² (ASCE 10 basis). */
    public double rootOrShankArea() {
        return threadsInShearPlane ? MetricThreads.rootArea(diameter) : MetricThreads.grossArea(diameter);
    }
}
