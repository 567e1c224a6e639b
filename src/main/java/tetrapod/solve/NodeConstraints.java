package tetrapod.solve;

import java.util.List;

/**
 * What holds each node, as the solver sees it: the node's DOF bases and which of its DOFs are
 * eliminated, by a support or automatically. Internal to the solver; arrays are not copied.
 *
 * <p>A node's DOFs are normally along the global axes. A node that needs a skew auto-restraint
 * gets its own orthonormal basis q0, q1, q2 for its translations (or its rotations); DOF c of
 * that triple then means displacement (rotation) along q_c, and the skew direction is one of the
 * q_c, so that it can be eliminated exactly. A basis is stored row-major with column c = q_c in
 * global components, i.e. u_global = Q·u_node.
 */
final class NodeConstraints {

    static final byte FREE = 0;
    static final byte SUPPORT = 1;
    static final byte AUTO = 2;

    private final double[][] translationBases;
    private final double[][] rotationBases;
    private final byte[][] kinds;
    private final List<AutoRestraint> autoRestraints;

    /**
     * @param translationBases per node index: null for the global axes, else Q for ux, uy, uz
     * @param rotationBases    per node index: null for the global axes, else Q for rx, ry, rz
     * @param kinds            per node index, 6 entries: FREE, SUPPORT or AUTO for each DOF in the node's bases
     */
    NodeConstraints(double[][] translationBases, double[][] rotationBases, byte[][] kinds, List<AutoRestraint> autoRestraints) {
        this.translationBases = translationBases;
        this.rotationBases = rotationBases;
        this.kinds = kinds;
        this.autoRestraints = List.copyOf(autoRestraints);
    }

    /** Q of node index {@code n} for its translations, or null when they are along the global axes. */
    double[] translationBasis(int n) {
        return translationBases[n];
    }

    /** Q of node index {@code n} for its rotations, or null when they are about the global axes. */
    double[] rotationBasis(int n) {
        return rotationBases[n];
    }

    byte kind(int n, int dof) {
        return kinds[n][dof];
    }

    List<AutoRestraint> autoRestraints() {
        return autoRestraints;
    }

    /** Six global components (forces or displacements) of node n in its DOF bases: Qᵀ·v. New array. */
    double[] toNode(int n, double[] global, int offset) {
        double[] out = new double[6];
        System.arraycopy(global, offset, out, 0, 6);
        rotateTransposed(translationBases[n], global, offset, out, 0);
        rotateTransposed(rotationBases[n], global, offset + 3, out, 3);
        return out;
    }

    /** Six components of node n in its DOF bases turned into global ones: Q·v. New array. */
    double[] toGlobal(int n, double[] local) {
        double[] out = local.clone();
        rotate(translationBases[n], local, 0, out);
        rotate(rotationBases[n], local, 3, out);
        return out;
    }

    private static void rotateTransposed(double[] q, double[] in, int from, double[] out, int to) {
        if (q == null) {
            return;
        }
        for (int c = 0; c < 3; c++) {
            out[to + c] = q[c] * in[from] + q[3 + c] * in[from + 1] + q[6 + c] * in[from + 2];
        }
    }

    private static void rotate(double[] q, double[] in, int at, double[] out) {
        if (q == null) {
            return;
        }
        for (int r = 0; r < 3; r++) {
            out[at + r] = q[3 * r] * in[at] + q[3 * r + 1] * in[at + 1] + q[3 * r + 2] * in[at + 2];
        }
    }
}
