package tetrapod.analysis;

import java.util.ArrayList;
import java.util.List;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;

/**
 * Gathers lumped masses on the leg nodes for the tower's global modes. A node that no leg reaches
 * (a crossing, a redundant's joint, the centre of plan bracing) hangs on bracing members whose own
 * bending is all that holds it; with its mass left there, the lowest modes are the members'
 * vibrations, not the tower's. Its mass is passed on in equal shares to the nodes it is joined to,
 * again and again, until it sits on leg nodes (an absorbing chain: every share moves towards a
 * leg). The total mass and, within each panel, its place on the legs are kept; the bracing's own
 * vibration is not what these modes describe (Tetrapod's own rule; common practice is to lump
 * the bracing's mass at the panel points of the legs, no published source).
 */
final class LegMasses {

    /** Mass left on non-leg nodes, as a fraction of the total, at which passing stops. */
    private static final double LEFT = 1e-12;
    private static final int MAX_PASSES = 10_000;

    private LegMasses() { }

    /**
     * @param mass per node index, kg (input, not modified)
     * @return the masses with every non-leg node's share on leg nodes; {@code mass} itself when the
     *         frame has no leg (an explicit frame of general members)
     */
    static double[] gather(Frame frame, double[] mass) {
        int nodes = frame.nodes().size();
        var index = frame.nodeIndex();
        boolean[] leg = new boolean[nodes];
        List<List<Integer>> neighbours = new ArrayList<>(nodes);
        for (int n = 0; n < nodes; n++) {
            neighbours.add(new ArrayList<>());
        }
        boolean anyLeg = false;
        for (Member m : frame.members()) {
            int i = index.get(m.i());
            int j = index.get(m.j());
            neighbours.get(i).add(j);
            neighbours.get(j).add(i);
            if (m.role() == Role.LEG) {
                leg[i] = true;
                leg[j] = true;
                anyLeg = true;
            }
        }
        if (!anyLeg) {
            return mass;
        }
        double[] out = mass.clone();
        double total = 0;
        for (double m : out) {
            total += m;
        }
        for (int pass = 0; pass < MAX_PASSES; pass++) {
            double left = 0;
            double[] next = out.clone();
            for (int n = 0; n < nodes; n++) {
                if (leg[n] || out[n] == 0 || neighbours.get(n).isEmpty()) {
                    continue;
                }
                next[n] -= out[n];
                double share = out[n] / neighbours.get(n).size();
                for (int k : neighbours.get(n)) {
                    next[k] += share;
                    left += leg[k] ? 0 : share;
                }
            }
            out = next;
            if (left <= LEFT * total) {
                break;
            }
        }
        for (int n = 0; n < nodes; n++) {
            if (!leg[n] && !neighbours.get(n).isEmpty()) {
                out[n] = 0;  // what is left here is below 1e-12 of the total: dropped, not a local mass
            }
        }
        return out;
    }
}
