package tetrapod.solve;

import org.ejml.data.DMatrixSparseCSC;
import org.ejml.sparse.csc.misc.TriangularSolver_DSCC;

/** Small allocation-free operations on EJML CSC matrices that the solver repeats per load vector. */
final class SparseKernels {

    private SparseKernels() { }

    /** y = A·x (y output, overwritten; A and x input). */
    static void multiply(DMatrixSparseCSC a, double[] x, double[] y) {
        java.util.Arrays.fill(y, 0, a.numRows, 0);
        for (int col = 0; col < a.numCols; col++) {
            double xc = x[col];
            if (xc == 0) {
                continue;
            }
            for (int p = a.col_idx[col]; p < a.col_idx[col + 1]; p++) {
                y[a.nz_rows[p]] += a.nz_values[p] * xc;
            }
        }
    }

    /**
     * r = b − A·x for a symmetric A stored with both triangles, each entry accumulated in about
     * twice the working precision (error-free product with {@link Math#fma} and TwoSum, the
     * "Dot2" scheme of T. Ogita, S.M. Rump, S. Oishi, SIAM J. Sci. Comput. 26(6), 2005), so that
     * iterative refinement can reduce the residual below the round-off of a plain product.
     * Column j of A is read as row j (symmetry). r is output, b and x input.
     */
    static void residualSymmetric(DMatrixSparseCSC a, double[] b, double[] x, double[] r) {
        for (int j = 0; j < a.numCols; j++) {
            double sum = b[j];
            double compensation = 0;
            for (int p = a.col_idx[j]; p < a.col_idx[j + 1]; p++) {
                double product = -a.nz_values[p] * x[a.nz_rows[p]];
                double productError = Math.fma(-a.nz_values[p], x[a.nz_rows[p]], -product);
                double t = sum + product;
                double z = t - sum;
                compensation += (sum - (t - z)) + (product - z) + productError;
                sum = t;
            }
            r[j] = sum + compensation;
        }
    }

    /** Solves L·Lᵀ·x = b in place (b input, overwritten with x). L is the lower Cholesky factor. */
    static void choleskySolve(DMatrixSparseCSC lower, double[] b) {
        TriangularSolver_DSCC.solveL(lower, b);
        TriangularSolver_DSCC.solveTranL(lower, b);
    }

    /**
     * Solves L Lᵀ X = B in place for {@code q} right-hand sides held row by row ({@code b[i * q + r]}
     * is row i of right-hand side r): the factor is read twice in all, not twice per right-hand side.
     * Each right-hand side sees the operations of {@link #choleskySolve(DMatrixSparseCSC, double[])}
     * in the same order, so the results are the same to the last bit. The factor is EJML's lower
     * Cholesky factor, its diagonal entry first in each column.
     */
    static void choleskySolve(DMatrixSparseCSC lower, double[] b, int q) {
        int n = lower.numCols;
        int[] start = lower.col_idx;
        int[] rows = lower.nz_rows;
        double[] values = lower.nz_values;
        for (int col = 0; col < n; col++) {                       // L y = b
            int at = col * q;
            double d = values[start[col]];
            for (int r = 0; r < q; r++) {
                b[at + r] /= d;
            }
            for (int p = start[col] + 1; p < start[col + 1]; p++) {
                int row = rows[p] * q;
                double l = values[p];
                for (int r = 0; r < q; r++) {
                    b[row + r] -= l * b[at + r];
                }
            }
        }
        for (int col = n - 1; col >= 0; col--) {                  // Lᵀ x = y
            int at = col * q;
            for (int p = start[col] + 1; p < start[col + 1]; p++) {
                int row = rows[p] * q;
                double l = values[p];
                for (int r = 0; r < q; r++) {
                    b[at + r] -= l * b[row + r];
                }
            }
            double d = values[start[col]];
            for (int r = 0; r < q; r++) {
                b[at + r] /= d;
            }
        }
    }

    /** aᵀ b of two dense vectors of the same length. */
    static double dot(double[] a, double[] b) {
        double s = 0;
        for (int e = 0; e < a.length; e++) {
            s += a[e] * b[e];
        }
        return s;
    }

    /** The diagonal of A (0 where not stored), new array. */
    static double[] diagonal(DMatrixSparseCSC a) {
        double[] d = new double[a.numCols];
        for (int col = 0; col < a.numCols; col++) {
            for (int p = a.col_idx[col]; p < a.col_idx[col + 1]; p++) {
                if (a.nz_rows[p] == col) {
                    d[col] += a.nz_values[p];
                }
            }
        }
        return d;
    }

    /** The diagonal entry L(k,k) of a lower factor from EJML's up-looking Cholesky (stored first in its column). */
    static double factorDiagonal(DMatrixSparseCSC lower, int k) {
        int p = lower.col_idx[k];
        if (lower.nz_rows[p] == k) {
            return lower.nz_values[p];
        }
        for (p = lower.col_idx[k]; p < lower.col_idx[k + 1]; p++) {
            if (lower.nz_rows[p] == k) {
                return lower.nz_values[p];
            }
        }
        return 0;
    }
}
