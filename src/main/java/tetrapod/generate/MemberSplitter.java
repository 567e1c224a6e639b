package tetrapod.generate;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import tetrapod.model.Vec3;

/**
 * Splits every member line at each node lying on it strictly between its ends (within
 * {@link NodeRegistry#TOLERANCE}): legs at every level and redundant node, diagonals at connected
 * crossings and redundant nodes, horizontals at K joints, plan diagonals at their centre.
 */
final class MemberSplitter {

    /** A piece of a member line between two registered nodes (indexes into the registry). */
    record Piece(int a, int b, RawMember source) { }

    private MemberSplitter() { }

    static List<Piece> split(List<RawMember> raw, NodeRegistry registry) {
        Integer[] byZ = new Integer[registry.size()];
        for (int k = 0; k < byZ.length; k++) {
            byZ[k] = k;
        }
        Arrays.sort(byZ, Comparator.comparingDouble((Integer k) -> registry.point(k).z()).thenComparingInt(k -> k));
        double[] zs = new double[byZ.length];
        for (int k = 0; k < zs.length; k++) {
            zs[k] = registry.point(byZ[k]).z();
        }
        List<Piece> pieces = new ArrayList<>();
        for (RawMember m : raw) {
            splitOne(m, registry, byZ, zs, pieces);
        }
        return pieces;
    }

    private record Stop(double t, int node) { }

    private static void splitOne(RawMember m, NodeRegistry registry, Integer[] byZ, double[] zs, List<Piece> out) {
        int a = registry.indexOf(m.from());
        int b = registry.indexOf(m.to());
        Vec3 d = m.to().minus(m.from());
        double length2 = d.dot(d);
        double tol = NodeRegistry.TOLERANCE;
        List<Stop> stops = new ArrayList<>();
        double zLow = Math.min(m.from().z(), m.to().z()) - tol;
        double zHigh = Math.max(m.from().z(), m.to().z()) + tol;
        for (int k = firstAtOrAbove(zs, zLow); k < zs.length && zs[k] <= zHigh; k++) {
            int node = byZ[k];
            if (node == a || node == b || length2 == 0) {
                continue;
            }
            Vec3 p = registry.point(node);
            double t = p.minus(m.from()).dot(d) / length2;
            double along = t * Math.sqrt(length2);
            if (along > tol && (1 - t) * Math.sqrt(length2) > tol
                    && m.from().plus(d.times(t)).distanceTo(p) <= tol) {
                stops.add(new Stop(t, node));
            }
        }
        stops.sort(Comparator.comparingDouble(Stop::t));
        int previous = a;
        for (Stop stop : stops) {
            out.add(new Piece(previous, stop.node(), m));
            previous = stop.node();
        }
        out.add(new Piece(previous, b, m));
    }

    private static int firstAtOrAbove(double[] sorted, double z) {
        int lo = 0;
        int hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] < z) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }
}
