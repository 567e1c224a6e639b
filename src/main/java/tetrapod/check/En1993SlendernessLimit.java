package tetrapod.check;

import java.util.Locale;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.SectionProperties;

/**
 * The slenderness limits of lattice tower members, EN 1993-3-1 Annex H (informative): a
 * requirement, reported apart from the utilisation. λ = L/i over both buckling axes (v–v with
 * L_v/i_v, the geometric axes with L_yz/min(i_y, i_z)).
 *
 * <ul>
 * <li>legs: 120, H.2 (1) (read in a reproduction of the annex);</li>
 * <li>other members that carry compression in the case: 180; redundants (secondary bracing): 250;
 *     members in tension or without force in the case: 350 (all three **recalled from memory**
 *     of Annex H; to be checked against the printed standard and its National Annex).</li>
 * </ul>
 */
final class En1993SlendernessLimit {

    static final double LEG = 120;
    static final double COMPRESSION = 180;
    static final double REDUNDANT = 250;
    static final double TENSION = 350;

    private En1993SlendernessLimit() { }

    /** The limit that applies to a member of {@code role} carrying {@code forces} in the case. */
    static double limit(Role role, MemberForces forces) {
        if (role == Role.LEG) {
            return LEG;                                                           // EN 1993-3-1 H.2 (1)
        }
        if (role == Role.REDUNDANT) {
            return REDUNDANT;                                                     // EN 1993-3-1 Annex H (recalled)
        }
        return forces.inCompression() ? COMPRESSION : TENSION;                    // EN 1993-3-1 Annex H (recalled)
    }

    static CheckResult check(Member member, BucklingLength buckling, MemberForces forces) {
        SectionProperties p = member.section().properties();
        double slenderness = Math.max(buckling.minorAxis().length() / p.iMin(),
                buckling.geometricAxis().length() / En1993MemberCheck.geometricRadius(p));
        Role role = member.role();
        double limit = limit(role, forces);
        String what = role == Role.LEG ? "leg" : role == Role.REDUNDANT ? "redundant"
                : forces.inCompression() ? "member in compression" : "member in tension or without force";
        return CheckResult.noted(CheckMode.SLENDERNESS_LIMIT, slenderness / limit,
                role == Role.LEG ? "EN 1993-3-1 H.2 (1) (informative)"
                        : "EN 1993-3-1 Annex H (informative; limit recalled from memory)",
                () -> String.format(Locale.ROOT, "%s L/i = %.1f, limit %.0f", what, slenderness, limit));
    }
}
