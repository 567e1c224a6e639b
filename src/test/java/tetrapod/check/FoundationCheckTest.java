package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import tetrapod.model.spec.BoltGrade;
import tetrapod.model.spec.FoundationSpec;
import tetrapod.model.spec.PartialFactors;

/** Anchor rods, uplift, bearing and sliding of a leg footing, against the values and hand calculations. */
class FoundationCheckTest {

    private static CheckResult find(FoundationResult r, CheckMode mode) {
        return r.checks().stream().filter(c -> c.mode() == mode).findFirst()
                .orElseThrow(() -> new AssertionError("no " + mode + " in " + r.checks()));
    }

    /** EN 1993-1-8 Table 3.4: F_t,Rd = k2 f_ub A_s/γM2 = 0.9 · 800 · 353/1.25 = 203.3 kN for an M24 8.8 rod (A_s = 353 mm², ISO 898-1). */
    @Test
    void m24GradeEightEightRodInTension() {
        En1993AnchorRods rods = new En1993AnchorRods(4, 0.024, BoltGrade.G8_8, 1.25);
        assertEquals(203.3e3, rods.tensionResistance(), 203.3e3 * 0.005);
        // four rods, 400 kN uplift: 100 kN per rod, 100/203.3 = 0.492
        CheckResult tension = rods.check(400e3, 0).get(0);
        assertEquals(CheckMode.ANCHOR_TENSION, tension.mode());
        assertEquals(0.492, tension.utilisation(), 0.005);
    }

    /**
     * Shear of anchor bolts, EN 1993-1-8 6.2.2 (7): F_2,vb,Rd = α_bc f_ub A_s/γM2 with
     * α_bc = 0.44 − 0.0003 f_yb (f_yb in N/mm²), by hand:
     * M24 8.8 (f_yb = 640, f_ub = 800 N/mm², Table 3.1; A_s = 353 mm², ISO 898-1):
     * α_bc = 0.44 − 0.0003 · 640 = 0.44 − 0.192 = 0.248; F = 0.248 · 800 · 353/1.25 = 70 035.2/1.25 = 56 028 N.
     * The α_v = 0.6 of Table 3.4 would give 0.6 · 800 · 353/1.25 = 135 552 N, 0.6/0.248 = 2.42 times as much.
     * M20 4.6 (f_yb = 240, f_ub = 400; A_s = 245 mm²): α_bc = 0.44 − 0.072 = 0.368;
     * F = 0.368 · 400 · 245/1.25 = 28 851 N.
     */
    @Test
    void anchorBoltShearByTheAnchorBoltFactor() {
        En1993AnchorRods m24 = new En1993AnchorRods(4, 0.024, BoltGrade.G8_8, 1.25);
        assertEquals(0.248, m24.alphaBc(), 1e-12);
        assertEquals(56_028, m24.shearResistance(), 56_028 * 0.005);   // A_s 352.50 against the table's 353 mm²
        // four rods, 112 kN of shear: 28 kN per rod, 28/56.03 = 0.4997
        CheckResult shear = m24.check(0, 112e3).get(1);
        assertEquals(CheckMode.ANCHOR_SHEAR, shear.mode());
        assertEquals(0.4997, shear.utilisation(), 0.003);
        En1993AnchorRods m20 = new En1993AnchorRods(1, 0.020, BoltGrade.G4_6, 1.25);
        assertEquals(0.368, m20.alphaBc(), 1e-12);
        assertEquals(28_851, m20.shearResistance(), 28_851 * 0.005);
    }

    /** 10.9 rods (f_yb = 900 N/mm², Table 3.1) lie outside 235 ≤ f_yb ≤ 640 N/mm² of EN 1993-1-8 6.2.2 (7). */
    @Test
    void gradeTenNineRodsAreOutsideTheAnchorBoltRule() {
        assertThrows(IllegalArgumentException.class, () -> new En1993AnchorRods(4, 0.024, BoltGrade.G10_9, 1.25));
    }

    /**
     * Tension with shear, EN 1993-1-8 Table 3.4: F_v,Ed/F_v,Rd + F_t,Ed/(1.4 F_t,Rd); M24 8.8 in shear
     * F_v,Rd = 56.03 kN (6.2.2 (7), above), in tension F_t,Rd = 203.3 kN; 100 kN tension and 40 kN shear
     * per rod: 40/56.03 + 100/(1.4 · 203.3) = 0.7139 + 0.3514 = 1.065.
     */
    @Test
    void rodInTensionWithShear() {
        En1993AnchorRods rods = new En1993AnchorRods(1, 0.024, BoltGrade.G8_8, 1.25);
        CheckResult combined = rods.check(100e3, 40e3).get(2);
        assertEquals(CheckMode.ANCHOR_COMBINED, combined.mode());
        assertEquals(1.065, combined.utilisation(), 0.004);
    }

    /**
     * Three 120 mm rods at an allowable 60 MPa carry about 2 036 kN (common practice, allowable-stress
     * check, the figure): 3 · π · 60² mm² · 60 MPa = 2 035.75 kN — the figure is reached on the
     * gross area of the rod, π d²/4 with d = 120 mm (radius 60 mm), so that is the area basis.
     */
    @Test
    void threeLargeRodsAtAnAllowableStress() {
        AllowableStressAnchorRods rods = new AllowableStressAnchorRods(3, 0.120, 60e6, 40e6);
        assertEquals(2035.75e3, rods.tensionCapacity(), 0.01e3);
        assertEquals(1.0, rods.check(2035.75e3, 0).get(0).utilisation(), 1e-5);
    }

    /**
     * 75 m³ of concrete at 25 kN/m³ (EN 1991-1-1 Table A.1, reinforced concrete) balances 1 875 kN:
     * with a factor of 1, the volume needed for 1 875 kN of uplift is 1 875/25 = 75 m³; and a 5 × 5 × 3 m
     * block (75 m³) standing on the ground under 1 875 kN of uplift is used exactly.
     */
    @Test
    void concreteVolumeBalancingUplift() {
        FoundationSpec spec = new FoundationSpec(new FoundationSpec.Block(5, 5, 3, 0), 25, 18, 20,
                new FoundationSpec.FactorOfSafety(1.0), 200, 0.4, 1.5, null);
        FoundationCheck check = new FoundationCheck(spec, PartialFactors.RECOMMENDED);
        assertEquals(75.0, check.concreteVolumeToBalance(1875e3), 1e-9);
        FoundationResult r = check.check(new LegBaseForces(-1875e3, 0), ReactionLevel.SERVICE);
        assertEquals(1.0, find(r, CheckMode.UPLIFT).utilisation(), 1e-9);
        assertEquals(75.0, r.concreteVolumeRequired(), 1e-9);
    }

    /**
     * The prismatoid formula against the frustum of a pyramid V = h/3 (A1 + A2 + √(A1 A2)): a 2 × 2 m
     * block under 1.5 m of soil, half-angle 30°: spread 1.5 tan 30° = 0.8660 m, top 3.7321² = 13.928 m²,
     * V = 0.5 (4 + 13.928 + 7.464) = 12.696 m³. Rectangular 2 × 3 m, 1.2 m, 20°: the integral
     * ∫(2 + 2z tan θ)(3 + 2z tan θ) dz = 2·3·1.2 + 5 tan θ · 1.2² + 4/3 tan²θ · 1.2³ = 7.2 + 2.6206 + 0.3052 = 10.1258 m³.
     */
    @Test
    void frustumVolumeByThePrismatoidFormula() {
        FootingBlock square = new FootingBlock(2, 2, 1, 2.5, 25e3, 18e3, Math.toRadians(30));
        double a1 = 4;
        double a2 = Math.pow(2 + 2 * 1.5 * Math.tan(Math.toRadians(30)), 2);
        assertEquals(1.5 / 3 * (a1 + a2 + Math.sqrt(a1 * a2)), square.frustumVolume(), 1e-9);
        assertEquals(12.696, square.frustumVolume(), 5e-4);
        double t = Math.tan(Math.toRadians(20));
        FootingBlock rectangle = new FootingBlock(2, 3, 1, 2.2, 25e3, 18e3, Math.toRadians(20));
        assertEquals(2 * 3 * 1.2 + 5 * t * 1.44 + 4.0 / 3 * t * t * Math.pow(1.2, 3), rectangle.frustumVolume(), 1e-9);
        assertEquals(10.1258, rectangle.frustumVolume(), 5e-4);
        // a prismatoid of one constant section is a prism
        assertEquals(6.0, FootingBlock.prismatoidVolume(2, 3, 3, 3), 1e-12);
    }

    /**
     * A 2 × 2 × 1 m block with its base 2 m deep (1 m of soil on it), γc = 25, γs = 18 kN/m³,
     * half-angle 0: the block weighs 100 kN, the soil on it 72 kN.
     * Bearing under 300 kN: (300 + 100 + 72)/4 = 118 kPa against 200 kPa: 0.59.
     * Sliding under H = 50 kN, μ = 0.4, FS 1.5: 1.5 · 50/(0.4 · 472) = 0.3972.
     * Uplift 150 kN with γ_G,stb = 0.9 (EN 1997-1 UPL): 150/(0.9 · 172) = 0.9690; the concrete alone to
     * balance it, 150/(0.9 · 25) = 6.667 m³.
     */
    @Test
    void bearingSlidingAndUpliftByHand() {
        FoundationSpec spec = new FoundationSpec(new FoundationSpec.Block(2, 2, 1, 2), 25, 18, 0,
                new FoundationSpec.PartialFactor(0.9), 200, 0.4, 1.5, null);
        FoundationCheck check = new FoundationCheck(spec, PartialFactors.RECOMMENDED);
        FoundationResult compression = check.check(new LegBaseForces(300e3, 50e3), ReactionLevel.SERVICE);
        assertEquals(0.59, find(compression, CheckMode.BEARING_PRESSURE).utilisation(), 1e-9);
        assertEquals(0.3972, find(compression, CheckMode.SLIDING).utilisation(), 5e-5);
        assertEquals(0, find(check.check(new LegBaseForces(300e3, 50e3), ReactionLevel.FACTORED), CheckMode.UPLIFT)
                .utilisation());
        FoundationResult uplift = check.check(new LegBaseForces(-150e3, 0), ReactionLevel.FACTORED);
        assertEquals(0.9690, find(uplift, CheckMode.UPLIFT).utilisation(), 5e-5);
        assertEquals(6.667, uplift.concreteVolumeRequired(), 5e-4);
    }

    /**
     * Which reactions each rule takes: a factor of safety, an allowable bearing pressure, sliding and
     * allowable rod stresses are allowable-stress rules (service reactions); EN 1997-1 UPL and rods by
     * grade (EN 1993-1-8) are partial-factor rules (factored reactions).
     */
    @Test
    void allowableStressRulesTakeServiceReactionsAndPartialFactorRulesFactoredOnes() {
        FoundationSpec.Block block = new FoundationSpec.Block(2, 2, 1, 2);
        FoundationCheck allowable = new FoundationCheck(new FoundationSpec(block, 25, 18, 0,
                new FoundationSpec.FactorOfSafety(1.5), 200, 0.4, 1.5,
                new FoundationSpec.RodsByAllowableStress(4, 24, 150, 80)), PartialFactors.RECOMMENDED);
        LegBaseForces pull = new LegBaseForces(-100e3, 20e3);
        assertEquals(java.util.Set.of(CheckMode.UPLIFT, CheckMode.BEARING_PRESSURE, CheckMode.SLIDING,
                        CheckMode.ANCHOR_TENSION, CheckMode.ANCHOR_SHEAR, CheckMode.ANCHOR_COMBINED),
                modes(allowable.check(pull, ReactionLevel.SERVICE)));
        assertEquals(null, allowable.check(pull, ReactionLevel.FACTORED));
        FoundationCheck factored = new FoundationCheck(new FoundationSpec(block, 25, 18, 0,
                new FoundationSpec.PartialFactor(0.9), 200, 0.4, 1.5,
                new FoundationSpec.RodsByGrade(4, 24, tetrapod.model.spec.BoltGrade.G8_8)), PartialFactors.RECOMMENDED);
        assertEquals(java.util.Set.of(CheckMode.UPLIFT, CheckMode.ANCHOR_TENSION, CheckMode.ANCHOR_SHEAR,
                        CheckMode.ANCHOR_COMBINED), modes(factored.check(pull, ReactionLevel.FACTORED)));
        assertEquals(java.util.Set.of(CheckMode.BEARING_PRESSURE, CheckMode.SLIDING),
                modes(factored.check(pull, ReactionLevel.SERVICE)));
        // the factor of safety on the service uplift: 100 kN × 1.5 / (block 100 kN + soil prism 1 m × 4 m² × 18 = 72 kN)
        assertEquals(100e3 * 1.5 / (100e3 + 72e3), find(allowable.check(pull, ReactionLevel.SERVICE), CheckMode.UPLIFT)
                .utilisation(), 1e-9);
    }

    private static java.util.Set<CheckMode> modes(FoundationResult r) {
        return r.checks().stream().map(CheckResult::mode).collect(java.util.stream.Collectors.toSet());
    }

    @Test
    void legBaseForcesFromTheReaction() {
        LegBaseForces f = LegBaseForces.fromReaction(30e3, -40e3, -100e3);
        assertEquals(50e3, f.horizontal(), 1e-9);
        assertEquals(100e3, f.uplift(), 1e-9);
        assertEquals(0, f.compression());
    }
}
