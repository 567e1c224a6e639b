package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.model.spec.ActionFactorSet;
import tetrapod.model.spec.ActionFactors;
import tetrapod.model.spec.BasisMix;
import tetrapod.model.spec.CheckMethod;
import tetrapod.model.spec.DesignBasis;
import tetrapod.model.spec.FoundationSpec;
import tetrapod.model.spec.TowerSpec;

/**
 * The design basis (DESIGN.md "One design basis at a time"): the family a model names or takes
 * from its wind or check method, the defaults that follow it, and mixes refused unless allowed.
 */
class DesignBasisReaderTest {

    private static final FixtureSections CATALOGUE = new FixtureSections();
    private static final String EN_WIND = "\"wind\": { \"method\": \"en1991\", \"basicSpeed\": 26.0, \"terrain\": \"II\" }";
    private static final String US_WIND = "\"wind\": { \"method\": \"asce7\", \"speed\": 50.0, \"exposure\": \"C\" }";
    private static final String FOOTING = "\"foundation\": { \"block\": { \"widthX\": 2.0, \"widthY\": 2.0, \"height\": 1.0,"
            + " \"depth\": 2.0 }, \"soilUnitWeight\": 18.0, \"frustumHalfAngle\": 20.0, \"allowableBearing\": 200.0,"
            + " \"friction\": 0.4 }";

    private static String tower(String extra) {
        return "{ \"name\": \"T\", \"base\": { \"widthX\": 4.0, \"widthY\": 4.0 }, \"segments\": [ { \"height\": 8.0,"
                + " \"panels\": 4, \"bracing\": \"x\", \"sections\": { \"leg\": \"L100x10\", \"diagonal\": \"L60x6\","
                + " \"horizontal\": \"L60x6\" } } ]" + extra + " }";
    }

    private static TowerSpec read(String extra) throws BadInputException {
        return SpecReader.read(tower(extra), CATALOGUE);
    }

    private static List<Problem> problems(String extra) {
        return assertThrows(BadInputException.class, () -> read(extra)).problems();
    }

    @Test
    void anEnModelDefaultsToTheTowerFactorsOfClassTwoAndTheEnChecks() throws BadInputException {
        TowerSpec spec = read(", \"loads\": { " + EN_WIND + " }, \"checks\": { " + FOOTING + " }");
        assertEquals(DesignBasis.EN, spec.basis(), "taken from loads.wind.method en1991");
        assertEquals(new ActionFactors(ActionFactorSet.EN1993_3_1, 2), spec.loads().actionFactors());
        assertEquals(CheckMethod.EN1993, spec.checks().method());
        // EN 1990 Table A1.2(A): γ_G,inf = 0.90 on the stabilising weights
        assertEquals(new FoundationSpec.PartialFactor(0.9), spec.checks().foundation().uplift());
        assertTrue(spec.basisMixes().isEmpty());
    }

    @Test
    void aUsModelDefaultsToAsce7AndAsce10AndAFactorOfSafety() throws BadInputException {
        TowerSpec spec = read(", \"loads\": { " + US_WIND + " }, \"checks\": { " + FOOTING + " }");
        assertEquals(DesignBasis.US, spec.basis(), "taken from loads.wind.method asce7");
        assertEquals(ActionFactorSet.ASCE7, spec.loads().actionFactors().set());
        assertEquals(CheckMethod.ASCE10, spec.checks().method());
        assertEquals(new FoundationSpec.FactorOfSafety(1.5), spec.checks().foundation().uplift());
    }

    @Test
    void withoutWindTheCheckMethodNamesTheFamilyAndWithoutEitherItIsEn() throws BadInputException {
        assertEquals(DesignBasis.US, read(", \"checks\": { \"method\": \"asce10\" }").basis());
        TowerSpec bare = read("");
        assertEquals(DesignBasis.EN, bare.basis());
        assertEquals(CheckMethod.EN1993, bare.checks().method());
        TowerSpec us = read(", \"basis\": \"us\"");
        assertEquals(CheckMethod.ASCE10, us.checks().method(), "no checks block: the method of the basis");
        assertEquals(ActionFactorSet.ASCE7, us.loads().actionFactors().set());
    }

    @Test
    void theReliabilityClassAndTheBuildingFactorsAreRead() throws BadInputException {
        assertEquals(new ActionFactors(ActionFactorSet.EN1993_3_1, 3),
                read(", \"loads\": { " + EN_WIND + ", \"reliabilityClass\": 3 }").loads().actionFactors());
        assertEquals(ActionFactorSet.EN1990,
                read(", \"loads\": { " + EN_WIND + ", \"actionFactors\": \"en1990\" }").loads().actionFactors().set());
    }

    @Test
    void everyValueOfTheOtherFamilyIsRefusedAtItsKey() {
        List<Problem> p = problems(", \"basis\": \"en\", \"loads\": { " + US_WIND + ", \"actionFactors\": \"asce7\" },"
                + " \"checks\": { \"method\": \"asce10\" }");
        assertEquals(List.of("loads.wind.method", "loads.actionFactors", "checks.method"),
                p.stream().map(Problem::path).toList());
        assertTrue(p.get(2).message().contains("allowed here: en1993"), p.get(2).message());
        List<Problem> footing = problems(", \"basis\": \"us\", \"checks\": { \"foundation\": { \"block\": { \"widthX\": 2.0,"
                + " \"widthY\": 2.0, \"height\": 1.0, \"depth\": 2.0 }, \"soilUnitWeight\": 18.0, \"frustumHalfAngle\": 20.0,"
                + " \"allowableBearing\": 200.0, \"friction\": 0.4, \"uplift\": { \"gammaStabilising\": 0.9 },"
                + " \"anchorRods\": { \"count\": 4, \"diameter_mm\": 24, \"grade\": \"8.8\" } } }");
        assertEquals(List.of("checks.foundation.uplift.gammaStabilising", "checks.foundation.anchorRods.grade"),
                footing.stream().map(Problem::path).toList());
        assertTrue(footing.get(1).message().contains("allowed here: allowableTension and allowableShear"));
    }

    @Test
    void commonPracticeFootingRulesBelongToNeitherFamily() throws BadInputException {
        String rules = ", \"checks\": { \"foundation\": { \"block\": { \"widthX\": 2.0, \"widthY\": 2.0, \"height\": 1.0,"
                + " \"depth\": 2.0 }, \"soilUnitWeight\": 18.0, \"frustumHalfAngle\": 20.0, \"allowableBearing\": 200.0,"
                + " \"friction\": 0.4, \"uplift\": { \"factorOfSafety\": 1.5 }, \"anchorRods\": { \"count\": 4,"
                + " \"diameter_mm\": 24, \"allowableTension\": 150.0, \"allowableShear\": 80.0 } } }";
        assertTrue(read(", \"basis\": \"en\"" + rules).basisMixes().isEmpty());
    }

    @Test
    void mixedBasisAllowsTheMixAndKeepsEachAsAWarning() throws BadInputException {
        TowerSpec spec = read(", \"mixedBasis\": true, \"loads\": { " + EN_WIND + " }, \"checks\": { \"method\": \"asce10\" }");
        assertEquals(DesignBasis.EN, spec.basis(), "the wind names the basis when both are given");
        assertTrue(spec.mixedBasis());
        List<BasisMix> mixes = spec.basisMixes();
        assertEquals(1, mixes.size());
        assertEquals("checks.method: ASCE 10 member and bolt checks (us) in a model of basis en",
                mixes.get(0).describe(spec.basis()));
        assertFalse(read(", \"loads\": { " + EN_WIND + " }").mixedBasis());
    }
}
