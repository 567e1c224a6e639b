package tetrapod.solve;

import java.util.List;

/**
 * What holds each node, as the solver sees it: the node's DOF basis and which of its DOFs are
 * eliminated, by a support or automatically. Internal to the solver; arrays are not copied.
 *
 * <p>A node's translational DOFs are normally along the global axes. A node that needs a skew
 * auto-restraint gets its own orthonormal basis {@code q0, q1, q2} (global components, stored
 * row-major with column c = basis vector c); its translation DOF c then means displacement along
 * q_c, and the skew direction is one of them, so that it can be eliminated exactly. Rotational
 * DOFs always stay along the global axes.
 */
final class NodeConstraints {

    static final byte FREE = 0;
    static final byte SUPPORT = 1;
    static final byte AUTO = 2;

    private final double[][] bases;
    private final byte[][] kinds;
    private final List<AutoRestraint> autoRestraints;

    /**
     * @param bases per node index: null for the global axes, else row-major 3×3 Q (columns basis vectors)
     * @param kinds per node index, 6 entries: FREE, SUPPORT or AUTO for each DOF in the node basis
     */
    NodeConstraints(double[][] bases, byte[][] kinds, List<AutoRestraint> autoRestraints) {
        this.bases = bases;
        this.kinds = kinds;
        this.autoRestraints = List.copyOf(autoRestraints);
    }

    /** Row-major Q of node index {@code n}, or null when its DOFs are along the global axes. */
    double[] basis(int n) {
        return bases[n];
    }

    byte kind(int n, int dof) {
        return kinds[n][dof];
    }

    List<AutoRestraint> autoRestraints() {
        return autoRestraints;
    }
}
