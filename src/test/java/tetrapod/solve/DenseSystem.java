package tetrapod.solve;

import java.util.ArrayList;
import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * A structure's stiffness as one dense matrix over six DOFs per node (ux uy uz rx ry rz, tower
 * axes, nodes by index) and its solution. Test code, written apart from the solver under test:
 * constraints are given as the directions left free at each node (an orthonormal basis Z, so that
 * u = Z·y) plus whole modes φ with φᵀu = 0 (Lagrange multipliers), and the reduced system is
 * solved by dense LU (EJML DDRM).
 */
public final class DenseSystem {

    /** Eigenvalues of Σ c cᵀ below this count as zero when completing the constrained directions. */
    private static final double SPAN_TOLERANCE = 1e-12;

    private final int nodes;
    private final DMatrixRMaj k;

    public DenseSystem(int nodes) {
        this.nodes = nodes;
        this.k = new DMatrixRMaj(6 * nodes, 6 * nodes);
    }

    public int nodes() {
        return nodes;
    }

    /** The assembled stiffness, 6·nodes square (the live matrix: do not modify). */
    DMatrixRMaj matrix() {
        return k;
    }

    /** Adds member {@code e} between node indices i and j. */
    public void addMember(int i, int j, NaturalElement e) {
        double[] kg = e.global();
        for (int r = 0; r < 12; r++) {
            int row = r < 6 ? 6 * i + r : 6 * j + r - 6;
            for (int c = 0; c < 12; c++) {
                k.add(row, c < 6 ? 6 * i + c : 6 * j + c - 6, kg[12 * r + c]);
            }
        }
    }

    /**
     * Adds the bending continuity of a straight member through node index {@code node} between
     * its neighbours {@code start} and {@code end} on the line: energy ½k|w|² with
     * w = P⊥[u_node − (1 − t) u_start − t u_end], t = |node − start|/|end − start|,
     * P⊥ = I − e eᵀ across the line e = (end − start)/|end − start|; so K gains k·w_a·w_b·P⊥
     * in the translation block of every pair of the three nodes (weights w = −(1 − t), 1, −t).
     *
     * @param at        positions of start, node and end, m (input)
     * @param stiffness k, N/m
     */
    public void addContinuity(int start, int node, int end, double[][] at, double stiffness) {
        double[] line = new double[3];
        double[] part = new double[3];
        for (int q = 0; q < 3; q++) {
            line[q] = at[2][q] - at[0][q];
            part[q] = at[1][q] - at[0][q];
        }
        double length = Math.sqrt(NaturalElement.dot(line, line));
        double t = Math.sqrt(NaturalElement.dot(part, part)) / length;
        int[] at3 = {start, node, end};
        double[] weight = {-(1 - t), 1, -t};
        for (int a = 0; a < 3; a++) {
            for (int b = 0; b < 3; b++) {
                for (int r = 0; r < 3; r++) {
                    for (int c = 0; c < 3; c++) {
                        double across = (r == c ? 1 : 0) - line[r] * line[c] / (length * length);
                        k.add(6 * at3[a] + r, 6 * at3[b] + c, stiffness * weight[a] * weight[b] * across);
                    }
                }
            }
        }
    }

    /**
     * An orthonormal basis of the 6-vectors at a node orthogonal to every constrained one (the
     * null space of Σ c cᵀ).
     *
     * @param constrained 6-vectors, not necessarily orthogonal (input)
     */
    public static List<double[]> complement(List<double[]> constrained) {
        DMatrixRMaj m = new DMatrixRMaj(6, 6);
        for (double[] c : constrained) {
            for (int r = 0; r < 6; r++) {
                for (int q = 0; q < 6; q++) {
                    m.add(r, q, c[r] * c[q]);
                }
            }
        }
        SymmetricEigen eig = new SymmetricEigen(m);
        List<double[]> free = new ArrayList<>();
        for (int e = 0; e < 6; e++) {
            if (eig.value(e) < SPAN_TOLERANCE) {
                free.add(eig.vector(e));
            }
        }
        return free;
    }

    /** Zᵀ K Z for the free directions {@code free} (per node index, 6-vectors), new matrix. */
    DMatrixRMaj reduced(List<List<double[]>> free) {
        int[] offset = offsets(free);
        DMatrixRMaj out = new DMatrixRMaj(offset[nodes], offset[nodes]);
        double[] block = new double[36];
        for (int a = 0; a < nodes; a++) {
            for (int b = 0; b < nodes; b++) {
                if (!block(a, b, block)) {
                    continue;
                }
                for (int x = 0; x < free.get(a).size(); x++) {
                    double[] za = free.get(a).get(x);
                    for (int y = 0; y < free.get(b).size(); y++) {
                        double[] zb = free.get(b).get(y);
                        double s = 0;
                        for (int r = 0; r < 6; r++) {
                            for (int c = 0; c < 6; c++) {
                                s += za[r] * block[6 * r + c] * zb[c];
                            }
                        }
                        out.set(offset[a] + x, offset[b] + y, s);
                    }
                }
            }
        }
        return out;
    }

    /**
     * Solves K u = f for every load vector, with u in the span of the free directions and
     * φᵀu = 0 for every mode.
     *
     * @param free  per node index, orthonormal 6-vectors left free (input)
     * @param modes vectors of length 6·nodes in the span of the free directions (input)
     * @param loads per case, 6 components per node, tower axes (input)
     * @return per case, the displacements, 6 per node
     * @throws IllegalStateException when the reduced system is singular
     */
    public double[][] solve(List<List<double[]>> free, List<double[]> modes, double[][] loads) {
        int[] offset = offsets(free);
        int m = offset[nodes];
        int p = modes.size();
        DMatrixRMaj kkt = new DMatrixRMaj(m + p, m + p);
        CommonOps_DDRM.insert(reduced(free), kkt, 0, 0);
        double scale = 0; // constraint rows scaled like the stiffness, for a well-balanced matrix
        for (int q = 0; q < m; q++) {
            scale = Math.max(scale, kkt.get(q, q));
        }
        for (int j = 0; j < p; j++) {
            double[] psi = project(free, offset, modes.get(j));
            for (int q = 0; q < m; q++) {
                kkt.set(m + j, q, scale * psi[q]);
                kkt.set(q, m + j, scale * psi[q]);
            }
        }
        DMatrixRMaj rhs = new DMatrixRMaj(m + p, loads.length);
        for (int c = 0; c < loads.length; c++) {
            double[] fz = project(free, offset, loads[c]);
            for (int q = 0; q < m; q++) {
                rhs.set(q, c, fz[q]);
            }
        }
        LinearSolverDense<DMatrixRMaj> lu = LinearSolverFactory_DDRM.lu(m + p);
        if (!lu.setA(kkt)) {
            throw new IllegalStateException("dense reference system is singular");
        }
        DMatrixRMaj y = new DMatrixRMaj(m + p, loads.length);
        lu.solve(rhs, y);
        double[][] u = new double[loads.length][6 * nodes];
        for (int c = 0; c < loads.length; c++) {
            for (int n = 0; n < nodes; n++) {
                for (int x = 0; x < free.get(n).size(); x++) {
                    double v = y.get(offset[n] + x, c);
                    if (!Double.isFinite(v)) {
                        throw new IllegalStateException("dense reference system is singular");
                    }
                    double[] z = free.get(n).get(x);
                    for (int r = 0; r < 6; r++) {
                        u[c][6 * n + r] += z[r] * v;
                    }
                }
            }
        }
        return u;
    }

    /** K·u − f: the forces the constraints exert, 6 per node (new array). */
    public double[] residual(double[] u, double[] f) {
        double[] out = new double[6 * nodes];
        for (int r = 0; r < out.length; r++) {
            double s = -f[r];
            for (int c = 0; c < out.length; c++) {
                s += k.get(r, c) * u[c];
            }
            out[r] = s;
        }
        return out;
    }

    /** Zᵀ v. */
    private double[] project(List<List<double[]>> free, int[] offset, double[] v) {
        double[] out = new double[offset[nodes]];
        for (int n = 0; n < nodes; n++) {
            for (int x = 0; x < free.get(n).size(); x++) {
                double[] z = free.get(n).get(x);
                for (int r = 0; r < 6; r++) {
                    out[offset[n] + x] += z[r] * v[6 * n + r];
                }
            }
        }
        return out;
    }

    private int[] offsets(List<List<double[]>> free) {
        int[] offset = new int[nodes + 1];
        for (int n = 0; n < nodes; n++) {
            offset[n + 1] = offset[n] + free.get(n).size();
        }
        return offset;
    }

    /** Copies block (a, b) of K into {@code into} (6×6); false when it is all zero. */
    private boolean block(int a, int b, double[] into) {
        boolean any = false;
        for (int r = 0; r < 6; r++) {
            for (int c = 0; c < 6; c++) {
                into[6 * r + c] = k.get(6 * a + r, 6 * b + c);
                any |= into[6 * r + c] != 0;
            }
        }
        return any;
    }
}
