package tetrapod.generate;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;
import tetrapod.model.Vec3;

/**
 * Collects the points of a lattice while it is generated, merging points closer than
 * {@link #TOLERANCE}: a point keeps the position of its first registration. A builder: one per
 * generation, never shared.
 */
final class NodeRegistry {

    /** Points closer than this are one node, m. */
    static final double TOLERANCE = 1e-6;
    private static final double CELL = 10 * TOLERANCE;

    private record Cell(long x, long y, long z) { }

    private final List<Vec3> points = new ArrayList<>();
    private final Map<Cell, List<Integer>> cells = new HashMap<>();

    /** The index of the node at {@code p}, created if no node lies within the tolerance. */
    int add(Vec3 p) {
        OptionalInt existing = find(p);
        if (existing.isPresent()) {
            return existing.getAsInt();
        }
        int index = points.size();
        points.add(p);
        cells.computeIfAbsent(cellOf(p), c -> new ArrayList<>(1)).add(index);
        return index;
    }

    /** The index of the node within the tolerance of {@code p}, if any (the nearest if several). */
    OptionalInt find(Vec3 p) {
        Cell c = cellOf(p);
        int best = -1;
        double bestDistance = TOLERANCE;
        for (long dx = -1; dx <= 1; dx++) {
            for (long dy = -1; dy <= 1; dy++) {
                for (long dz = -1; dz <= 1; dz++) {
                    for (int k : cells.getOrDefault(new Cell(c.x + dx, c.y + dy, c.z + dz), List.of())) {
                        double d = points.get(k).distanceTo(p);
                        if (d <= bestDistance) {
                            best = k;
                            bestDistance = d;
                        }
                    }
                }
            }
        }
        return best < 0 ? OptionalInt.empty() : OptionalInt.of(best);
    }

    /** The index of the registered node at {@code p}; fails if there is none (a generator bug). */
    int indexOf(Vec3 p) {
        OptionalInt found = find(p);
        if (found.isEmpty()) {
            throw new IllegalStateException("no node registered at " + p);
        }
        return found.getAsInt();
    }

    Vec3 point(int index) {
        return points.get(index);
    }

    int size() {
        return points.size();
    }

    List<Vec3> points() {
        return List.copyOf(points);
    }

    private static Cell cellOf(Vec3 p) {
        return new Cell((long) Math.floor(p.x() / CELL), (long) Math.floor(p.y() / CELL), (long) Math.floor(p.z() / CELL));
    }
}
