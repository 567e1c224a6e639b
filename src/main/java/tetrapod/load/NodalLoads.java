package tetrapod.load;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.model.NodeForce;

/** Adds up forces node by node; gives them back in ascending node id. Mutable, local to one computation. */
final class NodalLoads {

    private final Map<Integer, double[]> byNode = new TreeMap<>();

    /** Adds the force (fx, fy, fz), N, split over {@code shares}. */
    void add(List<NodeShare> shares, double fx, double fy, double fz) {
        for (NodeShare s : shares) {
            double[] f = byNode.computeIfAbsent(s.node(), n -> new double[6]);
            f[0] += fx * s.fraction();
            f[1] += fy * s.fraction();
            f[2] += fz * s.fraction();
        }
    }

    /** Adds {@code factor} × every load of {@code loads}. */
    void add(List<NodeForce> loads, double factor) {
        if (factor == 0) {
            return;
        }
        for (NodeForce l : loads) {
            double[] f = byNode.computeIfAbsent(l.node(), n -> new double[6]);
            f[0] += factor * l.fx();
            f[1] += factor * l.fy();
            f[2] += factor * l.fz();
            f[3] += factor * l.mx();
            f[4] += factor * l.my();
            f[5] += factor * l.mz();
        }
    }

    List<NodeForce> toList() {
        List<NodeForce> out = new ArrayList<>(byNode.size());
        byNode.forEach((node, f) -> out.add(new NodeForce(node, f[0], f[1], f[2], f[3], f[4], f[5])));
        return List.copyOf(out);
    }
}
