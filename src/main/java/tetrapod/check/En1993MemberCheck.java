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
import tetrapod.model.spec.ConnectedLeg;
import tetrapod.model.spec.PartialFactors;

/**
 * Members of lattice towers by EN 1993 (limit states): EN 1993-1-1 6.2 (cross-sections), 6.3.1
 * (flexural buckling) and 6.3.3 (buckling with bending), Annex BB.1.2 (angles as web members),
 * EN 1993-1-8 3.10.3 (angles connected by one leg) and Table 3.4 (bolts), EN 1993-3-1 Annex H
 * (slenderness limits, a requirement: {@link En1993SlendernessLimit}). Forces are design values of a factored load case; the partial factors are the user's.
 * See docs/methods.md (Checks) for every formula and what is assumed.
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
    public MemberCheckResult check(MemberCheckInput in) {
        Member member = in.member();
        Section section = member.section();
        SectionProperties p = section.properties();
        double t = thickness(section);
        double fy = in.material().fy(t);
        double fu = in.material().fu(t);
        En1993Section cls = En1993Section.of(section, fy);
        MemberForces f = in.forces();
        List<CheckResult> out = new ArrayList<>();

        if (cls.flagged()) {
            out.add(new CheckResult(CheckMode.WIDTH_THICKNESS, cls.slendernessRatio() / cls.classThreeLimit(),
                    "EN 1993-1-1 5.5.2, Table 5.2", cls.note()));
        }
        if (f.axial() >= 0) {
            double nplRd = p.area() * fy / factors.gammaM0();                                      // EN 1993-1-1 6.2.3 (6.6)
            out.add(new CheckResult(CheckMode.TENSION, CheckResult.ratio(f.tension(), nplRd), "EN 1993-1-1 6.2.3 (6.6)",
                    String.format(Locale.ROOT, "N_pl,Rd = %.1f kN", nplRd / 1e3)));
            CheckResult net = netSection(member, in.connection(), f.tension(), fu);
            if (net != null) {
                out.add(net);
            }
        } else {
            double ncRd = cls.effectiveArea() * fy / factors.gammaM0();                            // EN 1993-1-1 6.2.4 (6.10), (6.11)
            out.add(new CheckResult(CheckMode.COMPRESSION, CheckResult.ratio(f.compression(), ncRd),
                    cls.sectionClass() == 4 ? "EN 1993-1-1 6.2.4 (6.11); EN 1993-1-5 4.4" : "EN 1993-1-1 6.2.4 (6.10)",
                    String.format(Locale.ROOT, "N_c,Rd = %.1f kN, %s", ncRd / 1e3, cls.note())));
            out.add(buckling(in, cls, fy));
            CheckResult eccentric = singleBoltEccentricity(in, cls, fy);
            if (eccentric != null) {
                out.add(eccentric);
            }
        }
        if (f.hasMoments()) {
            out.addAll(bending(in, cls, fy));
        }
        if (in.connection().boltsChecked() && t > 0) {
            out.addAll(bolts.check(in.connection(), Math.abs(f.axial()), t, fu));
        }
        out.add(En1993SlendernessLimit.check(in));
        return new MemberCheckResult(member.id(), out);
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

    private static BucklingCurve curve(Section section) {
        // EN 1993-1-1 Table 6.2: L-sections curve b; hollow sections a (hot finished) or c (cold
        // formed), taken as c since the finish is not known; unknown shapes c
        return section.shape() instanceof SectionShape.Angle ? BucklingCurve.B : BucklingCurve.C;
    }

    private CheckResult buckling(MemberCheckInput in, En1993Section cls, double fy) {
        Member member = in.member();
        SectionProperties p = member.section().properties();
        double lambda1 = Math.PI * Math.sqrt(in.material().e() / fy);                               // EN 1993-1-1 6.3.1.3 (λ1 = 93.9ε)
        double areaRatio = Math.sqrt(cls.effectiveArea() / p.area());                              // EN 1993-1-1 (6.51)
        double lambdaV = in.buckling().minorAxis().length() / (p.iMin() * lambda1) * areaRatio;     // EN 1993-1-1 (6.50)
        double lambdaG = in.buckling().geometricAxis().length() / (geometricRadius(p) * lambda1) * areaRatio;
        boolean annexBB = connectedByOneLeg(member) && webMember(member) && in.connection().bolts() >= 2;
        double effV = annexBB ? 0.35 + 0.7 * lambdaV : lambdaV;                                     // EN 1993-1-1 BB.1.2 (BB.1)
        double effG = annexBB ? 0.50 + 0.7 * lambdaG : lambdaG;                                     // EN 1993-1-1 BB.1.2 (BB.1)
        BucklingCurve curve = curve(member.section());
        double chiV = curve.chi(effV);
        double chiG = curve.chi(effG);
        double chi = Math.min(chiV, chiG);
        double nbRd = chi * cls.effectiveArea() * fy / factors.gammaM1();                          // EN 1993-1-1 6.3.1.1 (6.47), (6.48)
        String clause = "EN 1993-1-1 6.3.1 (6.46)-(6.49), Table 6.2 curve " + curve.name().toLowerCase(Locale.ROOT)
                + (annexBB ? "; BB.1.2 (BB.1)"
                        : connectedByOneLeg(member) && webMember(member) ? "; BB.1.2 (2) (one bolt: L_cr = L)" : "")
                + (member.role() == Role.LEG ? "; EN 1993-3-1 H.2 (2)" : "");
        return new CheckResult(CheckMode.COMPRESSION_BUCKLING, CheckResult.ratio(in.forces().compression(), nbRd), clause,
                String.format(Locale.ROOT, "L_v = %.3f m, λ̄v = %.3f → %.3f, χv = %.3f; L_yz = %.3f m, λ̄ = %.3f → %.3f,"
                                + " χ = %.3f; N_b,Rd = %.1f kN", in.buckling().minorAxis().length(), lambdaV, effV, chiV,
                        in.buckling().geometricAxis().length(), lambdaG, effG, chiG, nbRd / 1e3));
    }

    /**
     * A single angle bolted by one bolt: EN 1993-1-1 BB.1.2 (2) asks for the end eccentricity by
     * 6.2.9; for a class 3 (or effective class 4) section that is the elastic criterion
     * σ_x,Ed ≤ f_y/γM0 (6.2.9.2 (6.42)) at the connection, with the force acting at the back of the
     * connected leg and bending restrained to the geometric axis parallel to it (see
     * {@link AngleGeometry#eccentricStressPerNewton}).
     */
    private CheckResult singleBoltEccentricity(MemberCheckInput in, En1993Section cls, double fy) {
        Member member = in.member();
        if (!(member.section().shape() instanceof SectionShape.Angle angle) || !webMember(member)
                || in.connection().bolts() != 1) {
            return null;
        }
        AngleGeometry g = new AngleGeometry(angle, member.section().properties());
        double sigmaPerNewton = g.eccentricStressPerNewton(in.connection().connectedLeg())
                * member.section().area() / cls.effectiveArea();
        double sigma = in.forces().compression() * sigmaPerNewton;
        return new CheckResult(CheckMode.COMBINED, CheckResult.ratio(sigma, fy / factors.gammaM0()),
                "EN 1993-1-1 BB.1.2 (2), 6.2.9.2 (6.42)",
                String.format(Locale.ROOT, "one bolt: force on the bolt line, out-of-plane eccentricity %.1f mm,"
                        + " σ_max = %.1f MPa", g.outOfPlaneEccentricity(in.connection().connectedLeg()) * 1e3, sigma / 1e6));
    }

    /** Net section in tension: EN 1993-1-8 3.10.3 for angles by one leg, else EN 1993-1-1 6.2.3 (6.7). */
    private CheckResult netSection(Member member, Connection c, double n, double fu) {
        Section section = member.section();
        double t = thickness(section);
        if (t <= 0 || c.holesInSection() == 0 && !connectedByOneLeg(member)) {
            return null;
        }
        double d0 = c.holeDiameter();
        if (section.shape() instanceof SectionShape.Angle angle && connectedByOneLeg(member)) {
            boolean shortLeg = c.connectedLeg() == ConnectedLeg.SHORT && !angle.equalLegs();
            // EN 1993-1-8 3.10.3 (2): an unequal angle connected by its smaller leg counts as an
            // equal angle of the smaller leg size (sharp corners)
            double area = shortLeg ? angle.t() * (2 * angle.legB() - angle.t()) : section.area();
            double aNet = area - c.holesInSection() * d0 * t;
            int bolts = Math.max(1, c.bolts());
            double resistance;
            String clause;
            String note;
            if (bolts == 1) {
                resistance = 2.0 * (c.edgeDistance() - 0.5 * d0) * t * fu / factors.gammaM2();      // EN 1993-1-8 (3.11)
                clause = "EN 1993-1-8 3.10.3 (3.11)";
                note = String.format(Locale.ROOT, "one bolt, e2 = %.0f mm", c.edgeDistance() * 1e3);
            } else {
                double beta = beta(bolts, c.pitch() / d0);
                resistance = beta * aNet * fu / factors.gammaM2();                                  // EN 1993-1-8 (3.12), (3.13)
                clause = bolts == 2 ? "EN 1993-1-8 3.10.3 (3.12), Table 3.8" : "EN 1993-1-8 3.10.3 (3.13), Table 3.8";
                note = String.format(Locale.ROOT, "%d bolts, p1/d0 = %.2f, β = %.3f, A_net = %.0f mm²", bolts,
                        c.pitch() / d0, beta, aNet * 1e6);
            }
            return new CheckResult(CheckMode.NET_SECTION, netRatio(n, resistance), clause,
                    note + String.format(Locale.ROOT, ", N_u,Rd = %.1f kN%s", Math.max(resistance, 0) / 1e3,
                            c.assumed() ? " (assumed connection)" : ""));
        }
        double aNet = section.area() - c.holesInSection() * d0 * t;
        double nuRd = 0.9 * aNet * fu / factors.gammaM2();                                          // EN 1993-1-1 6.2.3 (6.7)
        return new CheckResult(CheckMode.NET_SECTION, netRatio(n, nuRd), "EN 1993-1-1 6.2.3 (6.7)",
                String.format(Locale.ROOT, "%d hole(s) of %.0f mm, A_net = %.0f mm², N_u,Rd = %.1f kN%s",
                        c.holesInSection(), d0 * 1e3, aNet * 1e6, nuRd / 1e3, c.assumed() ? " (assumed connection)" : ""));
    }

    private static double netRatio(double n, double resistance) {
        if (n <= 0) {
            return 0;
        }
        return resistance > 0 ? n / resistance : CheckResult.NO_RESISTANCE;
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

    /**
     * Axial force with bending about the principal axes (local y = u, z = v): the cross-section by
     * the linear sum EN 1993-1-1 6.2.1 (7) (6.2) with elastic moduli, and in compression the member
     * by 6.3.3 (6.61), (6.62) with the interaction factors of Annex B Table B.1 for class 3 and 4
     * sections, C_m = 0.6 + 0.4ψ ≥ 0.4 (Table B.3, linear moment) and χ_LT = 1 (assumed: lateral-
     * torsional buckling of angle legs braced at every panel node is not checked).
     */
    private List<CheckResult> bending(MemberCheckInput in, En1993Section cls, double fy) {
        Member member = in.member();
        Section section = member.section();
        SectionProperties p = section.properties();
        Optional<ElasticModuli> moduli = ElasticModuli.of(section);
        if (moduli.isEmpty()) {
            return List.of();
        }
        double wy = moduli.get().u();
        double wz = moduli.get().v();
        // class 4: the moduli reduced in proportion to the area (an approximation of W_eff)
        double reduce = cls.effectiveArea() / p.area();
        wy *= reduce;
        wz *= reduce;
        MemberForces f = in.forces();
        double nRd = (f.axial() >= 0 ? p.area() : cls.effectiveArea()) * fy / factors.gammaM0();
        double crossSection = Math.abs(f.axial()) / nRd + f.maxMomentY() / (wy * fy / factors.gammaM0())
                + f.maxMomentZ() / (wz * fy / factors.gammaM0());                                    // EN 1993-1-1 6.2.1 (7) (6.2)
        List<CheckResult> out = new ArrayList<>();
        out.add(new CheckResult(CheckMode.COMBINED, crossSection, "EN 1993-1-1 6.2.1 (7) (6.2)",
                String.format(Locale.ROOT, "My = %.2f kN·m, Mz = %.2f kN·m, W_el,u = %.1f cm³, W_el,v = %.1f cm³",
                        f.maxMomentY() / 1e3, f.maxMomentZ() / 1e3, wy * 1e6, wz * 1e6)));
        if (f.inCompression()) {
            double lambda1 = Math.PI * Math.sqrt(in.material().e() / fy);
            double areaRatio = Math.sqrt(cls.effectiveArea() / p.area());
            double iu = Math.sqrt(p.iu() / p.area());
            double lambdaY = in.buckling().geometricAxis().length() / (iu * lambda1) * areaRatio;       // about u–u
            double lambdaZ = in.buckling().minorAxis().length() / (p.iMin() * lambda1) * areaRatio;    // about v–v
            BucklingCurve curve = curve(section);
            double nRk = cls.effectiveArea() * fy;
            double ny = f.compression() / (curve.chi(lambdaY) * nRk / factors.gammaM1());
            double nz = f.compression() / (curve.chi(lambdaZ) * nRk / factors.gammaM1());
            double cmy = Math.max(0.4, 0.6 + 0.4 * f.psiY());                                       // EN 1993-1-1 Table B.3
            double cmz = Math.max(0.4, 0.6 + 0.4 * f.psiZ());                                       // EN 1993-1-1 Table B.3
            double kyy = Math.min(cmy * (1 + 0.6 * lambdaY * ny), cmy * (1 + 0.6 * ny));           // EN 1993-1-1 Table B.1
            double kzz = Math.min(cmz * (1 + 0.6 * lambdaZ * nz), cmz * (1 + 0.6 * nz));           // EN 1993-1-1 Table B.1
            double kyz = kzz;                                                                        // Table B.1
            double kzy = 0.8 * kyy;                                                                  // Table B.1
            double myRd = wy * fy / factors.gammaM1();
            double mzRd = wz * fy / factors.gammaM1();
            double eq61 = ny + kyy * f.maxMomentY() / myRd + kyz * f.maxMomentZ() / mzRd;           // EN 1993-1-1 (6.61)
            double eq62 = nz + kzy * f.maxMomentY() / myRd + kzz * f.maxMomentZ() / mzRd;           // EN 1993-1-1 (6.62)
            out.add(new CheckResult(CheckMode.COMBINED, Math.max(eq61, eq62), "EN 1993-1-1 6.3.3 (6.61), (6.62), Annex B",
                    String.format(Locale.ROOT, "(6.61) %.3f, (6.62) %.3f; C_my = %.2f, C_mz = %.2f, χ_LT = 1 (assumed)",
                            eq61, eq62, cmy, cmz)));
        }
        return out;
    }
}
