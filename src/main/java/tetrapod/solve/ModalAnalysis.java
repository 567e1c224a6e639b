package tetrapod.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import tetrapod.model.Node;

/**
 * The lowest natural frequencies and mode shapes of the structure, K φ = ω² M φ, with the
 * stiffness factor the static analysis already has and a lumped mass at every node (translations
 * only: no rotary inertia), by subspace iteration (K.J. Bathe, <i>Finite Element Procedures</i>,
 * Prentice Hall 1996, §11.6; section number recalled from memory): X ← K⁻¹ M X, then the
 * Rayleigh–Ritz problem of the subspace, until the wanted eigenvalues settle. DOFs held by a
 * support or an auto-restraint do not move. With a zero shift, K must be the positive definite
 * stiffness of a stable structure, which {@link Solver#factor} guarantees.
 */
public final class ModalAnalysis {

    /** Relative change of each wanted ω² between iterations below which it has converged. */
    static final double TOLERANCE = 1e-10;
    /** ‖K φ − ω² M φ‖ / ‖ω² M φ‖ below which a wanted mode shape has converged. */
    static final double VECTOR_TOLERANCE = 1e-6;
    static final int MAX_ITERATIONS = 500;
    /** Fixed seed: the same model always gives the same start vectors and so the same output. */
    private static final long SEED = 0x5EED_7E7AL;

    /**
     * One mode.
     *
     * @param omegaSquared ω², (rad/s)²
     * @param shape        nodes × 6 (ux uy uz rx ry rz, tower axes, frame node order), mass-normalised:
     *                     Σ m φ·φ = 1 kg·m² per unit²
     * @param residual     ‖K φ − ω² M φ‖ / ‖ω² M φ‖ of the converged mode (dimensionless)
     */
    public record Mode(double omegaSquared, double[] shape, double residual) {

        /** Natural frequency f = ω/2π, Hz. */
        public double frequencyHz() {
            return Math.sqrt(omegaSquared) / (2 * Math.PI);
        }
    }

    private ModalAnalysis() { }

    /** The number of free translational DOFs with mass: the most modes {@link #lowest} can give. */
    public static int massedTranslations(FactoredSystem system, double[] nodeMass) {
        DofNumbering numbering = system.model().numbering();
        int massed = 0;
        for (int e = 0; e < numbering.freeCount(); e++) {
            if (numbering.freeDof(e) < 3 && nodeMass[numbering.freeNode(e)] > 0) {
                massed++;
            }
        }
        return massed;
    }

    /**
     * The {@code count} lowest modes.
     *
     * @param nodeMass per node index (frame order), the lumped mass in kg, ≥ 0 (input)
     * @throws IllegalArgumentException when {@code count} is below 1 or above the number of free
     *         translational DOFs that carry mass
     */
    public static List<Mode> lowest(FactoredSystem system, double[] nodeMass, int count) {
        StructuralModel model = system.model();
        DofNumbering numbering = model.numbering();
        int n = numbering.freeCount();
        double[] m = new double[n];
        for (int e = 0; e < n; e++) {
            if (numbering.freeDof(e) < 3) {
                m[e] = nodeMass[numbering.freeNode(e)];
            }
        }
        int massed = massedTranslations(system, nodeMass);
        if (count < 1 || count > massed) {
            throw new IllegalArgumentException("asked for " + count + " modes; the structure has " + massed
                    + " free translations that carry mass");
        }
        int q = Math.min(Math.max(2 * count, count + 8), massed);
        double[][] x = start(m, q);
        double[] previous = new double[q];
        Arrays.fill(previous, Double.NaN);
        double[] lambda = null;
        double[][] y = new double[q][];
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            double[] block = new double[n * q];
            for (int j = 0; j < q; j++) {
                double[] mx = times(m, x[j]);
                for (int e = 0; e < n; e++) {
                    block[e * q + j] = mx[e];
                }
            }
            system.solveFree(block, q);   // K Y = M X, every vector with one pass over the factor
            for (int j = 0; j < q; j++) {
                y[j] = new double[n];
                for (int e = 0; e < n; e++) {
                    y[j][e] = block[e * q + j];
                }
            }
            double[] kr = new double[q * q];
            double[] mr = new double[q * q];
            for (int i = 0; i < q; i++) {
                double[] mxi = times(m, x[i]);
                double[] myi = times(m, y[i]);
                for (int j = i; j < q; j++) {
                    kr[i * q + j] = kr[j * q + i] = SparseKernels.dot(y[j], mxi);  // Yᵀ K Y = Yᵀ M X, as K Y = M X
                    mr[i * q + j] = mr[j * q + i] = SparseKernels.dot(y[j], myi);
                }
            }
            RitzProblem.symmetrise(kr, q);
            RitzProblem reduced = RitzProblem.solve(kr, mr, q);
            lambda = reduced.values();
            for (int j = 0; j < q; j++) {
                double[] column = new double[n];
                for (int i = 0; i < q; i++) {
                    double c = reduced.vectors()[j][i];
                    if (c != 0) {
                        for (int e = 0; e < n; e++) {
                            column[e] += c * y[i][e];
                        }
                    }
                }
                x[j] = column;
            }
            boolean settled = true;
            for (int i = 0; i < count; i++) {
                settled &= Math.abs(lambda[i] - previous[i]) <= TOLERANCE * Math.abs(lambda[i]);
            }
            // eigenvalues settle long before the vectors of a cluster of equal frequencies: also ask
            // each wanted vector to satisfy K φ = ω² M φ closely
            for (int i = 0; i < count && settled; i++) {
                settled = system.residual(x[i], m, lambda[i]) <= VECTOR_TOLERANCE;
            }
            if (settled) {
                break;
            }
            previous = lambda.clone();
        }
        List<Mode> modes = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            modes.add(new Mode(lambda[i], toNodes(model, x[i]), system.residual(x[i], m, lambda[i])));
        }
        return modes;
    }

    /** Start vectors: the mass diagonal, then seeded random vectors weighted by the mass (deterministic). */
    private static double[][] start(double[] m, int q) {
        Random random = new Random(SEED);
        double[][] x = new double[q][m.length];
        for (int j = 0; j < q; j++) {
            for (int e = 0; e < m.length; e++) {
                x[j][e] = j == 0 ? m[e] : m[e] * (random.nextDouble() - 0.5);
            }
        }
        return x;
    }

    private static double[] times(double[] m, double[] v) {
        double[] out = new double[v.length];
        for (int e = 0; e < v.length; e++) {
            out[e] = m[e] * v[e];
        }
        return out;
    }

    /** A free-DOF vector as nodes × 6 in tower axes (eliminated DOFs 0). */
    private static double[] toNodes(StructuralModel model, double[] free) {
        DofNumbering numbering = model.numbering();
        List<Node> nodes = model.frame().nodes();
        double[] out = new double[nodes.size() * 6];
        for (int n = 0; n < nodes.size(); n++) {
            double[] local = new double[6];
            for (int k = 0; k < numbering.dofsPerNode(); k++) {
                int code = numbering.code(n, k);
                local[k] = code >= 0 ? free[code] : 0;
            }
            System.arraycopy(model.constraints().toGlobal(n, local), 0, out, 6 * n, 6);
        }
        return out;
    }
}
