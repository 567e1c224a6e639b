package tetrapod.solve;

import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.ops.DConvertMatrixStruct;
import org.ejml.sparse.csc.CommonOps_DSCC;

/**
 * Assembles the structure's stiffness from its elements into EJML sparse matrices, with the
 * eliminated DOFs (supports, auto-restraints) dropped from the system:
 * <ul>
 * <li>{@code kff}: free × free, both triangles stored (EJML's Cholesky reads only the upper one;
 *     the lower one serves residuals and diagnosis);
 * <li>{@code krf}: restrained × free, for the reactions R = K_rf·u_f − F_r (no settlements, so
 *     the restrained displacements are zero).
 * </ul>
 * Triplets → CSC with {@link DConvertMatrixStruct#convert}, duplicates (several elements at one
 * node) summed with {@link CommonOps_DSCC#duplicatesAdd}.
 */
final class Assembler {

    /** The two assembled blocks. */
    record Blocks(DMatrixSparseCSC kff, DMatrixSparseCSC krf) { }

    private Assembler() { }

    static Blocks assemble(StructuralModel model) {
        DofNumbering numbering = model.numbering();
        int free = numbering.freeCount();
        int restrained = numbering.restrainedCount();
        long estimate = 0;
        for (MemberElement e : model.elements()) {
            estimate += (long) e.size() * e.size();
        }
        DMatrixSparseTriplet ff = new DMatrixSparseTriplet(free, free, (int) Math.min(estimate, Integer.MAX_VALUE - 8));
        DMatrixSparseTriplet rf = new DMatrixSparseTriplet(restrained, free, 16);
        for (MemberElement e : model.elements()) {
            add(e.assemblyMatrix(model.constraints()), e.codes(numbering), ff, rf);
        }
        for (ContinuityElement c : model.continuity()) {
            add(c.assemblyMatrix(model.constraints()), c.codes(numbering), ff, rf);
        }
        return new Blocks(compress(ff), compress(rf));
    }

    /** Adds element matrix {@code k} (row-major, one row per code) at DOF {@code codes}. */
    private static void add(double[] k, int[] codes, DMatrixSparseTriplet ff, DMatrixSparseTriplet rf) {
        int size = codes.length;
        for (int r = 0; r < size; r++) {
            int row = codes[r];
            for (int c = 0; c < size; c++) {
                int col = codes[c];
                // the upper triangle mirrored, so that the stored matrix is exactly symmetric
                double v = r <= c ? k[r * size + c] : k[c * size + r];
                if (col < 0 || v == 0) {
                    continue;
                }
                if (row >= 0) {
                    ff.addItem(row, col, v);
                } else {
                    rf.addItem(-1 - row, col, v);
                }
            }
        }
    }

    private static DMatrixSparseCSC compress(DMatrixSparseTriplet triplet) {
        DMatrixSparseCSC csc = DConvertMatrixStruct.convert(triplet, (DMatrixSparseCSC) null);
        CommonOps_DSCC.duplicatesAdd(csc, null);
        return csc;
    }
}
