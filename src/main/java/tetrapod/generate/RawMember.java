package tetrapod.generate;

import java.util.Objects;
import tetrapod.model.Face;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.Vec3;

/**
 * A member line as generated, before it is split at the nodes lying on it.
 *
 * @param segment 1-based
 * @param panel   1-based within its segment
 */
record RawMember(Vec3 from, Vec3 to, Role role, int segment, int panel, Face face, Section section) {
    RawMember {
        Objects.requireNonNull(role, "role");
        Objects.requireNonNull(face, "face");
        Objects.requireNonNull(section, "section");
    }
}
