package tetrapod.size;

import java.util.Objects;
import tetrapod.check.BucklingLength;
import tetrapod.check.MemberForces;
import tetrapod.model.Member;

/**
 * What a member check needs from one load case, apart from the section: the member (role,
 * segment, connection), its buckling lengths in that case and its forces. Checking a
 * {@code Demand} with another section gives that section's utilisation under the same forces.
 *
 * @param member   the member as analysed (its section is replaced when another is tried)
 * @param buckling its buckling lengths in the case
 * @param forces   its forces in the case, N and N·m
 * @param caseId   the case
 */
public record Demand(Member member, BucklingLength buckling, MemberForces forces, String caseId) {

    public Demand {
        Objects.requireNonNull(member, "member");
        Objects.requireNonNull(caseId, "caseId");
        Objects.requireNonNull(buckling, "buckling");
        Objects.requireNonNull(forces, "forces");
    }

    /** 0 in tension, 1 at zero force, 2 in compression: the checks branch on this. */
    int sign() {
        return signOf(forces.axial());
    }

    static int signOf(double axial) {
        return axial > 0 ? 0 : axial < 0 ? 2 : 1;
    }
}
