package tetrapod.size;

import java.util.ArrayList;
import java.util.List;
import tetrapod.check.MemberChecker;
import tetrapod.check.MemberEnvelope;
import tetrapod.model.Frame;

/**
 * What {@link FastEnvelope} found for one design.
 *
 * @param frame      the frame evaluated
 * @param checker    its member checks (method, connections, buckling lengths)
 * @param envelopes  every member's check envelope over every case, in the frame's member order
 * @param demands    every member's demands (the cases that can govern it whatever its section), same order
 * @param caseCount  number of load cases swept (combinations × azimuths)
 * @param checkCount number of member checks made
 */
public record Evaluation(Frame frame, MemberChecker checker, List<MemberEnvelope> envelopes,
                         List<List<Demand>> demands, int caseCount, long checkCount) {

    public Evaluation {
        envelopes = List.copyOf(envelopes);
        List<List<Demand>> copied = new ArrayList<>(demands.size());
        demands.forEach(d -> copied.add(List.copyOf(d)));
        demands = List.copyOf(copied);
        if (envelopes.size() != frame.members().size() || demands.size() != frame.members().size()) {
            throw new IllegalArgumentException("one envelope and one demand list per member");
        }
    }

    /** The largest utilisation of any member over every case (0 for a frame without members). */
    public double maxUtilisation() {
        double max = 0;
        for (MemberEnvelope e : envelopes) {
            max = Math.max(max, utilisation(e));
        }
        return max;
    }

    /** The governing utilisation of an envelope, 0 before any case. */
    static double utilisation(MemberEnvelope e) {
        return e.governing() == null ? 0 : e.governing().utilisation();
    }
}
