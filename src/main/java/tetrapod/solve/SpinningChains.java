package tetrapod.solve;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Vec3;

/**
 * Straight chains of beam-columns (a leg between kinks) that nothing stops from spinning about
 * their own axis: their nodes are otherwise joined only by pin-ended members, and no support
 * holds a rotation about the axis. Torsion stiffness GJ only links the chain's nodes to each
 * other, so the whole chain turns freely; the rotation about the axis is eliminated at one node
 * (its supported node if it has one, else its first node). See {@link StabilityInspector}.
 */
final class SpinningChains {

    private SpinningChains() { }

    /** Restrains every free-spinning chain; kinds, rotationBases and autos are updated (output). */
    static void restrain(Frame frame, Map<Integer, Integer> nodeIndex, boolean[] memberIsBeam,
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
        Map<Integer, List<Integer>> chains = new TreeMap<>();
        for (int m = 0; m < members; m++) {
            if (memberIsBeam[m]) {
                chains.computeIfAbsent(find(parent, m), k -> new ArrayList<>()).add(m);
            }
        }
        for (List<Integer> chain : chains.values()) {
            Vec3 axis = dir[chain.get(0)];
            TreeSet<Integer> chainNodes = new TreeSet<>();
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
                        restrained |= Math.abs(a[k]) > DirectionRestraint.AXIS_TOLERANCE;
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
            rotationBases[n] = DirectionRestraint.restrain(frame.nodes().get(n).id(), kinds[n], 3, List.of(a), StabilityInspector.SPIN_REASON, autos);
        }
    }

    private static boolean isTranslationSupported(byte[] kind) {
        return kind[0] == NodeConstraints.SUPPORT || kind[1] == NodeConstraints.SUPPORT || kind[2] == NodeConstraints.SUPPORT;
    }

    private static boolean collinear(Vec3 a, Vec3 b) {
        return a.cross(b).norm() < DirectionRestraint.AXIS_TOLERANCE;
    }

    private static int find(int[] parent, int m) {
        while (parent[m] != m) {
            parent[m] = parent[parent[m]];
            m = parent[m];
        }
        return m;
    }
}
