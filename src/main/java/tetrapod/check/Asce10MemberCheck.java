package tetrapod.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;

/**
 * Members of latticed towers by ASCE/SEI 10-15 (Design of Latticed Steel Transmission Structures,
 * the edition in force; it superseded ASCE 10-97). Its stresses are design stresses at factored
 * loads (there is no separate resistance factor), so the utilisation is the factored force over
 * F_a A, F_t A_n and the bolt values. The clause numbers and constants were recalled from memory
 * of the 10-97 text, whose numbering 10-15 keeps as far as recalled; they are listed in
 * docs/methods.md (Checks) to be checked against the printed standard.
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
    public MemberCheckResult check(MemberCheckInput in) {
        Member member = in.member();
        Section section = member.section();
        SectionProperties p = section.properties();
        double t = En1993MemberCheck.thickness(section);
        double fy = in.material().fy(t);
        double fu = in.material().fu(t);
        double e = in.material().e();
        MemberForces f = in.forces();
        List<CheckResult> out = new ArrayList<>();
        Slenderness s = slenderness(in);

        // F_cr replaces F_y wherever compression is checked: the member (3.6) and axial force with bending (3.12)
        double fcr = section.shape() instanceof SectionShape.Angle a
                ? localBucklingStress((a.legA() - a.t() - a.r1()) / a.t(), fy, e) : fy;
        if (f.axial() >= 0) {
            out.add(tension(member, in.connection(), f.tension(), fy));
        } else {
            if (section.shape() instanceof SectionShape.Angle angle) {
                double w = angle.legA() - angle.t() - angle.r1();
                double ratio = w / angle.t();
                double limit = widthThicknessLimit(fy);
                if (ratio > limit) {
                    out.add(new CheckResult(CheckMode.LOCAL_BUCKLING, CheckResult.ratio(f.compression(), fcr * p.area()),
                            "ASCE/SEI 10-15 3.6 (3.6-5), (3.6-6) (recalled)",
                            String.format(Locale.ROOT, "w/t = %.2f > (w/t)lim = %.2f, F_cr = %.1f MPa", ratio, limit,
                                    fcr / 1e6)));
                }
                out.add(new CheckResult(CheckMode.WIDTH_THICKNESS, ratio / MAX_WIDTH_THICKNESS,
                        "ASCE/SEI 10-15 3.7.3 w/t ≤ 25 (recalled)", String.format(Locale.ROOT, "w/t = %.2f", ratio)));
            }
            double fa = Asce10Slenderness.fa(s.klOverR(), fcr, e);
            out.add(new CheckResult(CheckMode.COMPRESSION_BUCKLING, CheckResult.ratio(f.compression(), fa * p.area()),
                    "ASCE/SEI 10-15 3.6 (3.6-1)-(3.6-3), " + (s.curve() == 0 ? "3.7.4 leg KL/r = L/r (3.7-3)"
                            : "3.7.4 curve " + s.curve()),
                    String.format(Locale.ROOT, "L/r = %.1f, KL/r = %.1f, C_c = %.1f, F_a = %.1f MPa, P_a = %.1f kN",
                            s.lOverR(), s.klOverR(), Asce10Slenderness.cc(fcr, e), fa / 1e6, fa * p.area() / 1e3)));
        }
        if (f.hasMoments()) {
            CheckResult combined = bending(in, s, fy, fcr, e);
            if (combined != null) {
                out.add(combined);
            }
        }
        if (in.connection().boltsChecked() && t > 0) {
            out.addAll(bolts.check(in.connection(), Math.abs(f.axial()), t, fu));
        }
        out.add(slendernessLimit(member.role(), f, s));
        return new MemberCheckResult(member.id(), out);
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
    static Slenderness slenderness(MemberCheckInput in) {
        Member member = in.member();
        SectionProperties p = member.section().properties();
        BucklingLength b = in.buckling();
        Slenderness minor = axis(member.role(), b.minorAxis(), p.iMin(), in.connection());
        Slenderness geometric = axis(member.role(), b.geometricAxis(), En1993MemberCheck.geometricRadius(p),
                in.connection());
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
     * Tension on the net area, ASCE 10-97 3.10.1 (recalled): F_t = F_y, and 0.9 F_y for angles
     * connected by one leg.
     */
    private static CheckResult tension(Member member, Connection c, double n, double fy) {
        Section section = member.section();
        double t = En1993MemberCheck.thickness(section);
        double net = section.area() - (t > 0 ? c.holesInSection() * c.holeDiameter() * t : 0);
        boolean oneLeg = En1993MemberCheck.connectedByOneLeg(member);
        double ft = oneLeg ? 0.9 * fy : fy;
        return new CheckResult(CheckMode.NET_SECTION, CheckResult.ratio(n, ft * net),
                "ASCE/SEI 10-15 3.10.1 (recalled)" + (oneLeg ? ", angle by one leg F_t = 0.9 F_y" : ""),
                String.format(Locale.ROOT, "A_n = %.0f mm², P_t = %.1f kN%s", net * 1e6, ft * net / 1e3,
                        c.assumed() ? " (assumed connection)" : ""));
    }

    /**
     * Slenderness limits, ASCE 10-97 3.7.3 and 3.10 (recalled): legs L/r ≤ 150; redundants L/r ≤ 250;
     * other members in compression KL/r ≤ 200; members in tension (tension-only in this load case)
     * L/r ≤ 500.
     */
    private static CheckResult slendernessLimit(Role role, MemberForces f, Slenderness s) {
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

    /**
     * Axial force with bending, ASCE 10-97 3.12: P/P_a + C_m M_x/(M_ax (1 − P/P_ex)) + … ≤ 1 (3.12-1)
     * and P/P_y + M_x/M_ax + M_y/M_ay ≤ 1 (3.12-2), with P_e = π²EI/(KL)², M_a = F_y S (elastic; no
     * lateral-torsional reduction, assumed) and C_m = 0.6 + 0.4ψ ≥ 0.4 (recalled). x = u–u (local
     * y), y = v–v (local z).
     */
    private static CheckResult bending(MemberCheckInput in, Slenderness s, double fy, double fcr, double e) {
        Section section = in.member().section();
        SectionProperties p = section.properties();
        Optional<ElasticModuli> moduli = ElasticModuli.of(section);
        if (moduli.isEmpty()) {
            return null;
        }
        double sx = moduli.get().u();
        double sy = moduli.get().v();
        MemberForces f = in.forces();
        double max = fy * sx;
        double may = fy * sy;
        double py = fy * p.area();
        double eq2 = Math.abs(f.axial()) / py + f.maxMomentY() / max + f.maxMomentZ() / may;          // ASCE 10 (3.12-2)
        double value = eq2;
        String note = String.format(Locale.ROOT, "(3.12-2) %.3f", eq2);
        if (f.inCompression()) {
            double pa = Asce10Slenderness.fa(s.klOverR(), fcr, e) * p.area();  // F_cr for a slender angle leg, as in 3.6
            double klx = in.buckling().geometricAxis().length();
            double kly = in.buckling().minorAxis().length();
            double pex = Math.PI * Math.PI * e * p.iu() / (klx * klx);
            double pey = Math.PI * Math.PI * e * p.iv() / (kly * kly);
            double cmx = Math.max(0.4, 0.6 + 0.4 * f.psiY());
            double cmy = Math.max(0.4, 0.6 + 0.4 * f.psiZ());
            double pc = f.compression();
            double ampX = pc < pex ? 1 - pc / pex : 0;
            double ampY = pc < pey ? 1 - pc / pey : 0;
            double eq1 = ampX == 0 || ampY == 0
                    ? CheckResult.NO_RESISTANCE
                    : pc / pa + cmx * f.maxMomentY() / (max * ampX) + cmy * f.maxMomentZ() / (may * ampY);  // ASCE 10 (3.12-1)
            value = Math.max(eq1, eq2);
            note = String.format(Locale.ROOT, "(3.12-1) %.3f, (3.12-2) %.3f", eq1, eq2);
        }
        return new CheckResult(CheckMode.COMBINED, value, "ASCE/SEI 10-15 3.12 (3.12-1), (3.12-2)", note);
    }
}
