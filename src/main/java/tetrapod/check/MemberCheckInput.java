package tetrapod.check;

import java.util.Objects;
import tetrapod.model.Material;
import tetrapod.model.Member;

/**
 * What a member check needs for one load case: the member (role, section), its material, its
 * buckling lengths in this case, its end connection and its forces.
 */
public record MemberCheckInput(Member member, Material material, BucklingLength buckling, Connection connection,
                               MemberForces forces) {

    public MemberCheckInput {
        Objects.requireNonNull(member, "member");
        Objects.requireNonNull(material, "material");
        Objects.requireNonNull(buckling, "buckling");
        Objects.requireNonNull(connection, "connection");
        Objects.requireNonNull(forces, "forces");
    }
}
