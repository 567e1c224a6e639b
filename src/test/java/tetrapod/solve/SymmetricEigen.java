package tetrapod.solve;

import java.util.Arrays;
import java.util.Comparator;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;

/**
 * Eigenvalues (ascending) and orthonormal eigenvectors of a dense symmetric matrix, by EJML's
 * symmetric QR algorithm: test code, independent of the solver's own small Jacobi solver.
 */
final class SymmetricEigen {

    private final double[] values;
    private final double[][] vectors;

    /** @param m symmetric matrix (input, not modified) */
    SymmetricEigen(DMatrixRMaj m) {
        int n = m.numRows;
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(n, true, true);
        if (!eig.decompose(m.copy())) {
            throw new IllegalStateException("symmetric eigen decomposition failed");
        }
        Integer[] order = new Integer[n];
        Arrays.setAll(order, k -> k);
        Arrays.sort(order, Comparator.comparingDouble(k -> eig.getEigenvalue(k).real));
        values = new double[n];
        vectors = new double[n][];
        for (int k = 0; k < n; k++) {
            values[k] = eig.getEigenvalue(order[k]).real;
            vectors[k] = Arrays.copyOf(eig.getEigenVector(order[k]).getData(), n);
        }
    }

    int size() {
        return values.length;
    }

    double value(int k) {
        return values[k];
    }

    /** Unit eigenvector k (new array). */
    double[] vector(int k) {
        return vectors[k].clone();
    }

    /** Largest |eigenvalue|. */
    double largest() {
        return values.length == 0 ? 0 : Math.max(Math.abs(values[0]), Math.abs(values[values.length - 1]));
    }
}
