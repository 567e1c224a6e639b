package tetrapod.model.spec;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import tetrapod.model.Role;

/**
 * How members, connections and foundations are checked. Units as in the model file.
 *
 * @param method          the published rules
 * @param partialFactors  EN 1993 partial factors (not used by ASCE 10)
 * @param bucklingLengths corrections of the buckling lengths derived from the geometry, per role
 *                        and segment; at most one applies to a member
 * @param connections     end connections per role and segment; at most one applies to a member
 *                        (members not covered get the assumed connection of their role)
 * @param foundation      the footing of each leg, or null when foundations are not checked
 */
public record ChecksSpec(CheckMethod method, PartialFactors partialFactors, List<BucklingOverride> bucklingLengths,
                         List<ConnectionSpec> connections, FoundationSpec foundation) {

    public static final ChecksSpec DEFAULT = new ChecksSpec(CheckMethod.EN1993);

    public ChecksSpec {
        Objects.requireNonNull(method, "method");
        partialFactors = partialFactors == null ? PartialFactors.RECOMMENDED : partialFactors;
        bucklingLengths = bucklingLengths == null ? List.of() : List.copyOf(bucklingLengths);
        connections = connections == null ? List.of() : List.copyOf(connections);
    }

    /** The checks of a model without a checks block: the family's method, everything else by default. */
    public static ChecksSpec defaultFor(DesignBasis basis) {
        return new ChecksSpec(basis == DesignBasis.US ? CheckMethod.ASCE10 : CheckMethod.EN1993);
    }

    /** The method alone, everything else by default. */
    public ChecksSpec(CheckMethod method) {
        this(method, PartialFactors.RECOMMENDED, List.of(), List.of(), null);
    }

    /**
     * These checks for a frame given node by node, whose members have no segment: for each role
     * the first buckling override and the first connection are kept, for every segment; later
     * entries of the same role (other segments) are dropped.
     */
    public ChecksSpec withoutSegments() {
        List<BucklingOverride> overrides = new ArrayList<>();
        Set<Role> seen = EnumSet.noneOf(Role.class);
        for (BucklingOverride b : bucklingLengths) {
            if (seen.add(b.role())) {
                overrides.add(new BucklingOverride(b.role(), List.of(), b.minorAxisFactor(), b.geometricAxisFactor(),
                        b.crossing()));
            }
        }
        List<ConnectionSpec> kept = new ArrayList<>();
        seen.clear();
        for (ConnectionSpec c : connections) {
            if (seen.add(c.role())) {
                kept.add(new ConnectionSpec(c.role(), List.of(), c.bolts(), c.diameter(), c.grade(), c.holeClearance(),
                        c.endDistance(), c.edgeDistance(), c.pitch(), c.shearPlanes(), c.threadsInShearPlane(),
                        c.holesInSection(), c.connectedLeg()));
            }
        }
        return new ChecksSpec(method, partialFactors, overrides, kept, foundation);
    }

    public Optional<FoundationSpec> foundationSpec() {
        return Optional.ofNullable(foundation);
    }
}
