package tetrapod.solve;

import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.ops.DConvertMatrixStruct;
import org.ejml.sparse.csc.CommonOps_DSCC;

/**
 * The elastic critical load factor α_cr of a load case (EN 1993-1-1 5.2.1 (3)): the factor by
 * which the case's member axial forces can grow before the structure buckles as a whole,
 * (K + α K_G) φ = 0 with K_G the geometric stiffness of the axial forces ({@link
 * GeometricLines}): the chord rotation (P-Δ) of every member, a bracing member split at nodes that
 * only its bending holds taken as one straight line, so that a member's own buckling between its
 * end nodes (P-δ, covered by the member checks) does not enter α_cr. Written as
 * (−K_G) φ = μ K φ with μ = 1/α, the largest positive μ gives α_cr; it is found by subspace iteration with the one Cholesky factor of K (Bathe,
 * <i>Finite Element Procedures</i> §11.6, recalled from memory). Tension (negative μ) stiffens and
 * never buckles; a case whose forces cannot buckle the structure has α_cr = +∞.
 */
public final class CriticalLoad {

    /**
     * Convergence: μ changes by at most this, relative, between iterations. α_cr is read to three
     * figures (the 10 and 3 limits, the factor 1/(1 − 1/α_cr)); a 50,000-DOF tower's leg modes lie
     * close together, converge slowly, and took 45–60 iterations to 1e-9 against 32–45 to 1e-6
     * (α_cr then within 2e-6 of the 1e-9 value).
     */
    static final double TOLERANCE = 1e-6;
    static final int MAX_ITERATIONS = 300;
    private static final int VECTORS = 6;
    private static final long SEED = 0xA1FACE;

    private CriticalLoad() { }

    /**
     * α_cr of the member axial forces {@code axial} (N, tension positive, frame member order).
     *
     * @return α_cr > 0, or {@link Double#POSITIVE_INFINITY} when no compression can buckle the structure
     */
    public static double factor(FactoredSystem system, double[] axial) {
        StructuralModel model = system.model();
        int n = model.numbering().freeCount();
        if (n == 0) {
            return Double.POSITIVE_INFINITY;
        }
        DMatrixSparseCSC minusKg = minusGeometric(model, axial);
        int q = Math.min(VECTORS, n);
        Random random = new Random(SEED);
        double[][] x = new double[q][n];
        for (double[] v : x) {
            for (int e = 0; e < n; e++) {
                v[e] = random.nextDouble() - 0.5;
            }
        }
        double previous = Double.NaN;
        double mu = 0;
        double[][] y = new double[q][];
        double[][] gx = new double[q][];
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            double[] block = new double[n * q];
            for (int j = 0; j < q; j++) {
                gx[j] = new double[n];
                SparseKernels.multiply(minusKg, x[j], gx[j]);
                for (int e = 0; e < n; e++) {
                    block[e * q + j] = gx[j][e];
                }
            }
            system.solveFree(block, q);  // K y = −K_G x, every vector with one pass over the factor
            for (int j = 0; j < q; j++) {
                y[j] = new double[n];
                for (int e = 0; e < n; e++) {
                    y[j][e] = block[e * q + j];
                }
            }
            double[] ar = new double[q * q];
            double[] br = new double[q * q];
            for (int i = 0; i < q; i++) {
                double[] gy = new double[n];
                SparseKernels.multiply(minusKg, y[i], gy);
                for (int j = i; j < q; j++) {
                    ar[i * q + j] = ar[j * q + i] = dot(y[j], gy);      // Yᵀ (−K_G) Y
                    br[i * q + j] = br[j * q + i] = dot(y[j], gx[i]);   // Yᵀ K Y = Yᵀ (−K_G) X
                }
            }
            RitzProblem.symmetrise(br, q);
            RitzProblem ritz = RitzProblem.solve(ar, br, q);
            double[] values = ritz.values();
            mu = values[q - 1];
            for (int j = 0; j < q; j++) {
                double[] column = new double[n];
                for (int i = 0; i < q; i++) {
                    double c = ritz.vectors()[j][i];
                    for (int e = 0; e < n; e++) {
                        column[e] += c * y[i][e];
                    }
                }
                x[j] = column;
            }
            if (Math.abs(mu - previous) <= TOLERANCE * Math.abs(mu)) {
                break;
            }
            previous = mu;
        }
        return mu > 0 ? 1 / mu : Double.POSITIVE_INFINITY;
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

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int e = 0; e < a.length; e++) {
            s += a[e] * b[e];
        }
        return s;
    }

    /** Member axial forces of a solution in frame member order, N. */
    public static double[] axialForces(Solution solution) {
        List<MemberEndForces> forces = solution.memberForces();
        double[] out = new double[forces.size()];
        Arrays.setAll(out, m -> forces.get(m).axial());
        return out;
    }
}
