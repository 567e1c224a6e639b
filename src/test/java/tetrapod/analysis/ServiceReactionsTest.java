package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import tetrapod.check.CheckMode;
import tetrapod.check.FoundationEnvelope;
import tetrapod.check.ReactionLevel;

/**
 * Allowable-stress footing rules take unfactored (service) reactions, partial-factor rules factored
 * ones; each footing check says which case it used. Closed form on the one-panel tower of
 * {@link HandGoverningTest} under a uniform 3 kPa:
 * <pre>
 *   G = 9.80665 (184 + 40√13) = 3218.759 N, F = 3 × 1344.777 = 4034.332 N at 1.5 m, d = √8
 *   service 1.0G + 1.0W on a diagonal: uplift = 1.5 F/d − G/4 = 2139.527 − 804.690 = 1334.838 N
 *   factored "uplift" 1.0G + 1.5W:        uplift = 2.25 F/d − G/4 = 3209.291 − 804.690 = 2404.601 N
 *   footing: a 1 × 1 × 0.5 m block at 0.5 m depth, no soil above it: 0.5 m³ × 25 kN/m³ = 12.5 kN
 *   factor of safety 1.5 (service): 1334.838 × 1.5 / 12500 = 0.160181
 *   EN 1997-1 UPL γ_G,stb = 0.9 (factored): 2404.601 / (0.9 × 12500) = 0.213742
 * </pre>
 */
class ServiceReactionsTest {

    private static final double G = 9.80665 * (184 + 40 * Math.sqrt(13));
    private static final double F = 3000 * (0.6 + 0.14 * Math.sqrt(13) + 0.24);
    private static final double D = Math.sqrt(8);

    private static String tower(String uplift) {
        return TestTowers.handTower(3.0, """
                { "foundation": { "block": { "widthX": 1.0, "widthY": 1.0, "height": 0.5, "depth": 0.5 },
                  "soilUnitWeight": 18.0, "frustumHalfAngle": 0.0, "allowableBearing": 200.0, "friction": 0.4,
                  "uplift": %s } }""".formatted(uplift));
    }

    private static FoundationEnvelope.Governing upliftOfWorstLeg(String uplift) throws Exception {
        return TestTowers.analyse(tower(uplift)).result().foundations().stream()
                .map(f -> f.checks().get(CheckMode.UPLIFT))
                .max(java.util.Comparator.comparingDouble(g -> g.check().utilisation())).orElseThrow();
    }

    @Test
    void aFactorOfSafetyTakesTheServiceReactions() throws Exception {
        FoundationEnvelope.Governing g = upliftOfWorstLeg("{ \"factorOfSafety\": 1.5 }");
        assertEquals(1334.838, 1.5 * F / D - G / 4, 5e-4);
        assertEquals(0.160181, (1.5 * F / D - G / 4) * 1.5 / 12500, 5e-7);
        assertEquals((1.5 * F / D - G / 4) * 1.5 / 12500, g.check().utilisation(), 1e-6);
        assertEquals(ReactionLevel.SERVICE, g.level());
        assertTrue(g.where().caseId().startsWith("service: 1.0G + 1.0W@"), g.where().caseId());
    }

    @Test
    void theUplPartialFactorTakesTheFactoredReactions() throws Exception {
        FoundationEnvelope.Governing g = upliftOfWorstLeg("{ \"gammaStabilising\": 0.9 }");
        assertEquals(0.213742, (2.25 * F / D - G / 4) / (0.9 * 12500), 5e-7);
        assertEquals((2.25 * F / D - G / 4) / (0.9 * 12500), g.check().utilisation(), 1e-6);
        assertEquals(ReactionLevel.FACTORED, g.level());
        assertTrue(g.where().caseId().startsWith("uplift@"), g.where().caseId());
    }
}
