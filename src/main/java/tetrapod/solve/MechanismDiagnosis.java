package tetrapod.solve;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.dense.row.SingularOps_DDRM;
import tetrapod.common.UnstableStructureException;
import tetrapod.common.UnstableStructureException.FreeDof;
import tetrapod.model.Frame;
import tetrapod.model.Node;
import tetrapod.model.Support;

/**
 * Finds how an unstable structure moves, to tell people which node is free in which direction.
 *
 * <p>A mechanism is a displacement φ with K·φ = 0. It is found by inverse iteration on the pencil
 * (K, D), D = diag(K), using a factor of the slightly regularised K + α·D (α = 1e-10, raised if
 * that still fails): every iteration multiplies the mechanism components by ~λ₂/α relative to the
 * others, so a few iterations isolate the (possibly several) zero-energy modes. The Rayleigh
 * quotient φᵀKφ / φᵀDφ confirms it: below {@link #MECHANISM_RATIO} the motion costs no strain
 * energy. DOFs with no stiffness at all (zero diagonal) are reported directly.
 *
 * <p>The likely cause is "no support restrains the structure" when the supports' restrained
 * directions cannot stop the six rigid-body motions (the 6-column matrix of rigid-body
 * displacements at the supported DOFs has rank &lt; 6), otherwise "a mechanism: a panel or node is
 * not braced in this direction".
 */
final class MechanismDiagnosis {

    /** Rayleigh quotient below which a mode is a mechanism (relative to the diagonal stiffness). */
    static final double MECHANISM_RATIO = 1e-12;
    /** A diagonal below this fraction of the largest has no stiffness at all. */
    static final double ZERO_DIAGONAL = 1e-14;
    private static final int ITERATIONS = 5;
    private static final int MAX_NODES_NAMED = 8;
    static final String NO_SUPPORT = "no support restrains the structure: the supports cannot stop it moving as a rigid body";
    static final String MECHANISM = "a mechanism: a panel or node is not braced in this direction";
    private static final String[] DOF = {"ux", "uy", "uz", "rx", "ry", "rz"};

    private MechanismDiagnosis() { }

    /**
     * The instability of {@code kff}, or empty when the lowest mode costs strain energy after all
     * (only possible when {@code factored} is true: a small pivot from a badly conditioned but
     * stable structure).
     *
     * @param kff      free × free stiffness, both triangles (input, not modified)
     * @param factored whether the plain Cholesky factorisation succeeded
     */
    static Optional<UnstableStructureException> diagnose(StructuralModel model, DMatrixSparseCSC kff, boolean factored) {
        int n = kff.numCols;
        double[] d = SparseKernels.diagonal(kff);
        double max = 0;
        for (double v : d) {
            max = Math.max(max, v);
        }
        double[] mode = new double[n];
        boolean zeroDiagonal = false;
        for (int k = 0; k < n; k++) {
            if (!(d[k] > ZERO_DIAGONAL * max)) {
                mode[k] = 1;
                zeroDiagonal = true;
            }
        }
        if (!zeroDiagonal) {
            Optional<double[]> found = lowestMode(kff, d);
            if (found.isEmpty()) {
                return factored ? Optional.empty()
                        : Optional.of(exception(model, null, "the stiffness matrix could not be factorised"));
            }
            mode = found.get();
            double[] km = new double[n];
            SparseKernels.multiply(kff, mode, km);
            double num = 0;
            double den = 0;
            for (int k = 0; k < n; k++) {
                num += mode[k] * km[k];
                den += mode[k] * d[k] * mode[k];
            }
            if (factored && num > MECHANISM_RATIO * den) {
                return Optional.empty();
            }
        }
        return Optional.of(exception(model, mode, null));
    }

    /** Inverse iteration with a factor of K + α·D; empty if no α makes it factorisable. */
    private static Optional<double[]> lowestMode(DMatrixSparseCSC kff, double[] d) {
        int n = kff.numCols;
        for (double alpha = 1e-10; alpha <= 1e-4; alpha *= 100) {
            DMatrixSparseCSC shifted = kff.copy();
            for (int col = 0; col < n; col++) {
                for (int p = shifted.col_idx[col]; p < shifted.col_idx[col + 1]; p++) {
                    if (shifted.nz_rows[p] == col) {
                        shifted.nz_values[p] += alpha * d[col];
                    }
                }
            }
            Optional<DMatrixSparseCSC> factor = CholeskyFactor.factor(shifted);
            if (factor.isEmpty()) {
                continue;
            }
            DMatrixSparseCSC lower = factor.get();
            Random random = new Random(0x7e7a90dL); // fixed: the same input gives the same message
            double[] x = new double[n];
            for (int k = 0; k < n; k++) {
                x[k] = random.nextDouble() - 0.5;
            }
            for (int it = 0; it < ITERATIONS; it++) {
                for (int k = 0; k < n; k++) {
                    x[k] *= d[k];
                }
                SparseKernels.choleskySolve(lower, x);
                double norm = 0;
                for (int k = 0; k < n; k++) {
                    norm += x[k] * d[k] * x[k];
                }
                norm = Math.sqrt(norm);
                if (!(norm > 0) || !Double.isFinite(norm)) {
                    break;
                }
                for (int k = 0; k < n; k++) {
                    x[k] /= norm;
                }
            }
            return Optional.of(x);
        }
        return Optional.empty();
    }

    /** The exception naming the nodes that move most in {@code mode} (free-DOF vector; may be null). */
    static UnstableStructureException exception(StructuralModel model, double[] mode, String detail) {
        if (mode == null) {
            return new UnstableStructureException("unstable structure: " + detail + "; likely cause: "
                    + cause(model), List.of());
        }
        int nodes = model.frame().nodes().size();
        double[][] motion = new double[nodes][6];
        DofNumbering numbering = model.numbering();
        for (int eq = 0; eq < mode.length; eq++) {
            motion[numbering.freeNode(eq)][numbering.freeDof(eq)] = mode[eq];
        }
        double scale = model.size();
        double[] amplitude = new double[nodes];
        double top = 0;
        for (int n = 0; n < nodes; n++) {
            motion[n] = model.constraints().toGlobal(n, motion[n]);
            for (int k = 0; k < 6; k++) {
                amplitude[n] = Math.max(amplitude[n], Math.abs(motion[n][k]) * (k < 3 ? 1 : scale));
            }
            top = Math.max(top, amplitude[n]);
        }
        List<Integer> moving = new ArrayList<>();
        for (int n = 0; n < nodes; n++) {
            if (top > 0 && amplitude[n] >= 0.5 * top) {
                moving.add(n);
            }
        }
        Frame frame = model.frame();
        moving.sort(Comparator.<Integer>comparingDouble(n -> -amplitude[n]).thenComparingInt(n -> frame.nodes().get(n).id()));
        List<FreeDof> free = new ArrayList<>();
        StringBuilder text = new StringBuilder("unstable structure: free motion at ");
        int named = Math.min(moving.size(), MAX_NODES_NAMED);
        for (int s = 0; s < named; s++) {
            int n = moving.get(s);
            int id = frame.nodes().get(n).id();
            List<String> dofs = new ArrayList<>();
            for (int k = 0; k < 6; k++) {
                if (Math.abs(motion[n][k]) * (k < 3 ? 1 : scale) >= 0.5 * amplitude[n]) {
                    dofs.add(DOF[k]);
                    free.add(new FreeDof(id, DOF[k]));
                }
            }
            text.append(s == 0 ? "" : ", ").append("node ").append(id).append(" (").append(String.join(", ", dofs)).append(')');
        }
        if (moving.size() > named) {
            text.append(" and ").append(moving.size() - named).append(" more nodes");
        }
        if (unconnected(model, moving)) {
            text.append("; likely cause: the node is not connected to any member");
        } else {
            text.append("; likely cause: ").append(cause(model));
        }
        return new UnstableStructureException(text.toString(), free);
    }

    private static boolean unconnected(StructuralModel model, List<Integer> moving) {
        boolean[] connected = new boolean[model.frame().nodes().size()];
        for (MemberElement e : model.elements()) {
            connected[e.i()] = true;
            connected[e.j()] = true;
        }
        return !moving.isEmpty() && moving.stream().noneMatch(n -> connected[n]);
    }

    private static String cause(StructuralModel model) {
        return supportsStopRigidMotion(model) ? MECHANISM : NO_SUPPORT;
    }

    /**
     * Whether the supports' restrained directions stop all six rigid-body motions: the matrix
     * whose row for each restrained support DOF holds that DOF's displacement under the three unit
     * translations and three unit rotations (about the centroid, lengths scaled by the structure
     * size) has rank 6.
     */
    static boolean supportsStopRigidMotion(StructuralModel model) {
        Frame frame = model.frame();
        boolean isFrame = frame.idealisation().hasRotations();
        double[] c = new double[3];
        for (Node n : frame.nodes()) {
            c[0] += n.x() / frame.nodes().size();
            c[1] += n.y() / frame.nodes().size();
            c[2] += n.z() / frame.nodes().size();
        }
        double s = model.size();
        List<double[]> rows = new ArrayList<>();
        for (Support sup : frame.supports()) {
            Node node = frame.nodes().get(model.nodeIndex(sup.node()));
            double[] p = {(node.x() - c[0]) / s, (node.y() - c[1]) / s, (node.z() - c[2]) / s};
            for (int a = 0; a < (isFrame ? 6 : 3); a++) {
                if (!sup.restraint().holds(a)) {
                    continue;
                }
                double[] row = new double[6];
                if (a < 3) {
                    row[a] = 1;
                    for (int b = 0; b < 3; b++) { // (e_b × p)_a
                        double[] e = new double[3];
                        e[b] = 1;
                        double[] cross = {e[1] * p[2] - e[2] * p[1], e[2] * p[0] - e[0] * p[2], e[0] * p[1] - e[1] * p[0]};
                        row[3 + b] = cross[a];
                    }
                } else {
                    row[a] = 1;
                }
                rows.add(row);
            }
        }
        if (rows.size() < 6) {
            return false;
        }
        DMatrixRMaj m = new DMatrixRMaj(rows.size(), 6);
        for (int r = 0; r < rows.size(); r++) {
            for (int k = 0; k < 6; k++) {
                m.set(r, k, rows.get(r)[k]);
            }
        }
        double[] sv = SingularOps_DDRM.singularValues(m);
        double big = 0;
        for (double v : sv) {
            big = Math.max(big, v);
        }
        int rank = 0;
        for (double v : sv) {
            if (v > 1e-9 * big) {
                rank++;
            }
        }
        return rank == 6;
    }
}
