package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;
import tetrapod.model.spec.BoltGrade;
import tetrapod.model.spec.ConnectedLeg;
import tetrapod.model.spec.PartialFactors;

/**
 * A single angle bolted through one leg, checked by EN 1993 and worked by hand from the clauses
 * in each test's comments: L80x10 (Fixtures.l80x10), S355 (f_y = 355, f_u = 470 MPa, t ≤ 16 mm),
 * γM0 = γM1 = 1.0, γM2 = 1.25 (EN 1993-1-1 6.1 Note 2B recommended values).
 */
class En1993MemberCheckTest {

    private static final En1993MemberCheck CHECK = new En1993MemberCheck(PartialFactors.RECOMMENDED);
    private static final double HAND = 5e-4;

    /** Two M16 8.8 bolts, d0 = 18 mm, e1 = 30, e2 = 35, p1 = 50 mm, one shear plane, threads in it, one hole. */
    private static Connection twoBolts() {
        return new Connection(2, 0.016, BoltGrade.G8_8, 0.018, 0.030, 0.035, 0.050, 1, true, 1, ConnectedLeg.LONG, false);
    }

    private static Connection oneBolt() {
        return new Connection(1, 0.016, BoltGrade.G8_8, 0.018, 0.030, 0.035, 0.050, 1, true, 1, ConnectedLeg.LONG, false);
    }

    /** A diagonal of an X pair: 1.60 m to the crossing (v–v), 3.20 m out of plane (the crossing not holding). */
    private static BucklingLength diagonalLengths() {
        return new BucklingLength(1.6, new BucklingSpan(1.6, 1, 1), new BucklingSpan(3.2, 2, 0));
    }

    private static MemberCheckResult check(Connection c, double axial) {
        return CHECK.check(new MemberCheckInput(Fixtures.member(7, Role.DIAGONAL, Fixtures.l80x10()), Fixtures.S355,
                diagonalLengths(), c, MemberForces.axial(axial)));
    }

    private static CheckResult find(MemberCheckResult r, CheckMode mode, String clauseFragment) {
        return r.checks().stream().filter(c -> c.mode() == mode && c.clause().contains(clauseFragment)).findFirst()
                .orElseThrow(() -> new AssertionError("no " + mode + " " + clauseFragment + " in " + r.checks()));
    }

    /**
     * Compression 150 kN, two bolts: EN 1993-1-1 Annex BB.1.2 (BB.1).
     * Class (Table 5.2, angles): ε = √(235/355) = 0.8136; h/t = 8 ≤ 15ε = 12.20 and (b+h)/2t = 8 ≤
     * 11.5ε = 9.36: class 3; N_c,Rd = 1510 · 355 = 536.05 kN (6.10), utilisation 0.2798.
     * λ1 = π √(210000/355) = 76.41 (= 93.9ε). v–v: i_v = √(36.4/15.1) = 15.526 mm,
     * λ̄_v = 1600/(15.526 · 76.41) = 1.3487, λ̄_eff,v = 0.35 + 0.7 · 1.3487 = 1.2941, χ_v = 0.4297.
     * y–y: i_y = √(87.5/15.1) = 24.072 mm, λ̄_y = 3200/(24.072 · 76.41) = 1.7398,
     * λ̄_eff,y = 0.50 + 0.7 · 1.7398 = 1.7178, χ_y = 0.2732 (curve b, (6.49)).
     * N_b,Rd = 0.2732 · 1510 · 355 = 146.42 kN; utilisation 150/146.42 = 1.0244.
     */
    @Test
    void angleInCompressionBoltedByTwoBolts() {
        MemberCheckResult r = check(twoBolts(), -150e3);
        assertEquals(0.2798, find(r, CheckMode.COMPRESSION, "6.2.4").utilisation(), HAND);
        CheckResult buckling = find(r, CheckMode.COMPRESSION_BUCKLING, "BB.1.2 (BB.1)");
        assertEquals(1.0244, buckling.utilisation(), HAND);
        assertEquals(CheckMode.BOLT_SHEAR, r.governing().mode());   // two M16 8.8 in shear: 1.244 > 1.024
        assertTrue(buckling.clause().contains("curve b"), buckling.clause());
    }

    /**
     * Compression 50 kN, one bolt: EN 1993-1-1 BB.1.2 (2): L_cr = L, no reduction:
     * λ̄_v = 1.3487 → χ_v = 0.4041; λ̄_y = 1.7398 → χ_y = 0.2673; N_b,Rd = 0.2673 · 1510 · 355 =
     * 143.28 kN, utilisation 50/143.28 = 0.3490. End eccentricity by 6.2.9.2 (6.42), bending held to
     * the axis parallel to the connected leg: e = c = 23.4 mm, I_y = 87.5 cm⁴; at the back of the
     * connected leg σ = N (1/A + e²/I) = 50 000 (1/1510 + 23.4²/875 000) = 64.40 MPa; at the toe of
     * the other leg |σ| = 50 000 |1/1510 − 23.4 · 56.6/875 000| = 42.57 MPa; utilisation 64.40/355 = 0.1814.
     */
    @Test
    void angleInCompressionBoltedByOneBolt() {
        MemberCheckResult r = check(oneBolt(), -50e3);
        assertEquals(0.3490, find(r, CheckMode.COMPRESSION_BUCKLING, "BB.1.2 (2)").utilisation(), HAND);
        assertEquals(0.1814, find(r, CheckMode.COMBINED, "6.2.9.2").utilisation(), HAND);
    }

    /**
     * Tension 150 kN, two bolts.
     * Gross: N_pl,Rd = 1510 · 355 = 536.05 kN (6.6): 0.2798.
     * Net, EN 1993-1-8 3.10.3 (3.12): p1/d0 = 50/18 = 2.778, β2 = 0.4 + 0.3 (2.778 − 2.5)/2.5 = 0.4333
     * (Table 3.8); A_net = 1510 − 18 · 10 = 1330 mm²; N_u,Rd = 0.4333 · 1330 · 470/1.25 = 216.70 kN:
     * 0.6922.
     * Bolt shear (Table 3.4): F_v,Rd = 0.6 · 800 · 157/1.25 = 60.29 kN (A_s = 157 mm², ISO 898-1);
     * two bolts 120.6 kN: 1.244 (0.5 % for the rounded A_s).
     * Bearing (Table 3.4): α_d = min(30/54, 50/54 − 1/4) = 0.5556, α_b = min(0.5556, 800/470, 1) =
     * 0.5556, k1 = min(2.8 · 35/18 − 1.7, 2.5) = 2.5; F_b,Rd = 2.5 · 0.5556 · 470 · 16 · 10/1.25 =
     * 83.56 kN; two bolts: 150/167.1 = 0.8976.
     * Spacing (Table 3.3): max(1.2 · 18/30, 1.2 · 18/35, 2.2 · 18/50) = 0.792.
     */
    @Test
    void angleInTensionBoltedThroughOneLeg() {
        MemberCheckResult r = check(twoBolts(), 150e3);
        assertEquals(0.2798, find(r, CheckMode.TENSION, "6.2.3").utilisation(), HAND);
        assertEquals(0.6922, find(r, CheckMode.NET_SECTION, "(3.12)").utilisation(), HAND);
        assertEquals(1.244, find(r, CheckMode.BOLT_SHEAR, "Table 3.4").utilisation(), 1.244 * 0.005);
        assertEquals(0.8976, find(r, CheckMode.BOLT_BEARING, "F_b,Rd").utilisation(), HAND);
        assertEquals(0.792, find(r, CheckMode.BOLT_SPACING, "Table 3.3").utilisation(), HAND);
        assertEquals(CheckMode.BOLT_SHEAR, r.governing().mode());
    }

    /** One bolt in tension, EN 1993-1-8 (3.11): N_u,Rd = 2.0 (35 − 0.5 · 18) · 10 · 470/1.25 = 195.52 kN; 150/195.52 = 0.7672. */
    @Test
    void angleInTensionByOneBolt() {
        MemberCheckResult r = check(oneBolt(), 150e3);
        assertEquals(0.7672, find(r, CheckMode.NET_SECTION, "(3.11)").utilisation(), HAND);
    }

    @Test
    void betaOfTable38() {
        // EN 1993-1-8 Table 3.8: β2 0.4 → 0.7, β3 0.5 → 0.7 between p1 = 2.5 d0 and 5.0 d0
        assertEquals(0.4, En1993MemberCheck.beta(2, 2.0), 1e-12);
        assertEquals(0.55, En1993MemberCheck.beta(2, 3.75), 1e-12);
        assertEquals(0.7, En1993MemberCheck.beta(2, 6.0), 1e-12);
        assertEquals(0.5, En1993MemberCheck.beta(3, 2.5), 1e-12);
        assertEquals(0.6, En1993MemberCheck.beta(4, 3.75), 1e-12);
    }

    /**
     * A class 4 angle, 120 × 120 × 8 with sharp corners (A = (2 · 120 − 8) · 8 = 1856 mm²): h/t = 15
     * > 15ε = 12.20 (Table 5.2). EN 1993-1-5 4.4: λ̄p = 15/(28.4 · 0.8136 · √0.43) = 0.9900,
     * ρ = (0.9900 − 0.188)/0.9900² = 0.8183; A_eff = 1856 − 2 (1 − 0.8183) · 120 · 8 = 1507.2 mm²;
     * N_c,Rd = 1507.2 · 355 = 535.04 kN; 300 kN gives 0.5607.
     */
    @Test
    void classFourAngleIsReducedByEffectiveWidths() {
        double a = 0.120;
        double t = 0.008;
        double area = (2 * a - t) * t;
        SectionShape.Angle shape = new SectionShape.Angle(a, a, t, 0, 0);
        // second moments are not used by the cross-section check; plausible values for a 120x8
        SectionProperties p = new SectionProperties(area, 255e-8, 255e-8, 405e-8, 105e-8, 4e-8, 0.0325, 0.0325, 1, 14.6);
        Section section = new Section("L120x8 sharp", shape, p);
        BucklingLength lengths = BucklingLength.between(0.5);
        MemberCheckResult r = CHECK.check(new MemberCheckInput(Fixtures.member(1, Role.DIAGONAL, section), Fixtures.S355,
                lengths, twoBolts(), MemberForces.axial(-300e3)));
        CheckResult compression = find(r, CheckMode.COMPRESSION, "(6.11)");
        assertEquals(0.5607, compression.utilisation(), HAND);
        assertTrue(compression.note().contains("class 4"), compression.note());
    }

    /**
     * A round-tube leg with bending (frame idealisation): CHS 88.9 × 4, A = π (88.9² − 80.9²)/4 =
     * 1066.9 mm², I = 96.34 cm⁴, W_el = I/(d/2) = 21.674 cm³, i = 30.05 mm; N = −100 kN and a uniform
     * moment of 2 kN·m (end moments −2 and +2 kN·m in the end-force convention: single curvature,
     * ψ = 1, C_m = 1.0, EN 1993-1-1 Table B.3). Class 1 (d/t = 22.2 ≤ 50ε² = 33.1).
     * Cross-section (6.2): 100 000/(1066.9 · 355) + 2·10⁶/(21 674 · 355) = 0.2640 + 0.2599 = 0.5240.
     * Member, L = 2 m, curve c (finish unknown): λ̄ = 2000/(30.05 · 76.41) = 0.8710, χ = 0.6177,
     * n = 100 000/(0.6177 · 1066.9 · 355) = 0.4274, k_yy = min(1 + 0.6 · 0.8710 · 0.4274,
     * 1 + 0.6 · 0.4274) = 1.2234 (Table B.1); (6.61) 0.4274 + 1.2234 · 0.2599 = 0.7454.
     */
    @Test
    void tubeLegWithBendingByInteractionFormulas() {
        double d = 0.0889;
        double t = 0.004;
        double area = Math.PI * (d * d - (d - 2 * t) * (d - 2 * t)) / 4;
        double inertia = Math.PI * (Math.pow(d, 4) - Math.pow(d - 2 * t, 4)) / 64;
        SectionProperties p = new SectionProperties(area, inertia, inertia, inertia, inertia, 2 * inertia, 0, 0, 0,
                area * 7850);
        Section tube = new Section("CHS88.9x4", new SectionShape.Tube(d, t), p);
        MemberForces forces = new MemberForces(-100e3, -2e3, 2e3, 0, 0);
        MemberCheckResult r = CHECK.check(new MemberCheckInput(Fixtures.member(3, Role.LEG, tube), Fixtures.S355,
                BucklingLength.between(2.0), Connection.assumed(Role.LEG), forces));
        assertEquals(0.5240, find(r, CheckMode.COMBINED, "(6.2)").utilisation(), HAND);
        assertEquals(0.7454, find(r, CheckMode.COMBINED, "6.3.3").utilisation(), HAND);
        assertEquals(1.0, forces.psiY(), 1e-12);
    }

    /** EN 1993-3-1 H.2 (1): a leg's L/i should not exceed 120; L80x10 over 2.4 m: 2400/15.526 = 154.6 → 1.288. */
    @Test
    void legSlendernessLimit() {
        MemberCheckResult r = CHECK.check(new MemberCheckInput(Fixtures.member(2, Role.LEG, Fixtures.l80x10()),
                Fixtures.S355, BucklingLength.between(2.4), Connection.assumed(Role.LEG), MemberForces.axial(-1e3)));
        assertEquals(154.58 / 120, find(r, CheckMode.SLENDERNESS_LIMIT, "H.2").utilisation(), 1e-3);
    }

    @Test
    void zeroForceGivesZeroStrengthUtilisation() {
        MemberCheckResult r = check(twoBolts(), 0);
        assertEquals(0, find(r, CheckMode.TENSION, "6.2.3").utilisation());
        assertEquals(0, find(r, CheckMode.BOLT_SHEAR, "Table 3.4").utilisation());
    }
}
