package tetrapod.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;
import tetrapod.model.spec.ConnectedLeg;
import tetrapod.model.spec.PartialFactors;

/**
 * The checks of {@link En1993MemberCheck} for one member, one set of buckling lengths and one end
 * connection, with every resistance computed once: the section class (EN 1993-1-1 5.5), N_pl,Rd,
 * N_u,Rd, N_c,Rd, N_b,Rd (6.3.1), the bending resistances and the factors of 6.3.3 that do not
 * depend on the force, and the bolt line's resistances, so that a load case costs only the
 * ratios. See docs/methods.md (Checks).
 *
 * <p>Axial force with bending about the principal axes (local y = u, z = v): the cross-section by
 * the linear sum EN 1993-1-1 6.2.1 (7) (6.2) with elastic moduli, and in compression the member by
 * 6.3.3 (6.61), (6.62) with the interaction factors of Annex B Table B.1 for class 3 and 4
 * sections, C_m = 0.6 + 0.4ψ ≥ 0.4 (Table B.3, linear moment) and χ_LT = 1 (assumed: lateral-
 * torsional buckling of angle legs braced at every panel node is not checked).
 */
final class En1993Resistance implements MemberResistance {

    private final Member member;
    private final BucklingLength buckling;
    private final Connection connection;
    private final PartialFactors factors;
    private final double fy;
    private final En1993Section cls;

    // tension
    private final double nplRd;
    private final NetSection net;
    // compression
    private final double ncRd;
    private final BucklingCurve curve;
    private final boolean annexBB;
    private final double lambdaV;
    private final double effV;
    private final double chiV;
    private final double lambdaG;
    private final double effG;
    private final double chiG;
    private final double nbRd;
    /** σ at the connection per newton of compression of a single angle on one bolt, Pa/N; NaN when not checked. */
    private final double sigmaPerNewton;
    private final double eccentricityLimit;
    // bending (when the section has elastic moduli)
    private final boolean bending;
    private final double wy;
    private final double wz;
    private final double nRdTension;
    private final double nRdCompression;
    private final double wyRd0;
    private final double wzRd0;
    private final double lambdaY;
    private final double lambdaZ;
    private final double nyRd;
    private final double nzRd;
    private final double myRd;
    private final double mzRd;
    // bolts (null when not checked)
    private final BoltResistance bolts;

    En1993Resistance(Member member, Material material, BucklingLength buckling, Connection connection,
                     PartialFactors factors, En1993BoltCheck boltCheck) {
        this.member = member;
        this.buckling = buckling;
        this.connection = connection;
        this.factors = factors;
        Section section = member.section();
        SectionProperties p = section.properties();
        double t = En1993MemberCheck.thickness(section);
        this.fy = material.fy(t);
        double fu = material.fu(t);
        this.cls = En1993Section.of(section, fy);

        this.nplRd = p.area() * fy / factors.gammaM0();                                          // EN 1993-1-1 6.2.3 (6.6)
        this.net = NetSection.of(member, connection, fu, factors);
        this.ncRd = cls.effectiveArea() * fy / factors.gammaM0();                                // EN 1993-1-1 6.2.4 (6.10), (6.11)

        double lambda1 = Math.PI * Math.sqrt(material.e() / fy);                                   // EN 1993-1-1 6.3.1.3 (λ1 = 93.9ε)
        double areaRatio = Math.sqrt(cls.effectiveArea() / p.area());                              // EN 1993-1-1 (6.51)
        this.lambdaV = buckling.minorAxis().length() / (p.iMin() * lambda1) * areaRatio;            // EN 1993-1-1 (6.50)
        this.lambdaG = buckling.geometricAxis().length() / (En1993MemberCheck.geometricRadius(p) * lambda1) * areaRatio;
        this.annexBB = En1993MemberCheck.connectedByOneLeg(member) && En1993MemberCheck.webMember(member)
                && connection.bolts() >= 2;
        this.effV = annexBB ? 0.35 + 0.7 * lambdaV : lambdaV;                                       // EN 1993-1-1 BB.1.2 (BB.1)
        this.effG = annexBB ? 0.50 + 0.7 * lambdaG : lambdaG;                                       // EN 1993-1-1 BB.1.2 (BB.1)
        this.curve = En1993MemberCheck.curve(section);
        this.chiV = curve.chi(effV);
        this.chiG = curve.chi(effG);
        double chi = Math.min(chiV, chiG);
        this.nbRd = chi * cls.effectiveArea() * fy / factors.gammaM1();                          // EN 1993-1-1 6.3.1.1 (6.47), (6.48)

        boolean singleBolt = section.shape() instanceof SectionShape.Angle && En1993MemberCheck.webMember(member)
                && connection.bolts() == 1;
        this.sigmaPerNewton = singleBolt
                ? new AngleGeometry((SectionShape.Angle) section.shape(), p)
                        .eccentricStressPerNewton(connection.connectedLeg()) * section.area() / cls.effectiveArea()
                : Double.NaN;
        this.eccentricityLimit = fy / factors.gammaM0();

        Optional<ElasticModuli> moduli = ElasticModuli.of(section);
        this.bending = moduli.isPresent();
        // class 4: the moduli reduced in proportion to the area (an approximation of W_eff)
        double reduce = cls.effectiveArea() / p.area();
        this.wy = bending ? moduli.get().u() * reduce : Double.NaN;
        this.wz = bending ? moduli.get().v() * reduce : Double.NaN;
        this.nRdTension = p.area() * fy / factors.gammaM0();
        this.nRdCompression = cls.effectiveArea() * fy / factors.gammaM0();
        this.wyRd0 = wy * fy / factors.gammaM0();
        this.wzRd0 = wz * fy / factors.gammaM0();
        double iu = Math.sqrt(p.iu() / p.area());
        this.lambdaY = buckling.geometricAxis().length() / (iu * lambda1) * areaRatio;                // about u–u
        this.lambdaZ = buckling.minorAxis().length() / (p.iMin() * lambda1) * areaRatio;             // about v–v
        double nRk = cls.effectiveArea() * fy;
        this.nyRd = curve.chi(lambdaY) * nRk / factors.gammaM1();
        this.nzRd = curve.chi(lambdaZ) * nRk / factors.gammaM1();
        this.myRd = wy * fy / factors.gammaM1();
        this.mzRd = wz * fy / factors.gammaM1();

        this.bolts = connection.boltsChecked() && t > 0 ? boltCheck.resistance(connection, t, fu) : null;
    }

    @Override
    public double utilisation(double axial, double momentY, double momentZ, double psiY, double psiZ) {
        double u;
        if (axial >= 0) {
            double tension = Math.max(0, axial);
            u = tension(tension);
            if (net != null) {
                u = Math.max(u, net.ratio(tension));
            }
        } else {
            double compression = Math.max(0, -axial);
            u = Math.max(compression(compression), buckling(compression));
            if (!Double.isNaN(sigmaPerNewton)) {
                u = Math.max(u, eccentricity(compression));
            }
        }
        if (bending && (momentY > 0 || momentZ > 0)) {
            u = Math.max(u, crossSection(axial, momentY, momentZ));
            if (axial < 0) {
                double compression = Math.max(0, -axial);
                u = Math.max(u, Math.max(eq661(compression, momentY, momentZ, psiY, psiZ),
                        eq662(compression, momentY, momentZ, psiY, psiZ)));
            }
        }
        if (bolts != null) {
            u = Math.max(u, bolts.utilisation(Math.abs(axial)));
        }
        return u;
    }

    private double tension(double n) {
        return CheckResult.ratio(n, nplRd);
    }

    private double compression(double n) {
        return CheckResult.ratio(n, ncRd);
    }

    private double buckling(double n) {
        return CheckResult.ratio(n, nbRd);
    }

    private double eccentricity(double n) {
        return CheckResult.ratio(n * sigmaPerNewton, eccentricityLimit);
    }

    /** EN 1993-1-1 6.2.1 (7) (6.2), elastic moduli. */
    private double crossSection(double axial, double my, double mz) {
        double nRd = axial >= 0 ? nRdTension : nRdCompression;
        return Math.abs(axial) / nRd + my / wyRd0 + mz / wzRd0;                                     // EN 1993-1-1 6.2.1 (7) (6.2)
    }

    private static double cm(double psi) {
        return Math.max(0.4, 0.6 + 0.4 * psi);                                                       // EN 1993-1-1 Table B.3
    }

    private double kyy(double ny, double cmy) {
        return Math.min(cmy * (1 + 0.6 * lambdaY * ny), cmy * (1 + 0.6 * ny));                      // EN 1993-1-1 Table B.1
    }

    private double kzz(double nz, double cmz) {
        return Math.min(cmz * (1 + 0.6 * lambdaZ * nz), cmz * (1 + 0.6 * nz));                      // EN 1993-1-1 Table B.1
    }

    /** EN 1993-1-1 6.3.3 (6.61). */
    private double eq661(double compression, double my, double mz, double psiY, double psiZ) {
        double ny = compression / nyRd;
        double nz = compression / nzRd;
        double kyy = kyy(ny, cm(psiY));
        double kyz = kzz(nz, cm(psiZ));                                                              // Table B.1
        return ny + kyy * my / myRd + kyz * mz / mzRd;                                               // EN 1993-1-1 (6.61)
    }

    /** EN 1993-1-1 6.3.3 (6.62). */
    private double eq662(double compression, double my, double mz, double psiY, double psiZ) {
        double ny = compression / nyRd;
        double nz = compression / nzRd;
        double kzy = 0.8 * kyy(ny, cm(psiY));                                                        // Table B.1
        double kzz = kzz(nz, cm(psiZ));
        return nz + kzy * my / myRd + kzz * mz / mzRd;                                               // EN 1993-1-1 (6.62)
    }

    @Override
    public MemberCheckResult check(MemberForces f) {
        List<CheckResult> out = new ArrayList<>();
        if (cls.flagged()) {
            out.add(new CheckResult(CheckMode.WIDTH_THICKNESS, cls.slendernessRatio() / cls.classThreeLimit(),
                    "EN 1993-1-1 5.5.2, Table 5.2", cls.note()));
        }
        if (f.axial() >= 0) {
            out.add(CheckResult.noted(CheckMode.TENSION, tension(f.tension()), "EN 1993-1-1 6.2.3 (6.6)",
                    () -> String.format(Locale.ROOT, "N_pl,Rd = %.1f kN", nplRd / 1e3)));
            if (net != null) {
                out.add(net.check(f.tension()));
            }
        } else {
            out.add(CheckResult.noted(CheckMode.COMPRESSION, compression(f.compression()),
                    cls.sectionClass() == 4 ? "EN 1993-1-1 6.2.4 (6.11); EN 1993-1-5 4.4" : "EN 1993-1-1 6.2.4 (6.10)",
                    () -> String.format(Locale.ROOT, "N_c,Rd = %.1f kN, %s", ncRd / 1e3, cls.note())));
            out.add(bucklingCheck(f.compression()));
            if (!Double.isNaN(sigmaPerNewton)) {
                out.add(eccentricityCheck(f.compression()));
            }
        }
        if (f.hasMoments() && bending) {
            out.add(CheckResult.noted(CheckMode.COMBINED, crossSection(f.axial(), f.maxMomentY(), f.maxMomentZ()),
                    "EN 1993-1-1 6.2.1 (7) (6.2)",
                    () -> String.format(Locale.ROOT, "My = %.2f kN·m, Mz = %.2f kN·m, W_el,u = %.1f cm³, W_el,v = %.1f cm³",
                            f.maxMomentY() / 1e3, f.maxMomentZ() / 1e3, wy * 1e6, wz * 1e6)));
            if (f.inCompression()) {
                double eq61 = eq661(f.compression(), f.maxMomentY(), f.maxMomentZ(), f.psiY(), f.psiZ());
                double eq62 = eq662(f.compression(), f.maxMomentY(), f.maxMomentZ(), f.psiY(), f.psiZ());
                out.add(CheckResult.noted(CheckMode.COMBINED, Math.max(eq61, eq62), "EN 1993-1-1 6.3.3 (6.61), (6.62), Annex B",
                        () -> String.format(Locale.ROOT, "(6.61) %.3f, (6.62) %.3f; C_my = %.2f, C_mz = %.2f, χ_LT = 1 (assumed)",
                                eq61, eq62, cm(f.psiY()), cm(f.psiZ()))));
            }
        }
        if (bolts != null) {
            out.addAll(bolts.check(Math.abs(f.axial())));
        }
        out.add(En1993SlendernessLimit.check(member, buckling, f));
        return new MemberCheckResult(member.id(), out);
    }

    private CheckResult bucklingCheck(double compression) {
        boolean oneLegWeb = En1993MemberCheck.connectedByOneLeg(member) && En1993MemberCheck.webMember(member);
        String clause = "EN 1993-1-1 6.3.1 (6.46)-(6.49), Table 6.2 curve " + curve.name().toLowerCase(Locale.ROOT)
                + (annexBB ? "; BB.1.2 (BB.1)" : oneLegWeb ? "; BB.1.2 (2) (one bolt: L_cr = L)" : "")
                + (member.role() == Role.LEG ? "; EN 1993-3-1 H.2 (2)" : "");
        return CheckResult.noted(CheckMode.COMPRESSION_BUCKLING, buckling(compression), clause,
                () -> String.format(Locale.ROOT, "L_v = %.3f m, λ̄v = %.3f → %.3f, χv = %.3f; L_yz = %.3f m, λ̄ = %.3f → %.3f,"
                                + " χ = %.3f; N_b,Rd = %.1f kN", buckling.minorAxis().length(), lambdaV, effV, chiV,
                        buckling.geometricAxis().length(), lambdaG, effG, chiG, nbRd / 1e3));
    }

    /**
     * A single angle bolted by one bolt: EN 1993-1-1 BB.1.2 (2) asks for the end eccentricity by
     * 6.2.9; for a class 3 (or effective class 4) section that is the elastic criterion
     * σ_x,Ed ≤ f_y/γM0 (6.2.9.2 (6.42)) at the connection, with the force acting at the back of the
     * connected leg and bending restrained to the geometric axis parallel to it (see
     * {@link AngleGeometry#eccentricStressPerNewton}).
     */
    private CheckResult eccentricityCheck(double compression) {
        AngleGeometry g = new AngleGeometry((SectionShape.Angle) member.section().shape(), member.section().properties());
        double sigma = compression * sigmaPerNewton;
        return CheckResult.noted(CheckMode.COMBINED, eccentricity(compression), "EN 1993-1-1 BB.1.2 (2), 6.2.9.2 (6.42)",
                () -> String.format(Locale.ROOT, "one bolt: force on the bolt line, out-of-plane eccentricity %.1f mm,"
                        + " σ_max = %.1f MPa", g.outOfPlaneEccentricity(connection.connectedLeg()) * 1e3, sigma / 1e6));
    }

    /**
     * Net section in tension: EN 1993-1-8 3.10.3 for angles by one leg, else EN 1993-1-1 6.2.3 (6.7).
     *
     * @param bolts      bolts in the line (≥ 1) for an angle by one leg; 0 for the plain rule (6.7)
     * @param resistance N_u,Rd, N (may be ≤ 0 when the holes leave nothing: utilisation
     *                   {@link CheckResult#NO_RESISTANCE})
     * @param beta       β2 or β3 of EN 1993-1-8 Table 3.8 (two or more bolts)
     * @param netArea    A_net, m²
     */
    private record NetSection(Connection c, int bolts, double resistance, double beta, double netArea) {

        static NetSection of(Member member, Connection c, double fu, PartialFactors factors) {
            Section section = member.section();
            double t = En1993MemberCheck.thickness(section);
            if (t <= 0 || c.holesInSection() == 0 && !En1993MemberCheck.connectedByOneLeg(member)) {
                return null;
            }
            double d0 = c.holeDiameter();
            if (section.shape() instanceof SectionShape.Angle angle && En1993MemberCheck.connectedByOneLeg(member)) {
                boolean shortLeg = c.connectedLeg() == ConnectedLeg.SHORT && !angle.equalLegs();
                // EN 1993-1-8 3.10.3 (2): an unequal angle connected by its smaller leg counts as an
                // equal angle of the smaller leg size (sharp corners)
                double area = shortLeg ? angle.t() * (2 * angle.legB() - angle.t()) : section.area();
                double aNet = area - c.holesInSection() * d0 * t;
                int bolts = Math.max(1, c.bolts());
                if (bolts == 1) {
                    double resistance = 2.0 * (c.edgeDistance() - 0.5 * d0) * t * fu / factors.gammaM2();  // EN 1993-1-8 (3.11)
                    return new NetSection(c, 1, resistance, Double.NaN, aNet);
                }
                double beta = En1993MemberCheck.beta(bolts, c.pitch() / d0);
                double resistance = beta * aNet * fu / factors.gammaM2();                              // EN 1993-1-8 (3.12), (3.13)
                return new NetSection(c, bolts, resistance, beta, aNet);
            }
            double aNet = section.area() - c.holesInSection() * d0 * t;
            double nuRd = 0.9 * aNet * fu / factors.gammaM2();                                          // EN 1993-1-1 6.2.3 (6.7)
            return new NetSection(c, 0, nuRd, Double.NaN, aNet);
        }

        double ratio(double n) {
            if (n <= 0) {
                return 0;
            }
            return resistance > 0 ? n / resistance : CheckResult.NO_RESISTANCE;
        }

        CheckResult check(double n) {
            String assumed = c.assumed() ? " (assumed connection)" : "";
            if (bolts == 0) {
                return CheckResult.noted(CheckMode.NET_SECTION, ratio(n), "EN 1993-1-1 6.2.3 (6.7)",
                        () -> String.format(Locale.ROOT, "%d hole(s) of %.0f mm, A_net = %.0f mm², N_u,Rd = %.1f kN%s",
                                c.holesInSection(), c.holeDiameter() * 1e3, netArea * 1e6, resistance / 1e3, assumed));
            }
            String clause = bolts == 1 ? "EN 1993-1-8 3.10.3 (3.11)"
                    : bolts == 2 ? "EN 1993-1-8 3.10.3 (3.12), Table 3.8" : "EN 1993-1-8 3.10.3 (3.13), Table 3.8";
            return CheckResult.noted(CheckMode.NET_SECTION, ratio(n), clause, () -> (bolts == 1
                    ? String.format(Locale.ROOT, "one bolt, e2 = %.0f mm", c.edgeDistance() * 1e3)
                    : String.format(Locale.ROOT, "%d bolts, p1/d0 = %.2f, β = %.3f, A_net = %.0f mm²", bolts,
                            c.pitch() / c.holeDiameter(), beta, netArea * 1e6))
                    + String.format(Locale.ROOT, ", N_u,Rd = %.1f kN%s", Math.max(resistance, 0) / 1e3, assumed));
        }
    }
}
