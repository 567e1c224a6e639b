package tetrapod.solve;

import tetrapod.model.Vec3;

/**
 * The bending continuity of a straight pin-ended member through a node that no leg reaches, in
 * every idealisation. A pin-jointed model of a diagonal split by a redundant has no stiffness
 * across the diagonal at the split; the redundant chains of a panel then sway as a mechanism,
 * which the real, continuous diagonal prevents by bending. This element gives the node a
 * transverse stiffness relative to the chord between its two neighbours P and Q on the line:
 *
 * <p>w = P_⊥ [u_a − (1 − t) u_P − t u_Q], energy ½ k |w|², t = a/L, with P_⊥ = I − e eᵀ
 * the projection across the line (unit vector e), and k = 3EIL/(a²b²) the stiffness of a simply
 * supported member of span L = a + b to a point load at distances a and b from its ends
 * (δ = P a² b² / (3 E I L), the standard simply supported beam formula, e.g. Roark's Formulas
 * for Stress and Strain, Table 8.1; recalled from memory). Rigid-body motions of the line give w = 0, and the element's forces
 * are self-equilibrated (their weights −(1 − t), 1, −t sum to zero, and so do their moments about
 * P), so global equilibrium is unchanged. EI is the member's smaller principal value (E·Iv).
 *
 * @param p node index of P
 * @param a node index of the node held
 * @param q node index of Q
 */
record ContinuityElement(int p, int a, int q, double t, double k, Vec3 e) {

    /** DOF codes of the translations of P, a, Q, in the order of {@link #assemblyMatrix}. */
    int[] codes(DofNumbering numbering) {
        int[] c = new int[9];
        int[] nodes = {p, a, q};
        for (int n = 0; n < 3; n++) {
            for (int d = 0; d < 3; d++) {
                c[3 * n + d] = numbering.code(nodes[n], d);
            }
        }
        return c;
    }

    /** k·Bᵀ B in the nodes' translation bases, 9×9 row-major, new array. */
    double[] assemblyMatrix(NodeConstraints constraints) {
        double[] proj = new double[9];
        double[] u = {e.x(), e.y(), e.z()};
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                proj[3 * r + c] = (r == c ? 1 : 0) - u[r] * u[c];
            }
        }
        double[] weight = {-(1 - t), 1, -t};
        int[] nodes = {p, a, q};
        double[][] basis = new double[3][];
        for (int n = 0; n < 3; n++) {
            basis[n] = constraints.translationBasis(nodes[n]);
        }
        double[] out = new double[81];
        for (int bi = 0; bi < 3; bi++) {
            for (int bj = 0; bj < 3; bj++) {
                double[] block = transformed(proj, basis[bi], basis[bj]);
                double s = k * weight[bi] * weight[bj];
                for (int r = 0; r < 3; r++) {
                    for (int c = 0; c < 3; c++) {
                        out[9 * (3 * bi + r) + 3 * bj + c] = s * block[3 * r + c];
                    }
                }
            }
        }
        return out;
    }

    /** Q_iᵀ M Q_j (identity for a null basis). */
    private static double[] transformed(double[] m, double[] qi, double[] qj) {
        double[] left = qi == null ? m : multiply(transpose(qi), m);
        return qj == null ? left : multiply(left, qj);
    }

    private static double[] transpose(double[] m) {
        double[] t = new double[9];
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                t[3 * c + r] = m[3 * r + c];
            }
        }
        return t;
    }

    private static double[] multiply(double[] x, double[] y) {
        double[] out = new double[9];
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                out[3 * r + c] = x[3 * r] * y[c] + x[3 * r + 1] * y[3 + c] + x[3 * r + 2] * y[6 + c];
            }
        }
        return out;
    }
}
