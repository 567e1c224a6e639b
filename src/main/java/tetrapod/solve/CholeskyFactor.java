package tetrapod.solve;

import java.util.Optional;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.interfaces.linsol.LinearSolverSparse;
import org.ejml.sparse.FillReducing;
import org.ejml.sparse.csc.decomposition.chol.CholeskyUpLooking_DSCC;
import org.ejml.sparse.csc.factory.LinearSolverFactory_DSCC;

/**
 * Sparse Cholesky K = L·Lᵀ through EJML's {@code LinearSolverFactory_DSCC.cholesky(FillReducing.NONE)}
 * (up-looking algorithm of T.A. Davis, <i>Direct Methods for Sparse Linear Systems</i>, SIAM 2006,
 * §4.4). No permutation is applied: the DOF numbering is already banded. EJML reads only the
 * upper triangle of K. The lower factor L is kept, detached from the solver object, so that
 * solving needs no shared workspace and is safe from several threads.
 */
final class CholeskyFactor {

    private CholeskyFactor() { }

    /** L, or empty when K is not (numerically) positive definite. */
    static Optional<DMatrixSparseCSC> factor(DMatrixSparseCSC k) {
        LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> solver = LinearSolverFactory_DSCC.cholesky(FillReducing.NONE);
        if (!solver.setA(k)) {
            return Optional.empty();
        }
        CholeskyUpLooking_DSCC decomposition = solver.getDecomposition();
        return Optional.of(decomposition.getL());
    }
}
