package tetrapod.solve;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.SectionProperties;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/**
 * An independent dense solution of a frame, written separately from the solver under test:
 * global DOFs for every node, element matrices built from natural deformations
 * (k = Bᵀ·k_n·B, the "natural stiffness" route of J.H. Argyris's matrix displacement method, as
 * opposed to the solver's explicit 12×12 entries), constraints imposed by Lagrange multipliers
 * instead of elimination, solved by dense LU (EJML DDRM).
 */
final class DenseReference {

    /** A constraint: the 6-component direction c at a node with c·u = 0. */
    record Constraint(int node, double[] direction) { }

    final double[] u;          // 6 per node, global
    final double[] residual;   // K·u − F, 6 per node (reaction + auto-restraint force at each node)
    final Map<Integer, double[][]> memberEnd = new HashMap<>(); // member id → {f at i (local 6), f at j}
    private final Map<Integer, Integer> index;

    /**
     * @param constraints the supports are added here from the frame; pass the auto-restraints
     * @param loads       6 per node (global, in frame node order)
     */
    DenseReference(Frame frame, List<Constraint> constraints, double[] loads) {
        this(frame, constraints, List.of(), loads);
    }

    /**
     * @param continuity nodes held across a straight bracing line by its bending: each adds
     *                   k·BᵀB with w = B·u = P⊥(u_node − (1 − t) u_start − t u_end)
     */
    DenseReference(Frame frame, List<Constraint> constraints, List<ContinuityNode> continuity, double[] loads) {
        index = frame.nodeIndex();
        int nodes = frame.nodes().size();
        boolean truss = frame.idealisation() == Idealisation.TRUSS;
        int n = 6 * nodes;
        DMatrixRMaj k = new DMatrixRMaj(n, n);
        List<double[]> localK = new ArrayList<>();
        List<double[]> transforms = new ArrayList<>();
        for (Member m : frame.members()) {
            Node a = frame.nodes().get(index.get(m.i()));
            Node b = frame.nodes().get(index.get(m.j()));
            double[] t = transformation(a.position(), b.position(), m.orientation(), truss || m.axialOnly());
            double[] kl = localStiffness(frame, m, a.position().distanceTo(b.position()), truss || m.axialOnly());
            localK.add(kl);
            transforms.add(t);
            double[] kg = multiply(transpose(t, 12), multiply(kl, t, 12), 12);
            int[] dofs = new int[12];
            for (int q = 0; q < 6; q++) {
                dofs[q] = 6 * index.get(m.i()) + q;
                dofs[6 + q] = 6 * index.get(m.j()) + q;
            }
            for (int r = 0; r < 12; r++) {
                for (int c = 0; c < 12; c++) {
                    k.add(dofs[r], dofs[c], kg[12 * r + c]);
                }
            }
        }
        for (ContinuityNode c : continuity) {
            Vec3 start = frame.nodes().get(index.get(c.lineStart())).position();
            Vec3 end = frame.nodes().get(index.get(c.lineEnd())).position();
            Vec3 at = frame.nodes().get(index.get(c.node())).position();
            double t = at.distanceTo(start) / end.distanceTo(start);
            Vec3 e = end.minus(start).unit();
            double[] ev = {e.x(), e.y(), e.z()};
            int[] nodeOf = {index.get(c.lineStart()), index.get(c.node()), index.get(c.lineEnd())};
            double[] weight = {-(1 - t), 1, -t};
            // rows of B: w_r = Σ_n weight_n Σ_s (δ_rs − e_r e_s) u_n,s
            for (int r = 0; r < 3; r++) {
                double[] row = new double[n];
                for (int a = 0; a < 3; a++) {
                    for (int q = 0; q < 3; q++) {
                        row[6 * nodeOf[a] + q] += weight[a] * ((r == q ? 1 : 0) - ev[r] * ev[q]);
                    }
                }
                for (int x = 0; x < n; x++) {
                    if (row[x] == 0) {
                        continue;
                    }
                    for (int y = 0; y < n; y++) {
                        if (row[y] != 0) {
                            k.add(x, y, c.stiffness() * row[x] * row[y]);
                        }
                    }
                }
            }
        }
        List<Constraint> all = new ArrayList<>(constraints);
        for (Support s : frame.supports()) {
            for (int q = 0; q < (truss ? 3 : 6); q++) {
                if (s.restraint().holds(q)) {
                    double[] c = new double[6];
                    c[q] = 1;
                    all.add(new Constraint(s.node(), c));
                }
            }
        }
        if (truss) { // rotations are not DOFs of a truss: hold them
            for (Node node : frame.nodes()) {
                for (int q = 3; q < 6; q++) {
                    double[] c = new double[6];
                    c[q] = 1;
                    all.add(new Constraint(node.id(), c));
                }
            }
        }
        int m = all.size();
        double scale = 0; // constraint rows scaled like the stiffness, for a well-balanced KKT matrix
        for (int q = 0; q < n; q++) {
            scale = Math.max(scale, k.get(q, q));
        }
        DMatrixRMaj kkt = new DMatrixRMaj(n + m, n + m);
        CommonOps_DDRM.insert(k, kkt, 0, 0);
        for (int r = 0; r < m; r++) {
            Constraint c = all.get(r);
            int base = 6 * index.get(c.node());
            for (int q = 0; q < 6; q++) {
                kkt.set(n + r, base + q, scale * c.direction()[q]);
                kkt.set(base + q, n + r, scale * c.direction()[q]);
            }
        }
        DMatrixRMaj rhs = new DMatrixRMaj(n + m, 1);
        for (int q = 0; q < n; q++) {
            rhs.set(q, 0, loads[q]);
        }
        DMatrixRMaj x = new DMatrixRMaj(n + m, 1);
        if (!CommonOps_DDRM.solve(kkt, rhs, x)) {
            throw new IllegalStateException("dense reference system is singular");
        }
        u = new double[n];
        for (int q = 0; q < n; q++) {
            u[q] = x.get(q, 0);
        }
        DMatrixRMaj ku = new DMatrixRMaj(n, 1);
        CommonOps_DDRM.mult(k, new DMatrixRMaj(n, 1, true, u), ku);
        residual = new double[n];
        for (int q = 0; q < n; q++) {
            residual[q] = ku.get(q, 0) - loads[q];
        }
        for (int e = 0; e < frame.members().size(); e++) {
            Member mem = frame.members().get(e);
            double[] d = new double[12];
            for (int q = 0; q < 6; q++) {
                d[q] = u[6 * index.get(mem.i()) + q];
                d[6 + q] = u[6 * index.get(mem.j()) + q];
            }
            double[] local = multiplyVector(transforms.get(e), d, 12);
            double[] f = multiplyVector(localK.get(e), local, 12);
            memberEnd.put(mem.id(), new double[][] {java.util.Arrays.copyOfRange(f, 0, 6), java.util.Arrays.copyOfRange(f, 6, 12)});
        }
    }

    double[] displacement(int nodeId) {
        int b = 6 * index.get(nodeId);
        return java.util.Arrays.copyOfRange(u, b, b + 6);
    }

    double[] residualAt(int nodeId) {
        int b = 6 * index.get(nodeId);
        return java.util.Arrays.copyOfRange(residual, b, b + 6);
    }

    /** T (12×12) = blockdiag(λ, λ, λ, λ), rows of λ = local x, y, z in global components. */
    private static double[] transformation(Vec3 a, Vec3 b, Vec3 orientation, boolean axialOnly) {
        Vec3 x = b.minus(a).unit();
        Vec3 ref = orientation;
        if (axialOnly) { // y, z do not matter; any perpendicular pair
            ref = Math.abs(x.x()) < 0.5 ? new Vec3(1, 0, 0) : new Vec3(0, 1, 0);
        }
        Vec3 y = ref.minus(x.times(ref.dot(x))).unit();
        Vec3 z = x.cross(y);
        double[][] rows = {{x.x(), x.y(), x.z()}, {y.x(), y.y(), y.z()}, {z.x(), z.y(), z.z()}};
        double[] t = new double[144];
        for (int blk = 0; blk < 4; blk++) {
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    t[(3 * blk + r) * 12 + 3 * blk + c] = rows[r][c];
                }
            }
        }
        return t;
    }

    /**
     * Local 12×12 stiffness as Bᵀ·k_n·B. Natural deformations: elongation e = u2 − u1; twist
     * φ = θx2 − θx1; in the x–y plane the end rotations relative to the chord,
     * θz1 − (v2 − v1)/L and θz2 − (v2 − v1)/L, with k_n = (EIz/L)[4 2; 2 4]; in the x–z plane
     * θy1 + (w2 − w1)/L and θy2 + (w2 − w1)/L (w' = −θy), with (EIy/L)[4 2; 2 4].
     */
    private static double[] localStiffness(Frame frame, Member m, double l, boolean axialOnly) {
        SectionProperties p = m.section().properties();
        double e = frame.material().e();
        double g = frame.material().g();
        double[][] b = new double[6][12];
        b[0][0] = -1;
        b[0][6] = 1;
        double[] kn = new double[36];
        kn[0] = e * p.area() / l;
        if (!axialOnly) {
            b[1][3] = -1;
            b[1][9] = 1;
            b[2][5] = 1;
            b[2][1] = 1 / l;
            b[2][7] = -1 / l;
            b[3][11] = 1;
            b[3][1] = 1 / l;
            b[3][7] = -1 / l;
            b[4][4] = 1;
            b[4][2] = -1 / l;
            b[4][8] = 1 / l;
            b[5][10] = 1;
            b[5][2] = -1 / l;
            b[5][8] = 1 / l;
            kn[7] = g * p.torsion() / l;
            double ez = e * p.iv() / l;
            double ey = e * p.iu() / l;
            kn[2 * 6 + 2] = 4 * ez;
            kn[2 * 6 + 3] = 2 * ez;
            kn[3 * 6 + 2] = 2 * ez;
            kn[3 * 6 + 3] = 4 * ez;
            kn[4 * 6 + 4] = 4 * ey;
            kn[4 * 6 + 5] = 2 * ey;
            kn[5 * 6 + 4] = 2 * ey;
            kn[5 * 6 + 5] = 4 * ey;
        }
        double[] out = new double[144];
        for (int r = 0; r < 12; r++) {
            for (int c = 0; c < 12; c++) {
                double s = 0;
                for (int p1 = 0; p1 < 6; p1++) {
                    for (int p2 = 0; p2 < 6; p2++) {
                        s += b[p1][r] * kn[6 * p1 + p2] * b[p2][c];
                    }
                }
                out[12 * r + c] = s;
            }
        }
        return out;
    }

    private static double[] transpose(double[] a, int n) {
        double[] t = new double[n * n];
        for (int r = 0; r < n; r++) {
            for (int c = 0; c < n; c++) {
                t[c * n + r] = a[r * n + c];
            }
        }
        return t;
    }

    private static double[] multiply(double[] a, double[] b, int n) {
        double[] out = new double[n * n];
        for (int r = 0; r < n; r++) {
            for (int c = 0; c < n; c++) {
                double s = 0;
                for (int q = 0; q < n; q++) {
                    s += a[r * n + q] * b[q * n + c];
                }
                out[r * n + c] = s;
            }
        }
        return out;
    }

    private static double[] multiplyVector(double[] a, double[] v, int n) {
        double[] out = new double[n];
        for (int r = 0; r < n; r++) {
            double s = 0;
            for (int q = 0; q < n; q++) {
                s += a[r * n + q] * v[q];
            }
            out[r] = s;
        }
        return out;
    }

    /** The auto-restraints of a model as reference constraints. */
    static List<Constraint> constraintsOf(List<AutoRestraint> autos) {
        List<Constraint> out = new ArrayList<>();
        for (AutoRestraint a : autos) {
            double[] c = new double[6];
            Vec3 d = a.direction();
            int offset = a.dof().startsWith("r") ? 3 : 0;
            c[offset] = d.x();
            c[offset + 1] = d.y();
            c[offset + 2] = d.z();
            out.add(new Constraint(a.node(), c));
        }
        return out;
    }
}
