package tetrapod.generate;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import tetrapod.model.Vec3;

/**
 * Numbers the nodes of a generated tower bottom-up so that the stiffness matrix is banded: by
 * height, then by angle about the z axis measured counter-clockwise from the direction of leg 0
 * at that height (−135° for a square tower; a node on the axis last), then by distance from the
 * axis. Heights closer than
 * {@link NodeRegistry#TOLERANCE} are one level and are made exactly equal.
 */
final class NodeOrdering {

    private static final double ANGLE_QUANTUM = 1e-9;
    private static final double TWO_PI = 2 * Math.PI;

    /**
     * @param positions   the nodes in their new order (z made exact per level)
     * @param newIndexOf  for each original index, its 0-based position in {@code positions}
     */
    record Ordering(List<Vec3> positions, List<Integer> newIndexOf) {
        Ordering {
            positions = List.copyOf(positions);
            newIndexOf = List.copyOf(newIndexOf);
        }
    }

    private record Key(int original, int level, double z, long angle, double radius, Vec3 position) { }

    private NodeOrdering() { }

    static Ordering order(List<Vec3> points, LevelPlan plan) {
        Integer[] byZ = new Integer[points.size()];
        Arrays.setAll(byZ, k -> k);
        Arrays.sort(byZ, Comparator.comparingDouble((Integer k) -> points.get(k).z()).thenComparingInt(k -> k));
        List<Key> keys = new ArrayList<>(points.size());
        int level = -1;
        double levelZ = Double.NEGATIVE_INFINITY;
        double previousZ = Double.NEGATIVE_INFINITY;
        for (int k : byZ) {
            Vec3 p = points.get(k);
            if (p.z() - previousZ > NodeRegistry.TOLERANCE) {
                level++;
                levelZ = p.z();
            }
            previousZ = p.z();
            Vec3 snapped = new Vec3(p.x(), p.y(), levelZ);
            keys.add(new Key(k, level, levelZ, angleKey(snapped, plan), Math.hypot(p.x(), p.y()), snapped));
        }
        keys.sort(Comparator.comparingInt(Key::level).thenComparingLong(Key::angle)
                .thenComparingDouble(Key::radius).thenComparingInt(Key::original));
        Integer[] newIndexOf = new Integer[points.size()];
        List<Vec3> positions = new ArrayList<>(points.size());
        for (Key key : keys) {
            newIndexOf[key.original()] = positions.size();
            positions.add(key.position());
        }
        return new Ordering(positions, Arrays.asList(newIndexOf));
    }

    private static long angleKey(Vec3 p, LevelPlan plan) {
        double radius = Math.hypot(p.x(), p.y());
        if (radius < NodeRegistry.TOLERANCE) {
            return Math.round(TWO_PI / ANGLE_QUANTUM) + 1;
        }
        double leg0 = Math.atan2(-plan.widthYAt(p.z()), -plan.widthXAt(p.z()));
        double angle = Math.atan2(p.y(), p.x()) - leg0 + ANGLE_QUANTUM;
        angle = ((angle % TWO_PI) + TWO_PI) % TWO_PI;
        return Math.round(angle / ANGLE_QUANTUM);
    }
}
