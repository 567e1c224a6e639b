package tetrapod.model;

/**
 * How the members are idealised for analysis. The solver follows each member's
 * {@link Member#axialOnly()} flag; the idealisation decides, when a model is built, which members
 * are beam-columns (see docs/solver.md §1 for when each suits).
 */
public enum Idealisation {
    /** Pin-jointed: three translations per node, every member axial only. */
    TRUSS,
    /**
     * Six degrees of freedom per node; the legs are beam-columns through every leg node, every
     * other member is pin-ended (in an explicit frame: members with role leg or marked continuous
     * are beam-columns). The usual model of a bolted lattice tower; the default.
     */
    CONTINUOUS_LEGS,
    /**
     * Six degrees of freedom per node; every member of a generated tower is a beam-column (rigid
     * joints); in an explicit frame, the members marked continuous.
     */
    FRAME;

    /** True when nodes have rotations (six DOFs): every idealisation but the truss. */
    public boolean hasRotations() {
        return this != TRUSS;
    }

    /** The model file's name: {@code truss}, {@code continuous-legs}, {@code frame}. */
    public String jsonName() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }
}
