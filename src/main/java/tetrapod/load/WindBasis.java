package tetrapod.load;

import java.util.List;

/**
 * The wind load at any azimuth θ as a sum of azimuth-independent load vectors:
 * {@code W(θ) = Σ_k c_k(θ) · B_k}. Solve each {@link #vectors() B_k} once and every azimuth's
 * displacements, reactions and member forces follow by superposition with
 * {@link #coefficients(double, double[]) c_k(θ)}.
 *
 * <p>With d(θ) the directional factor, k = sin²2θ, c = cos θ, s = sin θ, F_X and F_Y a panel's
 * face-normal forces, a_X and a_Y their incidence amplitudes and B_x, B_y the unit forces on the
 * panel's nodes, the panel force is d [F_X (1 + a_X k) c² + F_Y (1 + a_Y k) s²] along (c, s)
 * ({@link WindLoads}). Its x part is d c³ ΣF_X B_x + d k c³ Σ F_X a_X B_x + d c s² Σ F_Y B_x +
 * d k c s² Σ F_Y a_Y B_x, its y part likewise, and the ancillaries add d c Σ F_a B_x + d s Σ F_a B_y:
 * at most ten vectors whatever the tower's size. Vectors that are zero are left out.
 */
public final class WindBasis {

    /** The θ-functions of the terms, in the order of {@link #NAMES}. */
    private static final int TERMS = 10;
    static final List<String> NAMES = List.of(
            "x from faces normal to x", "x from faces normal to x, incidence",
            "x from faces normal to y", "x from faces normal to y, incidence",
            "y from faces normal to x", "y from faces normal to x, incidence",
            "y from faces normal to y", "y from faces normal to y, incidence",
            "x on ancillaries", "y on ancillaries");

    private final WindProfile profile;
    private final List<BasisVector> vectors;
    private final int[] terms;

    /** {@code vectors.get(j)} belongs to term {@code terms[j]} (an index into {@link #NAMES}). */
    WindBasis(WindProfile profile, List<BasisVector> vectors, int[] terms) {
        this.profile = profile;
        this.vectors = List.copyOf(vectors);
        this.terms = terms.clone();
        if (terms.length != vectors.size()) {
            throw new IllegalArgumentException("one term per vector");
        }
    }

    /** The azimuth-independent load vectors B_k, N. */
    public List<BasisVector> vectors() {
        return vectors;
    }

    public int size() {
        return vectors.size();
    }

    /** c_k(θ) for wind blowing towards azimuth θ (degrees), in the order of {@link #vectors()}. */
    public double[] coefficients(double azimuthDeg) {
        double[] out = new double[vectors.size()];
        coefficients(azimuthDeg, out);
        return out;
    }

    /**
     * c_k(θ) into {@code out} (output; length at least {@link #size()}); allocates nothing.
     *
     * @return {@code out}
     */
    public double[] coefficients(double azimuthDeg, double[] out) {
        return coefficients(azimuthDeg, out, 0, 1.0);
    }

    /**
     * {@code scale} × c_k(θ) into {@code out[offset + k]} (output); allocates nothing.
     *
     * @return {@code out}
     */
    public double[] coefficients(double azimuthDeg, double[] out, int offset, double scale) {
        double t = Math.toRadians(azimuthDeg);
        double c = Math.cos(t);
        double s = Math.sin(t);
        double s2 = Math.sin(2 * t);
        double k = s2 * s2;
        double d = scale * profile.directionalFactor(azimuthDeg);
        for (int j = 0; j < terms.length; j++) {
            out[offset + j] = d * switch (terms[j]) {
                case 0 -> c * c * c;
                case 1 -> k * c * c * c;
                case 2 -> c * s * s;
                case 3 -> k * c * s * s;
                case 4 -> s * c * c;
                case 5 -> k * s * c * c;
                case 6 -> s * s * s;
                case 7 -> k * s * s * s;
                case 8 -> c;
                case 9 -> s;
                default -> throw new IllegalStateException("term " + terms[j]);
            };
        }
        return out;
    }

    static int termCount() {
        return TERMS;
    }
}
