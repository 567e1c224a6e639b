package tetrapod.solve;

import java.util.Optional;
import org.ejml.data.DMatrixSparseCSC;
import tetrapod.common.ProgressListener;
import tetrapod.common.UnstableStructureException;

/**
 * Assembles and factorises a {@link StructuralModel} once; the {@link FactoredSystem} then solves
 * any number of load vectors.
 *
 * <p>Stability: a factorisation that fails (a pivot ≤ 0), or a pivot L(k,k)² below
 * {@link #PIVOT_RATIO} × the largest diagonal entry of K, triggers {@link MechanismDiagnosis},
 * which finds the free motion and names its nodes and directions. A small pivot that turns out to
 * belong to a motion with strain energy (a badly conditioned but stable structure) is accepted.
 */
public final class Solver {

    /** Pivot² / max diag(K) below which a mechanism is suspected. */
    public static final double PIVOT_RATIO = 1e-10;

    private Solver() { }

    /** {@link #factor(StructuralModel, ProgressListener)} without progress reports. */
    public static FactoredSystem factor(StructuralModel model) throws UnstableStructureException {
        return factor(model, ProgressListener.NONE);
    }

    /**
     * Assembles K and factorises it.
     *
     * @param model    input
     * @param progress told "assemble" and "factorise" (1 of 1 each when done)
     * @throws UnstableStructureException when the structure is a mechanism; its message names the
     *         free node(s) and direction(s) and the likely cause
     */
    public static FactoredSystem factor(StructuralModel model, ProgressListener progress) throws UnstableStructureException {
        Assembler.Blocks blocks = Assembler.assemble(model);
        progress.progress("assemble", 1, 1);
        DMatrixSparseCSC kff = blocks.kff();
        if (kff.numCols == 0) {
            progress.progress("factorise", 1, 1);
            return new FactoredSystem(model, kff, blocks.krf(), null);
        }
        double[] diagonal = SparseKernels.diagonal(kff);
        double maxDiagonal = 0;
        boolean zeroDiagonal = false;
        for (double d : diagonal) {
            maxDiagonal = Math.max(maxDiagonal, d);
        }
        for (double d : diagonal) {
            zeroDiagonal |= !(d > MechanismDiagnosis.ZERO_DIAGONAL * maxDiagonal);
        }
        Optional<DMatrixSparseCSC> lower = zeroDiagonal ? Optional.empty() : CholeskyFactor.factor(kff);
        if (lower.isEmpty()) {
            throw MechanismDiagnosis.diagnose(model, kff, false).orElseThrow();
        }
        DMatrixSparseCSC l = lower.get();
        for (int k = 0; k < l.numCols; k++) {
            double pivot = SparseKernels.factorDiagonal(l, k);
            if (pivot * pivot < PIVOT_RATIO * maxDiagonal) {
                Optional<UnstableStructureException> unstable = MechanismDiagnosis.diagnose(model, kff, true);
                if (unstable.isPresent()) {
                    throw unstable.get();
                }
                break;
            }
        }
        progress.progress("factorise", 1, 1);
        return new FactoredSystem(model, kff, blocks.krf(), l);
    }
}
