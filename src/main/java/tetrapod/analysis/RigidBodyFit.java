package tetrapod.analysis;

/**
 * The rigid-body motion that best fits (least squares) the translations of a group of points: the
 * translation t of their centroid and the small rotation ω minimising Σ |u_i − t − ω × r_i|², r_i the
 * points' positions from their centroid. Setting the derivatives to zero gives t = mean(u_i)
 * (Σ r_i = 0) and J ω = Σ r_i × u_i with J = Σ (|r_i|² I − r_i r_iᵀ) (the normal equations of the
 * fit). For a panel level's four leg nodes J is regular (they are not on one line); the tilt comes
 * from the legs' vertical displacements, the twist from their horizontal ones. Only translations are
 * used: a leg's own rotation at the node is its local bending, not the level's.
 */
final class RigidBodyFit {

    private final double[][] r; // positions from the centroid
    private final double[] inverse; // J⁻¹, row-major 3 × 3

    /** The fit of the points {@code xyz} (input: one {x, y, z} per point, m), at least three not on one line. */
    RigidBodyFit(double[][] xyz) {
        int n = xyz.length;
        double[] c = new double[3];
        for (double[] p : xyz) {
            for (int k = 0; k < 3; k++) {
                c[k] += p[k] / n;
            }
        }
        r = new double[n][3];
        double[] j = new double[9];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < 3; k++) {
                r[i][k] = xyz[i][k] - c[k];
            }
            double rr = r[i][0] * r[i][0] + r[i][1] * r[i][1] + r[i][2] * r[i][2];
            for (int a = 0; a < 3; a++) {
                for (int b = 0; b < 3; b++) {
                    j[3 * a + b] += (a == b ? rr : 0) - r[i][a] * r[i][b];
                }
            }
        }
        inverse = invert(j);
    }

    /**
     * The fitted motion of {@code u} (input: one {ux, uy, uz} per point, in the order of the
     * positions, m) into {@code out} (output, length ≥ 6): the centroid's translation tx, ty, tz (m)
     * and the rotation ωx, ωy, ωz (rad).
     *
     * @return {@code out}
     */
    double[] fit(double[][] u, double[] out) {
        int n = r.length;
        double[] b = new double[3];
        java.util.Arrays.fill(out, 0, 6, 0.0);
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < 3; k++) {
                out[k] += u[i][k] / n;
            }
            b[0] += r[i][1] * u[i][2] - r[i][2] * u[i][1];
            b[1] += r[i][2] * u[i][0] - r[i][0] * u[i][2];
            b[2] += r[i][0] * u[i][1] - r[i][1] * u[i][0];
        }
        for (int a = 0; a < 3; a++) {
            out[3 + a] = inverse[3 * a] * b[0] + inverse[3 * a + 1] * b[1] + inverse[3 * a + 2] * b[2];
        }
        return out;
    }

    /** The inverse of a symmetric regular 3 × 3 matrix by its adjugate. */
    private static double[] invert(double[] m) {
        double c00 = m[4] * m[8] - m[5] * m[7];
        double c01 = m[5] * m[6] - m[3] * m[8];
        double c02 = m[3] * m[7] - m[4] * m[6];
        double det = m[0] * c00 + m[1] * c01 + m[2] * c02;
        double scale = Math.abs(m[0]) + Math.abs(m[4]) + Math.abs(m[8]);
        if (!(Math.abs(det) > 1e-12 * scale * scale * scale)) {
            throw new IllegalArgumentException("the points lie on one line: no rotation about that line can be fitted");
        }
        double[] inv = new double[9];
        inv[0] = c00 / det;
        inv[1] = (m[2] * m[7] - m[1] * m[8]) / det;
        inv[2] = (m[1] * m[5] - m[2] * m[4]) / det;
        inv[3] = c01 / det;
        inv[4] = (m[0] * m[8] - m[2] * m[6]) / det;
        inv[5] = (m[2] * m[3] - m[0] * m[5]) / det;
        inv[6] = c02 / det;
        inv[7] = (m[1] * m[6] - m[0] * m[7]) / det;
        inv[8] = (m[0] * m[4] - m[1] * m[3]) / det;
        return inv;
    }
}
