package tetrapod.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.ops.DConvertMatrixStruct;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.ejml.sparse.csc.CommonOps_DSCC;

/**
 * The elastic critical load factor α_cr of a load case (EN 1993-1-1 5.2.1 (3)): the factor by
 * which the case's member axial forces can grow before the structure buckles as a whole,
 * (K + α K_G) φ = 0 with K_G the geometric stiffness of the axial forces ({@link
 * GeometricLines}): the chord rotation (P-Δ) of every member, a bracing member split at nodes that
 * only its bending holds taken as one straight line, so that a member's own buckling between its
 * end nodes (P-δ, covered by the member checks) does not enter α_cr. Written as
 * (−K_G) φ = μ K φ with μ = 1/α, the largest positive μ gives α_cr. It is found by the Lanczos
 * method on K⁻¹(−K_G), symmetric in the K inner product, with the one Cholesky factor of K, full
 * reorthogonalisation and a seeded start, stopped when the Ritz residual estimate β_m |s_m| of the
 * largest μ is below {@link #TOLERANCE} of it (B. N. Parlett, <i>The Symmetric Eigenvalue
 * Problem</i>, ch. 13, recalled from memory). The legs of a tall tower give many close μ, which a
 * subspace iteration of a few vectors approaches slowly (45–60 iterations of 6 solves each on a
 * 50,000-DOF tower; Lanczos takes one solve per step). Tension (negative μ) stiffens and
 * never buckles; a case whose forces cannot buckle the structure has α_cr = +∞.
 */
public final class CriticalLoad {

    /**
     * Convergence: μ changes by at most this, relative, between iterations. α_cr is read to three
     * figures (the 10 and 3 limits, the factor 1/(1 − 1/α_cr)); a 50,000-DOF tower's leg modes lie
     * close together, converge slowly, and took 45–60 iterations to 1e-9 against 32–45 to 1e-6
     * (α_cr then within 2e-6 of the 1e-9 value).
     */
    /** Converged when the Ritz residual of the largest μ is at most this, relative to μ. */
    static final double TOLERANCE = 1e-9;
    /** Most Lanczos steps (vectors kept for the reorthogonalisation). */
    static final int MAX_STEPS = 300;
    /** The tridiagonal problem is solved every this many steps to test convergence. */
    private static final int CHECK_EVERY = 4;
    /** A largest μ below this fraction of the largest |μ| is round-off (α_cr above 10¹⁰ times the smallest). */
    private static final double ROUND_OFF = 1e-10;
    private static final long SEED = 0xA1FACE;

    private CriticalLoad() { }

    /**
     * α_cr of the member axial forces {@code axial} (N, tension positive, frame member order).
     *
     * @return α_cr > 0, or {@link Double#POSITIVE_INFINITY} when no compression can buckle the structure
     */
    public static double factor(FactoredSystem system, double[] axial) {
        return factors(system, List.of(axial))[0];
    }

    /**
     * α_cr of each set of member axial forces, in order: the Lanczos runs of all of them in step, their
     * solves of one step done together with one pass over the Cholesky factor (the solve reads the
     * whole factor, whatever the number of right-hand sides). Each value is the same to the last bit
     * as {@link #factor} gives alone: each run does the same operations in the same order, and the
     * block solve gives each right-hand side the bits of a solve of its own
     * ({@link SparseKernels#choleskySolve(DMatrixSparseCSC, double[], int)}).
     */
    public static double[] factors(FactoredSystem system, List<double[]> axial) {
        StructuralModel model = system.model();
        int n = model.numbering().freeCount();
        double[] out = new double[axial.size()];
        if (n == 0) {
            Arrays.fill(out, Double.POSITIVE_INFINITY);
            return out;
        }
        // start: v = K⁻¹ b for a seeded random b, so that K v = b is known (the same for every run)
        Random random = new Random(SEED);
        double[] b = new double[n];
        for (int e = 0; e < n; e++) {
            b[e] = random.nextDouble() - 0.5;
        }
        double[] first = b.clone();
        system.solveFree(first);
        List<Run> runs = new ArrayList<>(axial.size());
        for (double[] forces : axial) {
            runs.add(new Run(minusGeometric(model, forces), first, b, Math.min(MAX_STEPS, n)));
        }
        List<Run> active = new ArrayList<>(runs);
        while (!active.isEmpty()) {
            int q = active.size();
            double[] block = new double[n * q];                       // row by row: block[e * q + r]
            List<double[]> products = new ArrayList<>(q);
            for (int r = 0; r < q; r++) {
                double[] g = active.get(r).product();                 // −K_G v_j
                products.add(g);
                for (int e = 0; e < n; e++) {
                    block[e * q + r] = g[e];
                }
            }
            if (q == 1) {
                system.solveFree(block);                              // the same bits, one right-hand side
            } else {
                system.solveFree(block, q);                           // w = K⁻¹ (−K_G) v_j, K w = g
            }
            List<Run> next = new ArrayList<>(q);
            for (int r = 0; r < q; r++) {
                double[] w = new double[n];
                for (int e = 0; e < n; e++) {
                    w[e] = block[e * q + r];
                }
                if (!active.get(r).advance(w, products.get(r))) {
                    next.add(active.get(r));
                }
            }
            active = next;
        }
        for (int k = 0; k < out.length; k++) {
            out[k] = runs.get(k).alpha();
        }
        return out;
    }

    /** One Lanczos run: K-orthonormal vectors, the tridiagonal, and the largest Ritz value so far. */
    private static final class Run {
        private final DMatrixSparseCSC minusKg;
        private final int steps;
        private final List<double[]> v = new ArrayList<>();     // K-orthonormal Lanczos vectors
        private final List<double[]> kv = new ArrayList<>();    // K v of each, carried along (no product with K)
        private final double[] alpha;
        private final double[] beta;
        private int j;
        private double mu;
        private double scale;                                   // the largest |μ| met, for round-off

        Run(DMatrixSparseCSC minusKg, double[] first, double[] b, int steps) {
            this.minusKg = minusKg;
            this.steps = steps;
            this.alpha = new double[steps];
            this.beta = new double[steps];
            double norm = Math.sqrt(SparseKernels.dot(first, b));
            v.add(scaled(first, 1 / norm));
            kv.add(scaled(b, 1 / norm));
        }

        /** −K_G v_j, with α_j = v_j · (−K_G v_j). */
        double[] product() {
            double[] g = new double[v.get(j).length];
            SparseKernels.multiply(minusKg, v.get(j), g);
            alpha[j] = SparseKernels.dot(v.get(j), g);
            scale = Math.max(scale, Math.abs(alpha[j]));
            return g;
        }

        /**
         * Takes w = K⁻¹ g of this step ({@code g} is then K w): reorthogonalises, tests convergence and
         * makes the next vector; true when the run has ended.
         */
        boolean advance(double[] w, double[] g) {
            double[] kw = g;
            reorthogonalise(w, kw);
            beta[j] = Math.sqrt(Math.max(SparseKernels.dot(w, kw), 0));
            scale = Math.max(scale, beta[j]);
            boolean exhausted = beta[j] <= 1e-14 * Math.max(Math.abs(alpha[j]), Double.MIN_NORMAL) || j + 1 == steps;
            if (exhausted || (j + 1) % CHECK_EVERY == 0) {
                double[] ritz = largestRitz(alpha, beta, j + 1);
                mu = ritz[0];
                if (exhausted || Math.abs(beta[j] * ritz[1]) <= TOLERANCE * Math.abs(mu)) {
                    return true;
                }
            }
            v.add(scaled(w, 1 / beta[j]));
            kv.add(scaled(kw, 1 / beta[j]));
            j++;
            return false;
        }

        /**
         * Full reorthogonalisation, twice: for every i ≤ j, c = kv_i · w, then w −= c v_i and
         * kw −= c kv_i. One pass over the vectors per i: the next product is summed in the same loop
         * as the subtractions, element by element in the order a dot product of its own takes, from
         * the w they leave, so every bit is as in three separate loops.
         */
        private void reorthogonalise(double[] w, double[] kw) {
            int n = w.length;
            double c = SparseKernels.dot(kv.get(0), w);
            for (int pass = 0; pass < 2; pass++) {
                for (int i = 0; i <= j; i++) {
                    double[] vi = v.get(i);
                    double[] kvi = kv.get(i);
                    if (pass == 1 && i == j) {
                        for (int e = 0; e < n; e++) {
                            w[e] -= c * vi[e];
                            kw[e] -= c * kvi[e];
                        }
                        return;
                    }
                    double[] next = kv.get(i < j ? i + 1 : 0);
                    double sum = 0;
                    for (int e = 0; e < n; e++) {
                        w[e] -= c * vi[e];
                        kw[e] -= c * kvi[e];
                        sum += next[e] * w[e];
                    }
                    c = sum;
                }
            }
        }

        /** α_cr = 1/μ; tension alone: no positive μ beyond the round-off of the largest tension ones. */
        double alpha() {
            return mu > ROUND_OFF * scale ? 1 / mu : Double.POSITIVE_INFINITY;
        }
    }

    /**
     * The largest eigenvalue θ of the m×m tridiagonal T (diagonal {@code alpha}, off-diagonal
     * {@code beta}) and the last component of its unit eigenvector: β_m |s_m| bounds the residual of
     * the Ritz pair (Lanczos' error estimate).
     */
    private static double[] largestRitz(double[] alpha, double[] beta, int m) {
        DMatrixRMaj t = new DMatrixRMaj(m, m);
        for (int i = 0; i < m; i++) {
            t.set(i, i, alpha[i]);
            if (i + 1 < m) {
                t.set(i, i + 1, beta[i]);
                t.set(i + 1, i, beta[i]);
            }
        }
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(m, true, true);
        if (!eig.decompose(t)) {
            throw new IllegalStateException("critical load: the tridiagonal eigenproblem of " + m + " steps failed");
        }
        int best = 0;
        for (int k = 1; k < m; k++) {
            if (eig.getEigenvalue(k).getReal() > eig.getEigenvalue(best).getReal()) {
                best = k;
            }
        }
        DMatrixRMaj s = eig.getEigenVector(best);
        double length = 0;
        for (int i = 0; i < m; i++) {
            length += s.get(i) * s.get(i);
        }
        return new double[] {eig.getEigenvalue(best).getReal(), s.get(m - 1) / Math.sqrt(length)};
    }

    private static double[] scaled(double[] x, double factor) {
        double[] out = new double[x.length];
        for (int e = 0; e < x.length; e++) {
            out[e] = factor * x[e];
        }
        return out;
    }

    /** −K_G on the free DOFs, both triangles, line by line ({@link GeometricLines}). */
    private static DMatrixSparseCSC minusGeometric(StructuralModel model, double[] axial) {
        DofNumbering numbering = model.numbering();
        int free = numbering.freeCount();
        List<GeometricLines> lines = model.geometricLines();
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(free, free, 36 * lines.size());
        for (GeometricLines line : lines) {
            double n = line.axial(axial);
            if (n == 0) {
                continue;
            }
            double[] k = line.matrix(model.constraints(), -n);
            int[] codes = line.codes(numbering);
            for (int r = 0; r < 6; r++) {
                for (int c = 0; c < 6; c++) {
                    if (codes[r] >= 0 && codes[c] >= 0 && k[6 * r + c] != 0) {
                        t.addItem(codes[r], codes[c], k[6 * r + c]);
                    }
                }
            }
        }
        DMatrixSparseCSC csc = DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
        CommonOps_DSCC.duplicatesAdd(csc, null);
        return csc;
    }

    /** Member axial forces of a solution in frame member order, N. */
    public static double[] axialForces(Solution solution) {
        List<MemberEndForces> forces = solution.memberForces();
        double[] out = new double[forces.size()];
        Arrays.setAll(out, m -> forces.get(m).axial());
        return out;
    }
}
