package tetrapod.check;

import java.util.Locale;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.SectionProperties;

/**
 * Members of latticed towers by ASCE/SEI 10-15 (Design of Latticed Steel Transmission Structures,
 * the edition in force; it superseded ASCE 10-97). Its stresses are design stresses at factored
 * loads (there is no separate resistance factor), so the utilisation is the factored force over
 * F_a A, F_t A_n and the bolt values. The clause numbers and constants were recalled from memory
 * of the 10-97 text, whose numbering 10-15 keeps as far as recalled; they are listed in
 * docs/methods.md (Checks) to be checked against the printed standard. The checks themselves are
 * made by {@link Asce10Resistance}, which computes every allowed force of a member once.
 */
public final class Asce10MemberCheck implements MemberCheck {

    /** ksi in Pa: the width-to-thickness limits are written with F_y in ksi (Ψ = 1; 2.62 with MPa). */
    static final double KSI = 6.894757e6;
    static final double LEG_LIMIT = 150;
    static final double COMPRESSION_LIMIT = 200;
    static final double REDUNDANT_LIMIT = 250;
    static final double TENSION_LIMIT = 500;
    /** Largest w/t of an angle leg (recalled). */
    static final double MAX_WIDTH_THICKNESS = 25;

    private final Asce10BoltCheck bolts = new Asce10BoltCheck();

    /** Result of the KL/r search over the two buckling axes. */
    record Slenderness(double lOverR, double klOverR, int curve, double lOverRMax) { }

    /** 1.5 % of the braced member's compression: ASCE 10 (redundant members), **recalled from memory**. */
    @Override
    public double redundantForceFraction() {
        return 0.015;
    }

    @Override
    public String redundantForceClause() {
        return "ASCE 10 redundant members, fraction recalled from memory";
    }

    @Override
    public MemberResistance resistance(Member member, Material material, BucklingLength buckling, Connection connection) {
        return new Asce10Resistance(member, material, buckling, connection, bolts);
    }

    /** (w/t)lim = 80 Ψ/√F_y with F_y in ksi and Ψ = 1, ASCE 10-97 (3.6-4) (recalled). */
    static double widthThicknessLimit(double fy) {
        return 80 / Math.sqrt(fy / KSI);
    }

    /**
     * The stress that replaces F_y when the angle leg is slender, ASCE 10-97 3.6 (recalled): F_y up
     * to (w/t)lim; [1.677 − 0.677 (w/t)/(w/t)lim] F_y up to 144 Ψ/√F_y (3.6-5); 0.0332 π² E/(w/t)²
     * beyond (3.6-6).
     */
    static double localBucklingStress(double wOverT, double fy, double e) {
        double limit = widthThicknessLimit(fy);
        if (wOverT <= limit) {
            return fy;
        }
        if (wOverT <= 144 / Math.sqrt(fy / KSI)) {
            return (1.677 - 0.677 * wOverT / limit) * fy;                      // ASCE 10 (3.6-5)
        }
        return 0.0332 * Math.PI * Math.PI * e / (wOverT * wOverT);             // ASCE 10 (3.6-6)
    }

    /** KL/r over both buckling axes (minor v–v between nodes, geometric out of plane), the larger governs. */
    static Slenderness slenderness(Member member, BucklingLength b, Connection connection) {
        SectionProperties p = member.section().properties();
        Slenderness minor = axis(member.role(), b.minorAxis(), p.iMin(), connection);
        Slenderness geometric = axis(member.role(), b.geometricAxis(), En1993MemberCheck.geometricRadius(p),
                connection);
        Slenderness governing = geometric.klOverR() > minor.klOverR() ? geometric : minor;
        return new Slenderness(governing.lOverR(), governing.klOverR(), governing.curve(),
                Math.max(minor.lOverR(), geometric.lOverR()));
    }

    private static Slenderness axis(Role role, BucklingSpan span, double r, Connection c) {
        double lOverR = span.length() / r;
        if (role == Role.LEG) {
            return new Slenderness(lOverR, lOverR, 0, lOverR);                  // ASCE 10 (3.7-3)
        }
        int restrained = span.continuousEnds() + (c.bolts() >= 2 ? span.eccentricEnds() : 0);
        int curve = Asce10Slenderness.curve(lOverR, role == Role.REDUNDANT, span.eccentricEnds(), restrained);
        return new Slenderness(lOverR, Asce10Slenderness.effective(curve, lOverR), curve, lOverR);
    }

    /**
     * Slenderness limits, ASCE 10-97 3.7.3 and 3.10 (recalled): legs L/r ≤ 150; redundants L/r ≤ 250;
     * other members in compression KL/r ≤ 200; members in tension (tension-only in this load case)
     * L/r ≤ 500.
     */
    static CheckResult slendernessLimit(Role role, MemberForces f, Slenderness s) {
        double value;
        double limit;
        String what;
        if (role == Role.LEG) {
            value = s.lOverRMax();
            limit = LEG_LIMIT;
            what = "leg L/r";
        } else if (role == Role.REDUNDANT) {
            value = s.lOverRMax();
            limit = REDUNDANT_LIMIT;
            what = "redundant L/r";
        } else if (f.inCompression()) {
            value = s.klOverR();
            limit = COMPRESSION_LIMIT;
            what = "compression member KL/r";
        } else {
            value = s.lOverRMax();
            limit = TENSION_LIMIT;
            what = "tension member L/r";
        }
        return new CheckResult(CheckMode.SLENDERNESS_LIMIT, value / limit, "ASCE/SEI 10-15 3.7.3, 3.10 (recalled)",
                String.format(Locale.ROOT, "%s = %.1f, limit %.0f", what, value, limit));
    }
}
