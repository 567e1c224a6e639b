package tetrapod.solve;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Restraint;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/**
 * Finds the instabilities that a lattice model has by construction, not by mistake, and
 * restrains them exactly (by eliminating the free direction, never with a spring):
 * <ul>
 * <li>a node where only axial members meet and every member lies in one plane (the midpoint of a
 *     redundant, a K-node) has no stiffness normal to that plane: that translation is eliminated;
 * <li>such a node whose members all lie on one line (a node splitting a straight leg) has no
 *     stiffness across the line: both perpendicular translations are eliminated;
 * <li>in the frame idealisation, a node where only pin-ended members meet has no rotational
 *     stiffness: rx, ry and rz are eliminated;
 * <li>in the frame idealisation, a straight chain of beam-columns (a leg between kinks) joined
 *     only by pin-ended members and pinned supports can spin about its own axis without
 *     resistance (torsion stiffness GJ only links the chain's nodes to each other): the rotation
 *     about the axis is eliminated at one node of the chain (its supported node if it has one).
 * </ul>
 * Otherwise a node joined by at least one beam-column is stiff in every translation and rotation.
 * Directions already held by a support are not restrained again; a direction with a component
 * along a held axis is not free and needs nothing. When the free direction is a global axis the
 * DOF is eliminated as it is; otherwise the node's translations get a rotated basis containing the
 * direction (see {@link NodeConstraints}) and the skew DOF is eliminated.
 *
 * <p>Genuine mechanisms (a missing support, an unbraced panel, a K-node without its horizontal)
 * are not looked for here: they are left in the matrix for the factorisation to find.
 */
final class StabilityInspector {

    /** Eigenvalues of Σ d dᵀ below this fraction of the member count count as zero (angles below ~1e-5 rad). */
    static final double PLANARITY_TOLERANCE = 1e-10;
    /** A unit vector this close to a global axis is taken as that axis. */
    private static final double AXIS_TOLERANCE = 1e-9;

    static final String PLANE_REASON = "all members meeting here lie in one plane: no stiffness normal to it";
    static final String LINE_REASON = "all members meeting here lie on one line: no stiffness across it";
    static final String PIN_REASON = "only pin-ended members meet here: no rotational stiffness";
    static final String SPIN_REASON = "a straight chain of beam-columns held only by pin-ended members and pinned supports: "
            + "nothing stops it spinning about its own axis";

    private static final String[] DOF = {"ux", "uy", "uz", "rx", "ry", "rz"};
    private static final Vec3[] AXES = {Vec3.X, Vec3.Y, Vec3.Z};

    private StabilityInspector() { }

    /**
     * @param frame        input
     * @param nodeIndex    node id → index in frame.nodes()
     * @param memberIsBeam per member index, true for a beam-column (always false in a truss)
     */
    static NodeConstraints inspect(Frame frame, Map<Integer, Integer> nodeIndex, boolean[] memberIsBeam) {
        int nodes = frame.nodes().size();
        boolean isFrame = frame.idealisation() == Idealisation.FRAME;
        List<List<Vec3>> directions = new ArrayList<>(nodes);
        boolean[] hasBeam = new boolean[nodes];
        for (int n = 0; n < nodes; n++) {
            directions.add(new ArrayList<>());
        }
        for (int m = 0; m < frame.members().size(); m++) {
            Member member = frame.members().get(m);
            int i = nodeIndex.get(member.i());
            int j = nodeIndex.get(member.j());
            Vec3 d = LocalAxes.direction(frame.nodes().get(i).position(), frame.nodes().get(j).position());
            directions.get(i).add(d);
            directions.get(j).add(d);
            if (memberIsBeam[m]) {
                hasBeam[i] = true;
                hasBeam[j] = true;
            }
        }
        byte[][] kinds = new byte[nodes][6];
        for (Support s : frame.supports()) {
            Restraint r = s.restraint();
            int n = nodeIndex.get(s.node());
            for (int k = 0; k < (isFrame ? 6 : 3); k++) {
                if (r.holds(k)) {
                    kinds[n][k] = NodeConstraints.SUPPORT;
                }
            }
        }
        double[][] bases = new double[nodes][];
        List<AutoRestraint> autos = new ArrayList<>();
        for (int n = 0; n < nodes; n++) {
            List<Vec3> dirs = directions.get(n);
            if (dirs.isEmpty() || hasBeam[n]) {
                continue; // unconnected nodes are left for the mechanism diagnosis
            }
            int id = frame.nodes().get(n).id();
            restrainTranslations(id, dirs, kinds[n], n, bases, autos);
            if (isFrame) {
                for (int k = 3; k < 6; k++) {
                    if (kinds[n][k] == NodeConstraints.FREE) {
                        kinds[n][k] = NodeConstraints.AUTO;
                        autos.add(new AutoRestraint(id, DOF[k], AXES[k - 3], PIN_REASON));
                    }
                }
            }
        }
        double[][] rotationBases = new double[nodes][];
        if (isFrame) {
            restrainChainSpin(frame, nodeIndex, memberIsBeam, kinds, rotationBases, autos);
        }
        return new NodeConstraints(bases, rotationBases, kinds, autos);
    }

    /** Finds straight chains of beam-columns with nothing restraining their spin; see the class comment. */
    private static void restrainChainSpin(Frame frame, Map<Integer, Integer> nodeIndex, boolean[] memberIsBeam,
                                          byte[][] kinds, double[][] rotationBases, List<AutoRestraint> autos) {
        int members = frame.members().size();
        int nodes = frame.nodes().size();
        Vec3[] dir = new Vec3[members];
        int[][] ends = new int[members][];
        List<List<Integer>> beamsAt = new ArrayList<>(nodes);
        for (int n = 0; n < nodes; n++) {
            beamsAt.add(new ArrayList<>());
        }
        int[] parent = new int[members];
        for (int m = 0; m < members; m++) {
            parent[m] = m;
            if (!memberIsBeam[m]) {
                continue;
            }
            Member member = frame.members().get(m);
            ends[m] = new int[] {nodeIndex.get(member.i()), nodeIndex.get(member.j())};
            dir[m] = LocalAxes.direction(frame.nodes().get(ends[m][0]).position(), frame.nodes().get(ends[m][1]).position());
            beamsAt.get(ends[m][0]).add(m);
            beamsAt.get(ends[m][1]).add(m);
        }
        for (List<Integer> at : beamsAt) {
            for (int a = 0; a < at.size(); a++) {
                for (int b = a + 1; b < at.size(); b++) {
                    if (collinear(dir[at.get(a)], dir[at.get(b)])) {
                        parent[find(parent, at.get(a))] = find(parent, at.get(b));
                    }
                }
            }
        }
        Map<Integer, List<Integer>> chains = new java.util.TreeMap<>();
        for (int m = 0; m < members; m++) {
            if (memberIsBeam[m]) {
                chains.computeIfAbsent(find(parent, m), k -> new ArrayList<>()).add(m);
            }
        }
        for (List<Integer> chain : chains.values()) {
            Vec3 axis = dir[chain.get(0)];
            java.util.TreeSet<Integer> chainNodes = new java.util.TreeSet<>();
            for (int m : chain) {
                chainNodes.add(ends[m][0]);
                chainNodes.add(ends[m][1]);
            }
            boolean restrained = false;
            int supported = -1;
            for (int n : chainNodes) {
                for (int m : beamsAt.get(n)) {
                    restrained |= !collinear(dir[m], axis);
                }
                double[] a = {axis.x(), axis.y(), axis.z()};
                for (int k = 0; k < 3; k++) {
                    if (kinds[n][3 + k] == NodeConstraints.SUPPORT) {
                        restrained |= Math.abs(a[k]) > AXIS_TOLERANCE;
                        supported = supported < 0 ? n : supported;
                    }
                }
                if (supported < 0 && isTranslationSupported(kinds[n])) {
                    supported = n;
                }
            }
            if (restrained) {
                continue;
            }
            int n = supported >= 0 ? supported : chainNodes.first();
            double[] a = {axis.x(), axis.y(), axis.z()};
            rotationBases[n] = restrain(frame.nodes().get(n).id(), kinds[n], 3, List.of(a), SPIN_REASON, autos);
        }
    }

    private static boolean isTranslationSupported(byte[] kind) {
        return kind[0] == NodeConstraints.SUPPORT || kind[1] == NodeConstraints.SUPPORT || kind[2] == NodeConstraints.SUPPORT;
    }

    private static boolean collinear(Vec3 a, Vec3 b) {
        return a.cross(b).norm() < AXIS_TOLERANCE;
    }

    private static int find(int[] parent, int m) {
        while (parent[m] != m) {
            parent[m] = parent[parent[m]];
            m = parent[m];
        }
        return m;
    }

    private static void restrainTranslations(int id, List<Vec3> dirs, byte[] kind, int n,
                                             double[][] bases, List<AutoRestraint> autos) {
        double[] m = new double[9];
        for (Vec3 d : dirs) {
            double[] v = {d.x(), d.y(), d.z()};
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    m[3 * r + c] += v[r] * v[c];
                }
            }
        }
        SmallSymmetricEigen eig = new SmallSymmetricEigen(m, 3);
        List<double[]> nullSpace = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            if (eig.value(k) < PLANARITY_TOLERANCE * dirs.size()) {
                nullSpace.add(eig.vector(k));
            }
        }
        if (nullSpace.isEmpty()) {
            return;
        }
        String reason = nullSpace.size() == 1 ? PLANE_REASON : LINE_REASON;
        List<double[]> free = admissible(nullSpace, kind);
        if (free.isEmpty()) {
            return;
        }
        bases[n] = restrain(id, kind, 0, free, reason, autos);
    }

    /**
     * Eliminates the unit directions {@code free} among the three DOFs at {@code offset} (0:
     * translations, 3: rotations) of a node, none of which may have a component along a held axis.
     * Axis directions are eliminated as they are; otherwise the triple gets a rotated basis: the
     * held axes first (they stay DOFs along the axes), then the free directions, then a completion.
     *
     * @return the basis Q (row-major, columns the new DOF directions), or null for the global axes
     */
    private static double[] restrain(int id, byte[] kind, int offset, List<double[]> free, String reason,
                                     List<AutoRestraint> autos) {
        byte[] k3 = {kind[offset], kind[offset + 1], kind[offset + 2]};
        free = preferAxes(free, k3);
        boolean allAxes = true;
        for (double[] v : free) {
            allAxes &= axisOf(v) >= 0;
        }
        if (allAxes) {
            for (double[] v : free) {
                int a = axisOf(v);
                kind[offset + a] = NodeConstraints.AUTO;
                autos.add(new AutoRestraint(id, DOF[offset + a], AXES[a], reason));
            }
            return null;
        }
        List<double[]> basis = new ArrayList<>();
        List<Byte> basisKind = new ArrayList<>();
        for (int a = 0; a < 3; a++) {
            if (k3[a] == NodeConstraints.SUPPORT) {
                basis.add(unitAxis(a));
                basisKind.add(NodeConstraints.SUPPORT);
            }
        }
        for (double[] v : free) {
            int a = axisOf(v);
            double[] dir = a >= 0 ? unitAxis(a) : canonicalSign(v);
            basis.add(dir);
            basisKind.add(NodeConstraints.AUTO);
            String name = a >= 0 ? DOF[offset + a] : offset == 0 ? AutoRestraint.SKEW : AutoRestraint.SKEW_ROTATION;
            autos.add(new AutoRestraint(id, name, vec(dir), reason));
        }
        for (int a = 0; a < 3 && basis.size() < 3; a++) {
            double[] v = unitAxis(a);
            for (double[] b : basis) {
                double dot = dot(v, b);
                for (int r = 0; r < 3; r++) {
                    v[r] -= dot * b[r];
                }
            }
            double norm = Math.sqrt(dot(v, v));
            if (norm > 1e-3) {
                for (int r = 0; r < 3; r++) {
                    v[r] /= norm;
                }
                basis.add(v);
                basisKind.add(NodeConstraints.FREE);
            }
        }
        double[] q = new double[9];
        for (int c = 0; c < 3; c++) {
            for (int r = 0; r < 3; r++) {
                q[3 * r + c] = basis.get(c)[r];
            }
            kind[offset + c] = basisKind.get(c);
        }
        return q;
    }

    /**
     * The part of span(nullSpace) that has no component along a held global axis, as orthonormal
     * vectors: vectors N·c with (N·c)_r = 0 for every held axis r.
     */
    private static List<double[]> admissible(List<double[]> nullSpace, byte[] kind) {
        int k = nullSpace.size();
        double[] g = new double[k * k]; // g = N_Rᵀ N_R over held axes
        for (int a = 0; a < 3; a++) {
            if (kind[a] != NodeConstraints.SUPPORT) {
                continue;
            }
            for (int p = 0; p < k; p++) {
                for (int s = 0; s < k; s++) {
                    g[p * k + s] += nullSpace.get(p)[a] * nullSpace.get(s)[a];
                }
            }
        }
        SmallSymmetricEigen eig = new SmallSymmetricEigen(g, k);
        List<double[]> out = new ArrayList<>();
        for (int e = 0; e < k; e++) {
            if (eig.value(e) < 1e-12) {
                double[] c = eig.vector(e);
                double[] v = new double[3];
                for (int p = 0; p < k; p++) {
                    for (int r = 0; r < 3; r++) {
                        v[r] += c[p] * nullSpace.get(p)[r];
                    }
                }
                double norm = Math.sqrt(dot(v, v));
                for (int r = 0; r < 3; r++) {
                    v[r] /= norm;
                }
                out.add(v);
            }
        }
        return out;
    }

    /** When a free global axis lies in span(free), use it as the first vector of the span. */
    private static List<double[]> preferAxes(List<double[]> free, byte[] kind) {
        if (free.size() != 2) {
            return free;
        }
        for (int a = 0; a < 3; a++) {
            if (kind[a] != NodeConstraints.FREE) {
                continue;
            }
            double p0 = free.get(0)[a];
            double p1 = free.get(1)[a];
            if (p0 * p0 + p1 * p1 > 1 - AXIS_TOLERANCE) {
                double[] axis = unitAxis(a);
                double[] other = free.get(0).clone(); // the in-span vector orthogonal to the axis
                double[] alt = free.get(1);
                double[] pick = Math.abs(p0) < Math.abs(p1) ? other : alt.clone();
                double dot = dot(pick, axis);
                for (int r = 0; r < 3; r++) {
                    pick[r] -= dot * axis[r];
                }
                double norm = Math.sqrt(dot(pick, pick));
                for (int r = 0; r < 3; r++) {
                    pick[r] /= norm;
                }
                return List.of(axis, pick);
            }
        }
        return free;
    }

    /** The global axis (0, 1, 2) that unit vector v lies along, or −1. */
    private static int axisOf(double[] v) {
        for (int a = 0; a < 3; a++) {
            if (Math.abs(v[a]) > 1 - AXIS_TOLERANCE) {
                return a;
            }
        }
        return -1;
    }

    /**
     * v or −v, whichever has its largest component positive, with round-off components
     * (|c| &lt; 1e-14) set to zero, so that reports read naturally.
     */
    private static double[] canonicalSign(double[] v) {
        double[] out = v.clone();
        for (int a = 0; a < 3; a++) {
            if (Math.abs(out[a]) < 1e-14) {
                out[a] = 0;
            }
        }
        double norm = Math.sqrt(dot(out, out));
        int big = 0;
        for (int a = 1; a < 3; a++) {
            if (Math.abs(out[a]) > Math.abs(out[big]) + 1e-12) {
                big = a;
            }
        }
        double sign = out[big] < 0 ? -1 : 1;
        for (int a = 0; a < 3; a++) {
            out[a] = sign * out[a] / norm + 0.0; // + 0.0 turns −0.0 into 0.0
        }
        return out;
    }

    private static double[] unitAxis(int a) {
        double[] v = new double[3];
        v[a] = 1;
        return v;
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    private static Vec3 vec(double[] v) {
        return new Vec3(v[0], v[1], v[2]);
    }
}
