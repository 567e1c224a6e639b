package tetrapod.check;

import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;
import tetrapod.model.spec.PartialFactors;

/**
 * Members of lattice towers by EN 1993 (limit states): EN 1993-1-1 6.2 (cross-sections), 6.3.1
 * (flexural buckling) and 6.3.3 (buckling with bending), Annex BB.1.2 (angles as web members),
 * EN 1993-1-8 3.10.3 (angles connected by one leg) and Table 3.4 (bolts), EN 1993-3-1 Annex H
 * (slenderness limits, a requirement: {@link En1993SlendernessLimit}). Forces are design values of a factored load case; the partial factors are the user's.
 * See docs/methods.md (Checks) for every formula and what is assumed; the formulas are in
 * {@link En1993Resistance}, which computes every resistance of a member once.
 */
public final class En1993MemberCheck implements MemberCheck {

    private final PartialFactors factors;
    private final En1993BoltCheck bolts;

    public En1993MemberCheck(PartialFactors factors) {
        this.factors = factors;
        this.bolts = new En1993BoltCheck(factors);
    }

    /** 2.5 % of the braced member's compression: EN 1993-3-1 Annex H, **recalled from memory**. */
    @Override
    public double redundantForceFraction() {
        return 0.025;
    }

    @Override
    public String redundantForceClause() {
        return "EN 1993-3-1 Annex H, fraction recalled from memory";
    }

    public PartialFactors factors() {
        return factors;
    }

    @Override
    public MemberResistance resistance(Member member, Material material, BucklingLength buckling, Connection connection) {
        return new En1993Resistance(member, material, buckling, connection, factors, bolts);
    }

    /** Thickness that decides the strength band, m (0 for a section given by properties: the thinnest band). */
    static double thickness(Section section) {
        if (section.shape() instanceof SectionShape.Angle a) {
            return a.t();
        }
        if (section.shape() instanceof SectionShape.Tube tube) {
            return tube.t();
        }
        return 0;
    }

    /** Radius of gyration about the geometric axes: the smaller of i_y and i_z, m. */
    static double geometricRadius(SectionProperties p) {
        return Math.min(p.radiusY(), p.radiusZ());
    }

    /** Whether the member is a single angle bolted through one leg (all but legs). */
    static boolean connectedByOneLeg(Member member) {
        return member.section().shape() instanceof SectionShape.Angle && member.role() != Role.LEG;
    }

    /** Whether EN 1993-1-1 Annex BB.1.2 treats the member as a web member (bracing) of the lattice. */
    static boolean webMember(Member member) {
        return member.role() != Role.LEG && member.role() != Role.GENERAL;
    }

    static BucklingCurve curve(Section section) {
        // EN 1993-1-1 Table 6.2: L-sections curve b; hollow sections a (hot finished) or c (cold
        // formed), taken as c since the finish is not known; unknown shapes c
        return section.shape() instanceof SectionShape.Angle ? BucklingCurve.B : BucklingCurve.C;
    }

    /**
     * Reduction factor β2 (two bolts) or β3 (three or more) of EN 1993-1-8 Table 3.8: 0.4 / 0.5 at
     * p1 ≤ 2.5 d0, 0.7 at p1 ≥ 5.0 d0, linear between.
     */
    static double beta(int bolts, double pitchOverHole) {
        double low = bolts == 2 ? 0.4 : 0.5;
        double high = 0.7;
        double s = Math.min(Math.max((pitchOverHole - 2.5) / 2.5, 0), 1);
        return low + (high - low) * s;
    }
}
