package tetrapod.view;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import tetrapod.model.Frame;
import tetrapod.model.Node;

/**
 * The figure shown beside a deformed shape: the largest horizontal displacement (√(ux² + uy²)) of
 * the nodes of the top level, the nodes within {@link #SAME_LEVEL} of the highest node. Pure Java.
 */
public final class TopDisplacement {

    /** Nodes this close in height (m) to the highest one belong to the top level. */
    static final double SAME_LEVEL = 1e-3;

    private TopDisplacement() { }

    /** In m; empty when no node of the top level has a displacement. */
    public static OptionalDouble of(Frame frame, List<NodeVector> displacements) {
        double top = -Double.MAX_VALUE;
        for (Node n : frame.nodes()) {
            top = Math.max(top, n.position().z());
        }
        Map<Integer, Double> heights = new HashMap<>();
        for (Node n : frame.nodes()) {
            heights.put(n.id(), n.position().z());
        }
        double largest = -1;
        for (NodeVector d : displacements) {
            Double z = heights.get(d.node());
            if (z != null && z >= top - SAME_LEVEL) {
                largest = Math.max(largest, Math.hypot(d.vector().x(), d.vector().y()));
            }
        }
        return largest < 0 ? OptionalDouble.empty() : OptionalDouble.of(largest);
    }
}
