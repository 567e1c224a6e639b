package tetrapod.solve;

import java.util.ArrayList;
import java.util.List;
import org.ejml.data.DMatrixRMaj;

/**
 * The directions in which a structure has no stiffness, found from its dense stiffness alone
 * (independently of {@link StabilityInspector} and {@link SpinningChains}), in two steps:
 * <ol>
 * <li>per node, the null space of the node's own 3×3 translation block and of its 3×3 rotation
 *     block of K, restricted to the axes no support holds. A vector v at one node with
 *     vᵀK_nn v = 0 is a zero-energy motion of the whole structure (K is positive semi-definite,
 *     so K v = 0): each is a constraint c·u = 0 at that node;
 * <li>the rigid motions left in K with those constraints and the supports (a straight chain of
 *     beam-columns spinning about its own axis on pinned supports spreads over many nodes): the
 *     null space of the whole reduced matrix, Jacobi-scaled (D^−½ K D^−½) so that translations
 *     and rotations weigh alike; each is a constraint φᵀu = 0 on the whole mode.
 * </ol>
 *
 * @param nullDirections per node index, the unit 6-vectors of step 1
 * @param free           per node index, an orthonormal basis of the other directions no support holds
 * @param modes          orthonormal vectors of length 6·nodes, step 2
 * @param nextEigenvalue the smallest scaled eigenvalue of step 2 counted as stiff (the gap to zero)
 */
record ReferenceRestraints(List<List<double[]>> nullDirections, List<List<double[]>> free, List<double[]> modes,
                           double nextEigenvalue) {

    /** Step 1: eigenvalues of a restricted block below this fraction of the block's largest are zero. */
    static final double NODE_TOLERANCE = 1e-9;
    /** Step 2: eigenvalues of the Jacobi-scaled reduced matrix (diagonal 1) below this are zero. */
    static final double MODE_TOLERANCE = 1e-10;

    /**
     * @param held per node index and DOF (ux … rz), true where a support holds it or it is not a
     *             degree of freedom (input)
     */
    static ReferenceRestraints find(DenseSystem system, boolean[][] held) {
        List<List<double[]>> nulls = new ArrayList<>();
        List<List<double[]>> free = new ArrayList<>();
        for (int n = 0; n < system.nodes(); n++) {
            List<double[]> none = new ArrayList<>();
            List<double[]> rest = new ArrayList<>();
            for (int part = 0; part < 2; part++) {
                split(system.matrix(), n, 3 * part, held[n], none, rest);
            }
            nulls.add(none);
            free.add(rest);
        }
        DMatrixRMaj reduced = system.reduced(free);
        int m = reduced.numRows;
        double[] scale = new double[m];
        for (int q = 0; q < m; q++) {
            scale[q] = 1 / Math.sqrt(reduced.get(q, q));
        }
        DMatrixRMaj scaled = new DMatrixRMaj(m, m);
        for (int r = 0; r < m; r++) {
            for (int c = 0; c < m; c++) {
                scaled.set(r, c, scale[r] * reduced.get(r, c) * scale[c]);
            }
        }
        SymmetricEigen eig = new SymmetricEigen(scaled);
        List<double[]> modes = new ArrayList<>();
        int k = 0;
        for (; k < m && eig.value(k) < MODE_TOLERANCE; k++) {
            double[] y = eig.vector(k);
            for (int q = 0; q < m; q++) {
                y[q] *= scale[q];
            }
            modes.add(orthonormalised(expand(free, y), modes));
        }
        return new ReferenceRestraints(nulls, free, modes, k < m ? eig.value(k) : Double.NaN);
    }

    /**
     * Splits the axes {@code first … first + 2} of node n that are not held into the null space
     * of their block of K ({@code none}) and the rest ({@code rest}), as 6-vectors.
     */
    private static void split(DMatrixRMaj k, int n, int first, boolean[] held, List<double[]> none, List<double[]> rest) {
        List<Integer> axes = new ArrayList<>();
        for (int q = first; q < first + 3; q++) {
            if (!held[q]) {
                axes.add(q);
            }
        }
        DMatrixRMaj whole = new DMatrixRMaj(3, 3);
        DMatrixRMaj block = new DMatrixRMaj(axes.size(), axes.size());
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                whole.set(r, c, k.get(6 * n + first + r, 6 * n + first + c));
            }
        }
        for (int r = 0; r < axes.size(); r++) {
            for (int c = 0; c < axes.size(); c++) {
                block.set(r, c, k.get(6 * n + axes.get(r), 6 * n + axes.get(c)));
            }
        }
        double largest = new SymmetricEigen(whole).largest();
        SymmetricEigen eig = new SymmetricEigen(block);
        for (int e = 0; e < axes.size(); e++) {
            double[] v = eig.vector(e);
            double[] six = new double[6];
            for (int a = 0; a < axes.size(); a++) {
                six[axes.get(a)] = v[a];
            }
            (eig.value(e) <= NODE_TOLERANCE * largest ? none : rest).add(six);
        }
    }

    /** Z·y: the reduced vector y as 6 components per node. */
    private static double[] expand(List<List<double[]>> free, double[] y) {
        double[] out = new double[6 * free.size()];
        int q = 0;
        for (int n = 0; n < free.size(); n++) {
            for (double[] z : free.get(n)) {
                for (int r = 0; r < 6; r++) {
                    out[6 * n + r] += z[r] * y[q];
                }
                q++;
            }
        }
        return out;
    }

    /** v made orthogonal to {@code previous} (orthonormal) and of unit length (Gram–Schmidt). */
    static double[] orthonormalised(double[] v, List<double[]> previous) {
        for (double[] p : previous) {
            double d = NaturalElement.dot(p, v);
            for (int r = 0; r < v.length; r++) {
                v[r] -= d * p[r];
            }
        }
        double norm = Math.sqrt(NaturalElement.dot(v, v));
        for (int r = 0; r < v.length; r++) {
            v[r] /= norm;
        }
        return v;
    }
}
