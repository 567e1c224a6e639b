package tetrapod.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Section;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;

/**
 * The checks of {@link Asce10MemberCheck} for one member, one set of buckling lengths and one end
 * connection, with every allowed force computed once (KL/r and F_a, F_cr of a slender angle leg,
 * P_t on the net area, the Euler forces and moment capacities of 3.12, the bolt line), so that a
 * load case costs only the ratios. Clauses as recalled in {@link Asce10MemberCheck}; see
 * docs/methods.md (Checks).
 *
 * <p>Tension on the net area, ASCE 10-97 3.10.1 (recalled): F_t = F_y, and 0.9 F_y for angles
 * connected by one leg. Axial force with bending, ASCE 10-97 3.12: P/P_a + C_m M_x/(M_ax (1 − P/P_ex))
 * + … ≤ 1 (3.12-1) and P/P_y + M_x/M_ax + M_y/M_ay ≤ 1 (3.12-2), with P_e = π²EI/(KL)², M_a = F_y S
 * (elastic; no lateral-torsional reduction, assumed) and C_m = 0.6 + 0.4ψ ≥ 0.4 (recalled);
 * x = u–u (local y), y = v–v (local z).
 */
final class Asce10Resistance implements MemberResistance {

    private final Member member;
    private final BucklingLength buckling;
    private final Connection connection;
    private final double fy;
    private final double e;
    private final Asce10MemberCheck.Slenderness slenderness;
    /** F_cr: F_y, or the local buckling stress of a slender angle leg (3.6), Pa. */
    private final double fcr;
    // tension on the net area
    private final boolean oneLeg;
    private final double netArea;
    private final double ft;
    private final double tensionResistance;
    // compression: an angle's w/t (NaN for other shapes), local buckling and F_a
    private final double wOverT;
    private final double wOverTLimit;
    private final double localResistance;
    private final double fa;
    private final double pa;
    // bending (when the section has elastic moduli), 3.12
    private final boolean bending;
    private final double mx;
    private final double my;
    private final double py;
    private final double pex;
    private final double pey;
    // bolts (null when not checked)
    private final BoltResistance bolts;

    Asce10Resistance(Member member, Material material, BucklingLength buckling, Connection connection,
                     Asce10BoltCheck boltCheck) {
        this.member = member;
        this.buckling = buckling;
        this.connection = connection;
        Section section = member.section();
        SectionProperties p = section.properties();
        double t = En1993MemberCheck.thickness(section);
        this.fy = material.fy(t);
        double fu = material.fu(t);
        this.e = material.e();
        this.slenderness = Asce10MemberCheck.slenderness(member, buckling, connection);

        // F_cr replaces F_y wherever compression is checked: the member (3.6) and axial force with bending (3.12)
        this.fcr = section.shape() instanceof SectionShape.Angle a
                ? Asce10MemberCheck.localBucklingStress((a.legA() - a.t() - a.r1()) / a.t(), fy, e) : fy;

        this.netArea = section.area() - (t > 0 ? connection.holesInSection() * connection.holeDiameter() * t : 0);
        this.oneLeg = En1993MemberCheck.connectedByOneLeg(member);
        this.ft = oneLeg ? 0.9 * fy : fy;                                        // ASCE 10 3.10.1 (recalled)
        this.tensionResistance = ft * netArea;

        if (section.shape() instanceof SectionShape.Angle angle) {
            double w = angle.legA() - angle.t() - angle.r1();
            this.wOverT = w / angle.t();
            this.wOverTLimit = Asce10MemberCheck.widthThicknessLimit(fy);
        } else {
            this.wOverT = Double.NaN;
            this.wOverTLimit = Double.NaN;
        }
        this.localResistance = fcr * p.area();
        this.fa = Asce10Slenderness.fa(slenderness.klOverR(), fcr, e);
        this.pa = fa * p.area();                                                 // F_cr for a slender angle leg, as in 3.6

        Optional<ElasticModuli> moduli = ElasticModuli.of(section);
        this.bending = moduli.isPresent();
        this.mx = bending ? fy * moduli.get().u() : Double.NaN;
        this.my = bending ? fy * moduli.get().v() : Double.NaN;
        this.py = fy * p.area();
        double klx = buckling.geometricAxis().length();
        double kly = buckling.minorAxis().length();
        this.pex = Math.PI * Math.PI * e * p.iu() / (klx * klx);
        this.pey = Math.PI * Math.PI * e * p.iv() / (kly * kly);

        this.bolts = connection.boltsChecked() && t > 0 ? boltCheck.resistance(connection, t, fu) : null;
    }

    private boolean slenderLeg() {
        return wOverT > wOverTLimit;    // false for NaN: not an angle
    }

    @Override
    public double utilisation(double axial, double momentY, double momentZ, double psiY, double psiZ) {
        double u;
        if (axial >= 0) {
            u = CheckResult.ratio(Math.max(0, axial), tensionResistance);
        } else {
            double compression = Math.max(0, -axial);
            u = CheckResult.ratio(compression, pa);
            if (slenderLeg()) {
                u = Math.max(CheckResult.ratio(compression, localResistance), u);
            }
        }
        if (bending && (momentY > 0 || momentZ > 0)) {
            u = Math.max(u, combined(axial, momentY, momentZ, psiY, psiZ));
        }
        if (bolts != null) {
            u = Math.max(u, bolts.utilisation(Math.abs(axial)));
        }
        return u;
    }

    /** ASCE 10 (3.12-2) P/P_y + M_x/M_ax + M_y/M_ay. */
    private double eq2(double axial, double momentY, double momentZ) {
        return Math.abs(axial) / py + momentY / mx + momentZ / my;                             // ASCE 10 (3.12-2)
    }

    /**
     * ASCE 10 (3.12-1) P/P_a + C_m M_x/(M_ax (1 − P/P_ex)) + …, or {@link CheckResult#NO_RESISTANCE}
     * when P reaches an Euler force.
     */
    private double eq1(double compression, double momentY, double momentZ, double psiY, double psiZ) {
        double cmx = Math.max(0.4, 0.6 + 0.4 * psiY);
        double cmy = Math.max(0.4, 0.6 + 0.4 * psiZ);
        double ampX = compression < pex ? 1 - compression / pex : 0;
        double ampY = compression < pey ? 1 - compression / pey : 0;
        return ampX == 0 || ampY == 0
                ? CheckResult.NO_RESISTANCE
                : compression / pa + cmx * momentY / (mx * ampX) + cmy * momentZ / (my * ampY);      // ASCE 10 (3.12-1)
    }

    private double combined(double axial, double momentY, double momentZ, double psiY, double psiZ) {
        double eq2 = eq2(axial, momentY, momentZ);
        return axial < 0 ? Math.max(eq1(Math.max(0, -axial), momentY, momentZ, psiY, psiZ), eq2) : eq2;
    }

    @Override
    public MemberCheckResult check(MemberForces f) {
        List<CheckResult> out = new ArrayList<>();
        if (f.axial() >= 0) {
            out.add(new CheckResult(CheckMode.NET_SECTION, CheckResult.ratio(f.tension(), tensionResistance),
                    "ASCE/SEI 10-15 3.10.1 (recalled)" + (oneLeg ? ", angle by one leg F_t = 0.9 F_y" : ""),
                    String.format(Locale.ROOT, "A_n = %.0f mm², P_t = %.1f kN%s", netArea * 1e6, tensionResistance / 1e3,
                            connection.assumed() ? " (assumed connection)" : "")));
        } else {
            if (!Double.isNaN(wOverT)) {
                if (slenderLeg()) {
                    out.add(new CheckResult(CheckMode.LOCAL_BUCKLING, CheckResult.ratio(f.compression(), localResistance),
                            "ASCE/SEI 10-15 3.6 (3.6-5), (3.6-6) (recalled)",
                            String.format(Locale.ROOT, "w/t = %.2f > (w/t)lim = %.2f, F_cr = %.1f MPa", wOverT,
                                    wOverTLimit, fcr / 1e6)));
                }
                out.add(new CheckResult(CheckMode.WIDTH_THICKNESS, wOverT / Asce10MemberCheck.MAX_WIDTH_THICKNESS,
                        "ASCE/SEI 10-15 3.7.3 w/t ≤ 25 (recalled)", String.format(Locale.ROOT, "w/t = %.2f", wOverT)));
            }
            Asce10MemberCheck.Slenderness s = slenderness;
            out.add(new CheckResult(CheckMode.COMPRESSION_BUCKLING, CheckResult.ratio(f.compression(), pa),
                    "ASCE/SEI 10-15 3.6 (3.6-1)-(3.6-3), " + (s.curve() == 0 ? "3.7.4 leg KL/r = L/r (3.7-3)"
                            : "3.7.4 curve " + s.curve()),
                    String.format(Locale.ROOT, "L/r = %.1f, KL/r = %.1f, C_c = %.1f, F_a = %.1f MPa, P_a = %.1f kN",
                            s.lOverR(), s.klOverR(), Asce10Slenderness.cc(fcr, e), fa / 1e6, pa / 1e3)));
        }
        if (f.hasMoments() && bending) {
            double eq2 = eq2(f.axial(), f.maxMomentY(), f.maxMomentZ());
            double value = eq2;
            String note = String.format(Locale.ROOT, "(3.12-2) %.3f", eq2);
            if (f.inCompression()) {
                double eq1 = eq1(f.compression(), f.maxMomentY(), f.maxMomentZ(), f.psiY(), f.psiZ());
                value = Math.max(eq1, eq2);
                note = String.format(Locale.ROOT, "(3.12-1) %.3f, (3.12-2) %.3f", eq1, eq2);
            }
            out.add(new CheckResult(CheckMode.COMBINED, value, "ASCE/SEI 10-15 3.12 (3.12-1), (3.12-2)", note));
        }
        if (bolts != null) {
            out.addAll(bolts.check(Math.abs(f.axial())));
        }
        out.add(Asce10MemberCheck.slendernessLimit(member.role(), f, slenderness));
        return new MemberCheckResult(member.id(), out);
    }
}
