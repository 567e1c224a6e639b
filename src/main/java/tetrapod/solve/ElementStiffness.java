package tetrapod.solve;

/**
 * Element stiffness matrices in member local axes.
 *
 * <p>Local degrees of freedom of a two-node element, in this order:
 * {@code u1 v1 w1 θx1 θy1 θz1 u2 v2 w2 θx2 θy2 θz2} (translations along local x, y, z and
 * right-handed rotations about them, end i then end j).
 *
 * <p>The 3D Euler–Bernoulli beam-column matrix (no shear deformation, no warping, no
 * second-order terms) is the standard one of J.S. Przemieniecki, <i>Theory of Matrix Structural
 * Analysis</i>, McGraw-Hill 1968, §5.4, eq. (5.118), and of W. McGuire, R.H. Gallagher,
 * R.D. Ziemian, <i>Matrix Structural Analysis</i>, 2nd ed., Wiley 2000, eq. (4.34) (equation
 * numbers recalled from memory). Bending in the local x–y plane (deflection v, rotation θz) uses
 * Iz; bending in the x–z plane (deflection w, rotation θy) uses Iy; since a positive θy turns z
 * towards x, dw/dx = −θy and the v–θz and w–θy coupling terms have opposite signs.
 */
final class ElementStiffness {

    static final int BEAM_SIZE = 12;

    private ElementStiffness() { }

    /**
     * Local stiffness of a beam-column, row-major 12×12 (output, new array).
     *
     * @param e  Young's modulus, Pa
     * @param g  shear modulus, Pa
     * @param a  area, m²
     * @param iy second moment about local y, m⁴ (bending in the x–z plane)
     * @param iz second moment about local z, m⁴ (bending in the x–y plane)
     * @param j  St Venant torsion constant, m⁴
     * @param l  length, m
     */
    static double[] beamLocal(double e, double g, double a, double iy, double iz, double j, double l) {
        double[] k = new double[BEAM_SIZE * BEAM_SIZE];
        double axial = e * a / l;
        double torsion = g * j / l;
        double l2 = l * l;
        double l3 = l2 * l;
        // axial: u1, u2
        put(k, 0, 0, axial);
        put(k, 0, 6, -axial);
        put(k, 6, 6, axial);
        // torsion: θx1, θx2
        put(k, 3, 3, torsion);
        put(k, 3, 9, -torsion);
        put(k, 9, 9, torsion);
        // bending in x–y: v1 (1), θz1 (5), v2 (7), θz2 (11), stiffness E·Iz
        double z12 = 12 * e * iz / l3;
        double z6 = 6 * e * iz / l2;
        double z4 = 4 * e * iz / l;
        double z2 = 2 * e * iz / l;
        put(k, 1, 1, z12);
        put(k, 1, 5, z6);
        put(k, 1, 7, -z12);
        put(k, 1, 11, z6);
        put(k, 5, 5, z4);
        put(k, 5, 7, -z6);
        put(k, 5, 11, z2);
        put(k, 7, 7, z12);
        put(k, 7, 11, -z6);
        put(k, 11, 11, z4);
        // bending in x–z: w1 (2), θy1 (4), w2 (8), θy2 (10), stiffness E·Iy
        double y12 = 12 * e * iy / l3;
        double y6 = 6 * e * iy / l2;
        double y4 = 4 * e * iy / l;
        double y2 = 2 * e * iy / l;
        put(k, 2, 2, y12);
        put(k, 2, 4, -y6);
        put(k, 2, 8, -y12);
        put(k, 2, 10, -y6);
        put(k, 4, 4, y4);
        put(k, 4, 8, y6);
        put(k, 4, 10, y2);
        put(k, 8, 8, y12);
        put(k, 8, 10, y6);
        put(k, 10, 10, y4);
        return k;
    }

    /** Sets k[r][c] and its symmetric partner. */
    private static void put(double[] k, int r, int c, double v) {
        k[r * BEAM_SIZE + c] = v;
        k[c * BEAM_SIZE + r] = v;
    }

    /**
     * Transforms a local 12×12 beam matrix to the assembly DOFs: K = Tᵀ k T where T is block
     * diagonal with the four 3×3 blocks {@code blocks[0..3]} (row-major; each maps the assembly
     * components at that end to local components).
     *
     * @param kLocal input, not modified
     * @param blocks input: translations at i, rotations at i, translations at j, rotations at j
     * @return new row-major 12×12 array
     */
    static double[] transform(double[] kLocal, double[][] blocks) {
        double[] out = new double[BEAM_SIZE * BEAM_SIZE];
        double[] tmp = new double[9];
        for (int p = 0; p < 4; p++) {
            for (int q = 0; q < 4; q++) {
                // tmp = k_pq · T_q
                double[] tq = blocks[q];
                for (int r = 0; r < 3; r++) {
                    for (int c = 0; c < 3; c++) {
                        double s = 0;
                        for (int m = 0; m < 3; m++) {
                            s += kLocal[(3 * p + r) * BEAM_SIZE + 3 * q + m] * tq[3 * m + c];
                        }
                        tmp[3 * r + c] = s;
                    }
                }
                // out_pq = T_pᵀ · tmp
                double[] tp = blocks[p];
                for (int r = 0; r < 3; r++) {
                    for (int c = 0; c < 3; c++) {
                        double s = 0;
                        for (int m = 0; m < 3; m++) {
                            s += tp[3 * m + r] * tmp[3 * m + c];
                        }
                        out[(3 * p + r) * BEAM_SIZE + 3 * q + c] = s;
                    }
                }
            }
        }
        return out;
    }
}
