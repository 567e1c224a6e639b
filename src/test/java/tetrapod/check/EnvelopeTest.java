package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.model.spec.FoundationSpec;
import tetrapod.model.spec.PartialFactors;

/** Envelopes keep the largest value with its case and azimuth; ties keep the earlier case. */
class EnvelopeTest {

    private static MemberCheckResult result(double utilisation, CheckMode mode) {
        return new MemberCheckResult(5, List.of(new CheckResult(mode, utilisation, "clause " + mode, "")));
    }

    @Test
    void memberEnvelopeOverCases() {
        MemberEnvelope e = MemberEnvelope.empty(5);
        assertNull(e.governing());
        e = e.with(result(0.4, CheckMode.TENSION), MemberForces.axial(40e3), "C1", 0.0);
        e = e.with(result(0.9, CheckMode.COMPRESSION_BUCKLING), MemberForces.axial(-30e3), "C1", 45.0);
        e = e.with(result(0.9, CheckMode.COMPRESSION_BUCKLING), MemberForces.axial(-35e3), "C2", 90.0);
        e = e.with(result(0.2, CheckMode.TENSION), MemberForces.axial(10e3), "G", null);
        assertEquals(CheckMode.COMPRESSION_BUCKLING, e.governing().mode());
        assertEquals(new Extreme(0.9, "C1", 45.0), e.governingWhere());
        assertEquals(new Extreme(40e3, "C1", 0.0), e.maxTension());
        assertEquals(new Extreme(35e3, "C2", 90.0), e.maxCompression());
    }

    @Test
    void foundationEnvelopeOverCases() {
        FoundationSpec spec = new FoundationSpec(new FoundationSpec.Block(2, 2, 1, 2), 25, 18, 0,
                new FoundationSpec.FactorOfSafety(1.5), 200, 0.4, 1.5, null);
        FoundationCheck check = new FoundationCheck(spec, PartialFactors.RECOMMENDED);
        FoundationEnvelope e = FoundationEnvelope.empty(1);
        LegBaseForces push = new LegBaseForces(300e3, 20e3);
        LegBaseForces pull = new LegBaseForces(-100e3, 30e3);
        // a factor of safety, bearing and sliding are allowable-stress rules: service reactions
        e = e.with(check.check(push, ReactionLevel.SERVICE), push, "W", 45.0, ReactionLevel.FACTORED);
        e = e.with(check.check(pull, ReactionLevel.SERVICE), pull, "W", 225.0, ReactionLevel.FACTORED);
        assertEquals(null, check.check(push, ReactionLevel.FACTORED), "no rule of this footing takes factored reactions");
        assertEquals(new Extreme(300e3, "W", 45.0), e.maxCompression());
        assertEquals(new Extreme(100e3, "W", 225.0), e.maxUplift());
        assertEquals(new Extreme(30e3, "W", 225.0), e.maxShear());
        assertEquals(225.0, e.checks().get(CheckMode.UPLIFT).where().azimuthDeg());
        assertEquals(45.0, e.checks().get(CheckMode.BEARING_PRESSURE).where().azimuthDeg());
        // 100 kN × 1.5 / 25 kN/m³ = 6 m³ of concrete alone
        assertEquals(6.0, e.concreteVolumeRequired(), 1e-9);
    }
}
