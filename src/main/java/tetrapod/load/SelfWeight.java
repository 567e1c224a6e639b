package tetrapod.load;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.common.Units;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.NodeForce;

/**
 * Self-weight of the steelwork: each member's mass per metre × length × g, increased by the
 * connection allowance (bolts, gussets, galvanising), lumped half to each end node.
 * The allowance's default of 10 % is common practice with no published source.
 */
public final class SelfWeight {

    private SelfWeight() { }

    /** Nodal loads (N, −z) in ascending node id, one entry per loaded node. */
    public static List<NodeForce> of(Frame frame, double connectionAllowance) {
        if (!(connectionAllowance >= 0)) {
            throw new IllegalArgumentException("connection allowance must be >= 0, was " + connectionAllowance);
        }
        double[] lengths = frame.memberLengths();
        Map<Integer, Double> down = new TreeMap<>();
        for (int k = 0; k < lengths.length; k++) {
            Member m = frame.members().get(k);
            double weight = m.section().massPerMetre() * lengths[k] * Units.G_ACCEL * (1 + connectionAllowance);
            down.merge(m.i(), weight / 2, Double::sum);
            down.merge(m.j(), weight / 2, Double::sum);
        }
        List<NodeForce> loads = new ArrayList<>(down.size());
        down.forEach((node, w) -> loads.add(NodeForce.force(node, 0, 0, -w)));
        return loads;
    }
}
