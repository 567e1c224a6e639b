package tetrapod.solve;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tetrapod.model.Frame;
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
 * <li>with six DOFs per node, a node where only pin-ended members meet has no rotational
 *     stiffness: rx, ry and rz are eliminated;
 * <li>with six DOFs per node, a straight chain of beam-columns (a leg between kinks) joined
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
     * @param held         per node index, true for a node a {@link ContinuityElement} holds
     *                     across its member line (stable in every translation)
     */
    static NodeConstraints inspect(Frame frame, Map<Integer, Integer> nodeIndex, boolean[] memberIsBeam,
                                   boolean[] held) {
        int nodes = frame.nodes().size();
        boolean isFrame = frame.idealisation().hasRotations();
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
            if (!held[n]) {
                restrainTranslations(id, dirs, kinds[n], n, bases, autos);
            }
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
            SpinningChains.restrain(frame, nodeIndex, memberIsBeam, kinds, rotationBases, autos);
        }
        return new NodeConstraints(bases, rotationBases, kinds, autos);
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
        bases[n] = DirectionRestraint.restrain(id, kind, 0, free, reason, autos);
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
                double norm = Math.sqrt(DirectionRestraint.dot(v, v));
                for (int r = 0; r < 3; r++) {
                    v[r] /= norm;
                }
                out.add(v);
            }
        }
        return out;
    }

}
