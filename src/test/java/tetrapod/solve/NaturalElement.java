package tetrapod.solve;

import java.util.Arrays;

/**
 * A member's stiffness written independently of the solver under test, from plain numbers:
 * k = Bᵀ·k_n·B from natural deformations (the "natural stiffness" route of J.H. Argyris's matrix
 * displacement method, as opposed to the solver's explicit 12×12 entries), turned into tower axes
 * by T = blockdiag(λ, λ, λ, λ). DOF order per end: ux uy uz rx ry rz. Test code, shared by the
 * dense references of the solver and of results.json.
 */
public final class NaturalElement {

    private final double[] transform; // 12×12 row-major, global → local
    private final double[] local;     // 12×12 row-major

    /**
     * @param a           position of end i, m (input)
     * @param b           position of end j, m (input)
     * @param orientation local y before it is made perpendicular to local x (input; ignored when
     *                    {@code axialOnly})
     * @param ea          axial stiffness E·A, N
     * @param eiy         bending stiffness about local y, E·Iy, N·m²
     * @param eiz         bending stiffness about local z, E·Iz, N·m²
     * @param gj          torsion stiffness G·J, N·m²
     * @param axialOnly   a pin-ended bar: axial stiffness only
     */
    public NaturalElement(double[] a, double[] b, double[] orientation, double ea, double eiy, double eiz,
                          double gj, boolean axialOnly) {
        double[] d = {b[0] - a[0], b[1] - a[1], b[2] - a[2]};
        double length = Math.sqrt(dot(d, d));
        transform = transformation(scaled(d, 1 / length), axialOnly ? null : orientation);
        local = localStiffness(length, ea, eiy, eiz, gj, axialOnly);
    }

    /** K_e = Tᵀ k T in tower axes, 12×12 row-major, new array. */
    public double[] global() {
        return product(transform, true, product(local, false, transform));
    }

    /**
     * End actions in local axes, f = k·T·d: {at i (6), at j (6)}.
     *
     * @param d the 12 displacements of ends i and j in tower axes (input)
     */
    public double[][] endForces(double[] d) {
        double[] f = multiply(local, multiply(transform, d));
        return new double[][] {Arrays.copyOfRange(f, 0, 6), Arrays.copyOfRange(f, 6, 12)};
    }

    /** Rows of λ: local x, y, z; for a bar any perpendicular pair (its forces across are zero). */
    private static double[] transformation(double[] x, double[] orientation) {
        double[] ref = orientation;
        if (ref == null) {
            ref = Math.abs(x[0]) < 0.5 ? new double[] {1, 0, 0} : new double[] {0, 1, 0};
        }
        double[] y = scaled(x, -dot(ref, x));
        for (int k = 0; k < 3; k++) {
            y[k] += ref[k];
        }
        y = scaled(y, 1 / Math.sqrt(dot(y, y)));
        double[] z = {x[1] * y[2] - x[2] * y[1], x[2] * y[0] - x[0] * y[2], x[0] * y[1] - x[1] * y[0]};
        double[][] rows = {x, y, z};
        double[] t = new double[144];
        for (int blk = 0; blk < 4; blk++) {
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    t[(3 * blk + r) * 12 + 3 * blk + c] = rows[r][c];
                }
            }
        }
        return t;
    }

    /**
     * Local 12×12 stiffness as Bᵀ·k_n·B. Natural deformations: elongation e = u2 − u1; twist
     * φ = θx2 − θx1; in the x–y plane the end rotations relative to the chord,
     * θz1 − (v2 − v1)/L and θz2 − (v2 − v1)/L, with k_n = (EIz/L)[4 2; 2 4]; in the x–z plane
     * θy1 + (w2 − w1)/L and θy2 + (w2 − w1)/L (w' = −θy), with (EIy/L)[4 2; 2 4].
     */
    private static double[] localStiffness(double l, double ea, double eiy, double eiz, double gj, boolean axialOnly) {
        double[][] b = new double[6][12];
        b[0][0] = -1;
        b[0][6] = 1;
        double[] kn = new double[36];
        kn[0] = ea / l;
        if (!axialOnly) {
            b[1][3] = -1;
            b[1][9] = 1;
            b[2][5] = 1;
            b[2][1] = 1 / l;
            b[2][7] = -1 / l;
            b[3][11] = 1;
            b[3][1] = 1 / l;
            b[3][7] = -1 / l;
            b[4][4] = 1;
            b[4][2] = -1 / l;
            b[4][8] = 1 / l;
            b[5][10] = 1;
            b[5][2] = -1 / l;
            b[5][8] = 1 / l;
            kn[7] = gj / l;
            double ez = eiz / l;
            double ey = eiy / l;
            kn[2 * 6 + 2] = 4 * ez;
            kn[2 * 6 + 3] = 2 * ez;
            kn[3 * 6 + 2] = 2 * ez;
            kn[3 * 6 + 3] = 4 * ez;
            kn[4 * 6 + 4] = 4 * ey;
            kn[4 * 6 + 5] = 2 * ey;
            kn[5 * 6 + 4] = 2 * ey;
            kn[5 * 6 + 5] = 4 * ey;
        }
        double[] out = new double[144];
        for (int r = 0; r < 12; r++) {
            for (int c = 0; c < 12; c++) {
                double s = 0;
                for (int p1 = 0; p1 < 6; p1++) {
                    for (int p2 = 0; p2 < 6; p2++) {
                        s += b[p1][r] * kn[6 * p1 + p2] * b[p2][c];
                    }
                }
                out[12 * r + c] = s;
            }
        }
        return out;
    }

    private static double[] multiply(double[] m, double[] v) {
        double[] out = new double[12];
        for (int r = 0; r < 12; r++) {
            double s = 0;
            for (int q = 0; q < 12; q++) {
                s += m[12 * r + q] * v[q];
            }
            out[r] = s;
        }
        return out;
    }

    /** a·b, or aᵀ·b when {@code transposeA}, of 12×12 row-major matrices. */
    private static double[] product(double[] a, boolean transposeA, double[] b) {
        double[] out = new double[144];
        for (int r = 0; r < 12; r++) {
            for (int c = 0; c < 12; c++) {
                double s = 0;
                for (int q = 0; q < 12; q++) {
                    s += (transposeA ? a[12 * q + r] : a[12 * r + q]) * b[12 * q + c];
                }
                out[12 * r + c] = s;
            }
        }
        return out;
    }

    static double dot(double[] a, double[] b) {
        double s = 0;
        for (int k = 0; k < a.length; k++) {
            s += a[k] * b[k];
        }
        return s;
    }

    private static double[] scaled(double[] v, double s) {
        double[] out = new double[v.length];
        for (int k = 0; k < v.length; k++) {
            out[k] = s * v[k];
        }
        return out;
    }
}
