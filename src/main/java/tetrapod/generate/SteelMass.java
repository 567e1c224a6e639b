package tetrapod.generate;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;

/** Steel mass of a frame from its members' mass per metre and lengths. */
public final class SteelMass {

    private SteelMass() { }

    /** Σ mass per metre × length over all members, kg. */
    public static double bare(Frame frame) {
        return byRole(frame).values().stream().mapToDouble(Double::doubleValue).sum();
    }

    /** Bare mass × (1 + allowance), kg; allowance 0.10 adds 10 % for connections. */
    public static double withAllowance(Frame frame, double allowance) {
        if (!Double.isFinite(allowance) || allowance < 0) {
            throw new IllegalArgumentException("connection allowance must be >= 0, was " + allowance);
        }
        return bare(frame) * (1 + allowance);
    }

    /** Bare mass per member role, in role order (roles without members absent), kg. Read-only. */
    public static Map<Role, Double> byRole(Frame frame) {
        double[] lengths = frame.memberLengths();
        List<Member> members = frame.members();
        Map<Role, Double> mass = new EnumMap<>(Role.class);
        for (int k = 0; k < lengths.length; k++) {
            Member m = members.get(k);
            mass.merge(m.role(), m.section().massPerMetre() * lengths[k], Double::sum);
        }
        return Collections.unmodifiableMap(mass);
    }
}
