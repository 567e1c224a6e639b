package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import tetrapod.model.Role;
import tetrapod.model.spec.BoltGrade;
import tetrapod.model.spec.ConnectedLeg;

/**
 * ASCE 10: F_a, C_c, the effective slenderness curves, local buckling of angle legs, and a single
 * angle worked by hand. Formulas as ASCE 10-97 gives them (recalled from memory; see
 * docs/methods.md (Checks)); C_c against a published value. Stresses in ksi, E = 29 000 ksi.
 */
class Asce10MemberCheckTest {

    private static final double KSI = Asce10MemberCheck.KSI;
    private static final double E = 29000 * KSI;

    /**
     * C_c = π √(2E/F_y): 126.1 for F_y = 36 ksi and 107.0 for 50 ksi with E = 29 000 ksi (the same
     * C_c of the AISC allowable-stress column formula, published in tables such as
     * engineeringcivil.com "Allowable Stress Design for Building Columns": "Fy=36, Cc=126.1; Fy=50, Cc=107").
     */
    @Test
    void ccAgainstPublishedValues() {
        assertEquals(126.1, Asce10Slenderness.cc(36 * KSI, E), 0.05);
        assertEquals(107.0, Asce10Slenderness.cc(50 * KSI, E), 0.05);
    }

    /**
     * F_a worked by hand (ASCE 10 (3.6-1), (3.6-2)), e.g. F_y = 36, KL/r = 60: C_c = 126.10,
     * (1 − ½ (60/126.10)²) · 36 = 31.925 ksi; KL/r = 150 > C_c: π² · 29 000/150² = 12.721 ksi;
     * F_y = 50, KL/r = 120 > C_c = 107.0: π² · 29 000/120² = 19.876 ksi.
     */
    @ParameterizedTest(name = "Fy = {0} ksi, KL/r = {1}: Fa = {2} ksi")
    @CsvSource({"36, 60, 31.925", "36, 100, 24.680", "36, 150, 12.721", "50, 60, 42.139", "50, 100, 28.164",
        "50, 120, 19.876"})
    void faWorkedByHand(double fyKsi, double klOverR, double faKsi) {
        assertEquals(faKsi, Asce10Slenderness.fa(klOverR, fyKsi * KSI, E) / KSI, 5e-4);
    }

    /**
     * The six curves at L/r = 60 (curves 1–3) and 150 (curves 4–6), worked by hand:
     * 60; 30 + 0.75 · 60 = 75; 60 + 0.5 · 60 = 90; 150; 28.6 + 0.762 · 150 = 142.9;
     * 46.2 + 0.615 · 150 = 138.45.
     */
    @Test
    void curvesAtSixtyAndOneHundredFifty() {
        assertEquals(60, Asce10Slenderness.effective(1, 60), 1e-12);
        assertEquals(75, Asce10Slenderness.effective(2, 60), 1e-12);
        assertEquals(90, Asce10Slenderness.effective(3, 60), 1e-12);
        assertEquals(150, Asce10Slenderness.effective(4, 150), 1e-12);
        assertEquals(142.9, Asce10Slenderness.effective(5, 150), 1e-9);
        assertEquals(138.45, Asce10Slenderness.effective(6, 150), 1e-9);
        // the curves meet at L/r = 120
        for (int curve = 1; curve <= 6; curve++) {
            assertEquals(120, Asce10Slenderness.effective(curve, 120), 0.05, "curve " + curve);
        }
    }

    @Test
    void curveChoiceByEndsAndRestraint() {
        assertEquals(3, Asce10Slenderness.curve(80, false, 2, 2));
        assertEquals(1, Asce10Slenderness.curve(80, true, 2, 2));
        assertEquals(4, Asce10Slenderness.curve(130, false, 2, 0));
        assertEquals(6, Asce10Slenderness.curve(130, false, 2, 2));
    }

    /**
     * Local buckling of angle legs (ASCE 10 (3.6-4)–(3.6-6)), F_y = 36 ksi: (w/t)lim = 80/√36 = 13.33,
     * 144/√36 = 24; w/t = 16: [1.677 − 0.677 · 16/13.33] · 36 = 31.126 ksi; w/t = 25:
     * 0.0332 π² · 29 000/25² = 15.204 ksi.
     */
    @Test
    void localBucklingStress() {
        assertEquals(13.333, Asce10MemberCheck.widthThicknessLimit(36 * KSI), 5e-4);
        assertEquals(36.0, Asce10MemberCheck.localBucklingStress(12, 36 * KSI, E) / KSI, 1e-9);
        assertEquals(31.126, Asce10MemberCheck.localBucklingStress(16, 36 * KSI, E) / KSI, 5e-4);
        assertEquals(15.204, Asce10MemberCheck.localBucklingStress(25, 36 * KSI, E) / KSI, 5e-4);
    }

    private static Connection twoBolts() {
        return new Connection(2, 0.016, BoltGrade.G8_8, 0.018, 0.030, 0.035, 0.050, 1, true, 1, ConnectedLeg.LONG, false);
    }

    private static BucklingLength diagonalLengths() {
        return new BucklingLength(1.6, new BucklingSpan(1.6, 1, 1), new BucklingSpan(3.2, 2, 0));
    }

    private static CheckResult find(MemberCheckResult r, CheckMode mode) {
        return r.checks().stream().filter(c -> c.mode() == mode).findFirst()
                .orElseThrow(() -> new AssertionError("no " + mode + " in " + r.checks()));
    }

    /**
     * L80x10 diagonal in A36 (F_y = 36 ksi), two bolts, compression 100 kN.
     * v–v: L/r = 1600/15.526 = 103.05 ≤ 120, one end at the leg (eccentric), one at the crossing
     * (concentric): curve 2, KL/r = 30 + 0.75 · 103.05 = 107.29.
     * Out of plane: L/r = 3200/24.072 = 132.93 > 120, both ends bolted by two bolts (partially
     * restrained): curve 6, KL/r = 46.2 + 0.615 · 132.93 = 127.95 — governs.
     * w/t = (80 − 10 − 10)/10 = 6 ≤ 13.33: no local reduction. C_c = 126.10 < 127.95:
     * F_a = π² · 29 000/127.95² = 17.482 ksi = 120.53 MPa; P_a = 120.53 · 1510 = 182.01 kN;
     * utilisation 100/182.01 = 0.5494. Slenderness: 127.95/200 = 0.6398.
     */
    @Test
    void angleInCompressionWorkedByHand() {
        MemberCheckResult r = new Asce10MemberCheck().check(new MemberCheckInput(
                Fixtures.member(4, Role.DIAGONAL, Fixtures.l80x10()), Fixtures.A36, diagonalLengths(), twoBolts(),
                MemberForces.axial(-100e3)));
        CheckResult buckling = find(r, CheckMode.COMPRESSION_BUCKLING);
        assertEquals(0.5494, buckling.utilisation(), 5e-4);
        assertTrue(buckling.clause().contains("curve 6"), buckling.clause());
        assertEquals(0.6398, find(r, CheckMode.SLENDERNESS_LIMIT).utilisation(), 5e-4);
    }

    /**
     * Tension 150 kN on the net area, angle by one leg: F_t = 0.9 F_y = 0.9 · 248.21 = 223.39 MPa,
     * A_n = 1510 − 18 · 10 = 1330 mm², P_t = 297.11 kN; utilisation 0.5049. Slenderness of a member
     * in tension: L/r = 132.93/500 = 0.2659. Bolt shear: 0.62 · 800 MPa on the root area of M16
     * (d3 = 16 − 1.226869 · 2 = 13.546 mm, 144.12 mm²) = 71.48 kN per bolt; two: 150/142.97 = 1.0492.
     */
    @Test
    void angleInTensionWorkedByHand() {
        MemberCheckResult r = new Asce10MemberCheck().check(new MemberCheckInput(
                Fixtures.member(4, Role.DIAGONAL, Fixtures.l80x10()), Fixtures.A36, diagonalLengths(), twoBolts(),
                MemberForces.axial(150e3)));
        assertEquals(0.5049, find(r, CheckMode.NET_SECTION).utilisation(), 5e-4);
        assertEquals(0.2659, find(r, CheckMode.SLENDERNESS_LIMIT).utilisation(), 5e-4);
        assertEquals(1.0492, find(r, CheckMode.BOLT_SHEAR).utilisation(), 5e-4);
    }

    /** Legs: KL/r = L/r, limit 150: L80x10 over 2.4 m: 2400/15.526 = 154.58 → 1.0305. */
    @Test
    void legSlendernessLimit() {
        MemberCheckResult r = new Asce10MemberCheck().check(new MemberCheckInput(
                Fixtures.member(2, Role.LEG, Fixtures.l80x10()), Fixtures.A36, BucklingLength.between(2.4),
                Connection.assumed(Role.LEG), MemberForces.axial(-10e3)));
        assertEquals(154.58 / 150, find(r, CheckMode.SLENDERNESS_LIMIT).utilisation(), 1e-3);
    }

    /**
     * A slender angle leg (L150x10 in S355: w/t = (150 − 10 − 16)/10 = 12.4 > (w/t)lim = 80/√51.49 =
     * 11.15) replaces F_y by F_cr in the compression check (3.6-5); the check of axial force with
     * bending (3.12-1) must use the same reduced stress (issue 12): with a negligible moment its
     * P/P_a term equals the compression check's utilisation.
     */
    @Test
    void axialForceWithBendingUsesTheStressReducedForLocalBuckling() {
        var shape = new tetrapod.model.SectionShape.Angle(0.150, 0.150, 0.010, 0.016, 0.008);
        var props = new tetrapod.model.SectionProperties(29.3e-4, 624e-8, 624e-8, 990e-8, 258e-8, 9.7e-8, 0.0403,
                0.0403, 1.0, 23.0);
        var l150x10 = new tetrapod.model.Section("L150x10", shape, props);
        MemberCheckResult r = new Asce10MemberCheck().check(new MemberCheckInput(
                Fixtures.member(4, Role.DIAGONAL, l150x10), Fixtures.S355, diagonalLengths(), twoBolts(),
                new MemberForces(-100e3, 0, 0, 1e-3, -1e-3)));
        double buckling = find(r, CheckMode.COMPRESSION_BUCKLING).utilisation();
        assertTrue(r.checks().stream().anyMatch(c -> c.mode() == CheckMode.LOCAL_BUCKLING), "the leg is slender");
        CheckResult combined = find(r, CheckMode.COMBINED);
        assertEquals(buckling, combined.utilisation(), 1e-6 * buckling, combined.note());
    }
}
