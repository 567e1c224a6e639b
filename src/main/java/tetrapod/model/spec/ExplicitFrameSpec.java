package tetrapod.model.spec;

import java.util.List;
import tetrapod.model.Restraint;
import tetrapod.model.Role;

/** A frame given node by node, for published benchmarks and anything the generator cannot make. */
public record ExplicitFrameSpec(List<NodeSpec> nodes, List<MemberSpec> members, List<SupportSpec> supports) {

    public ExplicitFrameSpec {
        nodes = List.copyOf(nodes);
        members = List.copyOf(members);
        supports = List.copyOf(supports);
    }

    /** Coordinates in m. */
    public record NodeSpec(int id, double x, double y, double z) { }

    /**
     * @param continuous  in the frame idealisation, a beam-column rather than axial only
     * @param orientation local y axis direction, or null for the default rule
     */
    public record MemberSpec(int id, int i, int j, String section, Role role, boolean continuous,
                             List<Double> orientation) {
        public MemberSpec {
            orientation = orientation == null ? null : List.copyOf(orientation);
        }
    }

    public record SupportSpec(int node, Restraint restraint) { }
}
