package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.model.Face;
import tetrapod.model.spec.AncillarySpec;
import tetrapod.model.spec.Asce7Edition;
import tetrapod.model.spec.CombinationSpec;
import tetrapod.model.spec.Exposure;
import tetrapod.model.spec.IceSpec;
import tetrapod.model.spec.LoadAction;
import tetrapod.model.spec.LoadsSpec;
import tetrapod.model.spec.TerrainCategory;
import tetrapod.model.spec.TowerSpec;
import tetrapod.model.spec.WindSpec;

/** Reading {@code loads}: wind, ancillaries, ice, combinations and the sweep step, with defaults and problems. */
class LoadsReaderTest {

    private static final FixtureSections CATALOGUE = new FixtureSections();
    private static final String TOWER = """
            { "name": "T", "base": { "widthX": 4, "widthY": 4 },
              "segments": [ { "height": 12, "panels": 4, "bracing": "x",
                "sections": { "leg": "L100x10", "diagonal": "L60x6", "horizontal": "L60x6" } } ],
              "loads": %s }
            """;

    private static TowerSpec read(String loads) throws BadInputException {
        return SpecReader.read(String.format(TOWER, loads), CATALOGUE);
    }

    private static List<String> problems(String loads) {
        BadInputException e = assertThrows(BadInputException.class, () -> read(loads));
        return e.problems().stream().map(Problem::toString).map(s -> s.replaceAll(" \\(line \\d+\\)$", "")).toList();
    }

    @Test
    void en1991WithItsDefaults() throws BadInputException {
        LoadsSpec loads = read("{ \"wind\": { \"method\": \"en1991\", \"basicSpeed\": 24, \"terrain\": \"0\" } }").loads();
        assertEquals(new WindSpec.En1991(24, TerrainCategory.CAT_0, List.of(), 1, 1, Double.NaN, 1, 1.25), loads.wind());
        assertEquals(LoadsSpec.DEFAULT_SWEEP_STEP, loads.sweepStep());
        assertEquals(List.of(), loads.combinations());
    }

    @Test
    void asce7WithItsDefaults() throws BadInputException {
        LoadsSpec loads = read("{ \"wind\": { \"method\": \"asce7\", \"speed\": 50, \"exposure\": \"B\" } }").loads();
        assertEquals(new WindSpec.Asce7(Asce7Edition.ASCE_7_16, 50, Exposure.B, 1, 1, 0.85, Double.NaN), loads.wind());
    }

    @Test
    void ancillariesIceAndCombinations() throws BadInputException {
        LoadsSpec loads = read("""
                { "wind": { "method": "uniform", "pressure": 1.1 },
                  "ancillaries": [ { "kind": "point", "name": "a", "height": 12, "weight": 1, "area": 0.5,
                                     "forceCoefficient": 1.2, "face": "-x" },
                                   { "kind": "linear", "name": "b", "from": 0, "to": 12, "weight": 0.1, "width": 0.2,
                                     "forceCoefficient": 1.5, "shielding": 0.3 } ],
                  "ice": { "thickness_mm": 10, "windPressure": 0.4 },
                  "combinations": [ { "name": "c", "dead": 1.1, "windOnIce": 0.9, "ice": 0 } ],
                  "sweepStep": 0.5 }""").loads();
        assertEquals(List.of(new AncillarySpec.Point("a", 12, 1, 0.5, 1.2, 0, Face.X_MINUS),
                new AncillarySpec.Linear("b", 0, 12, 0.1, 0.2, 1.5, 0.3, Face.NONE)), loads.ancillaries());
        assertEquals(new IceSpec(new IceSpec.Given(10, true), 900, Double.NaN, 0.4), loads.ice());
        assertEquals(List.of(new CombinationSpec("c", Map.of(LoadAction.DEAD, 1.1, LoadAction.WIND_ON_ICE, 0.9))),
                loads.combinations());
        assertEquals(0.5, loads.sweepStep());
    }

    @Test
    void everyProblemAtOnceWithItsPath() {
        List<String> found = problems("""
                { "wind": { "method": "en1991", "basicSpeed": 0, "terrain": "ii", "airDensity": 12 },
                  "ancillaries": [ { "kind": "point", "name": "x", "height": 20, "weight": -1, "area": 1,
                                     "forceCoefficient": 1 },
                                   { "kind": "linear", "name": "x", "from": 5, "to": 3, "weight": 0.1, "width": 0.1,
                                     "forceCoefficient": 1, "height": 4 },
                                   { "kind": "tube", "name": "y" } ],
                  "ice": { "thickness_mm": 500, "windPressure": 1 },
                  "combinations": [ { "name": "empty" }, { "name": "i", "ice": 1.2, "dead": 11 } ],
                  "sweepStep": 0.01 }""");
        List<String> expected = List.of(
                "loads.wind.basicSpeed: must be > 0 m/s, was 0",
                "loads.wind.terrain: unknown terrain category 'ii'; expected one of 0, I, II, III, IV; write it 'II'",
                "loads.wind.airDensity: must be > 0 kg/m³ and ≤ 2 kg/m³, was 12",
                "loads.ancillaries[0].height: is above the tower top (12 m), was 20",
                "loads.ancillaries[0].weight: must be ≥ 0 kN and ≤ 10000 kN, was -1",
                "loads.ancillaries[1].name: name 'x' is already used by loads.ancillaries[0]",
                "loads.ancillaries[1].to: must be above from (5 m), was 3",
                "loads.ancillaries[1].height: is a key of kind 'point', not of 'linear'; 'linear' takes name, from, to,"
                        + " weight, width, forceCoefficient, shielding, face",
                "loads.ancillaries[2].kind: unknown ancillary kind 'tube'; expected one of point, linear",
                "loads.ice.thickness_mm: must be ≥ 0 mm and ≤ 300 mm, was 500",
                "loads.ice.windPressure: applies to the uniform method; with en1991 and asce7 give windSpeed (m/s)",
                "loads.combinations[0]: must give a factor > 0 for at least one of dead, wind, ice, windOnIce, nodal",
                "loads.combinations[1].dead: must be ≥ 0 and ≤ 10, was 11",
                "loads.sweepStep: must be ≥ 0.1 degrees and ≤ 90 degrees, was 0.01");
        for (String e : expected) {
            assertTrue(found.contains(e), () -> "missing: " + e + "\nfound: " + String.join("\n", found));
        }
    }

    @Test
    void iceWindSpeedBelongsToTheCodeMethods() {
        List<String> found = problems("{ \"wind\": { \"method\": \"uniform\", \"pressure\": 1 }, \"ice\": { \"thickness_mm\": 5,"
                + " \"windSpeed\": 20 } }");
        assertEquals(List.of("loads.ice.windSpeed: applies to the en1991 and asce7 methods; with the uniform method give"
                + " windPressure (kPa)"), found);
    }

    /** With the asce7 wind the ice is the map's nominal thickness and I_i (default 1.0, risk category II). */
    @Test
    void asce7IceIsTheMapValue() throws BadInputException {
        LoadsSpec loads = read("{ \"wind\": { \"method\": \"asce7\", \"speed\": 50, \"exposure\": \"C\" },"
                + " \"ice\": { \"nominalThickness_mm\": 25.4, \"windSpeed\": 18 } }").loads();
        assertEquals(new IceSpec(new IceSpec.Asce7Map(25.4, 1.0), 900, 18, Double.NaN), loads.ice());
        loads = read("{ \"wind\": { \"method\": \"asce7\", \"speed\": 50, \"exposure\": \"C\" },"
                + " \"ice\": { \"nominalThickness_mm\": 12, \"importanceFactor\": 1.25 } }").loads();
        assertEquals(new IceSpec.Asce7Map(12, 1.25), loads.ice().thickness());
    }

    /** The old design-thickness keys are refused with the asce7 wind, naming the new key; the map keys without it. */
    @Test
    void iceKeysOfTheOtherRuleAreRefusedByName() {
        List<String> found = problems("{ \"wind\": { \"method\": \"asce7\", \"speed\": 50, \"exposure\": \"C\" },"
                + " \"ice\": { \"thickness_mm\": 12, \"heightFactor\": false } }");
        assertEquals(2, found.size(), found::toString);
        assertTrue(found.get(0).startsWith("loads.ice.thickness_mm: is not read with the asce7 wind: give nominalThickness_mm"),
                found::toString);
        assertTrue(found.get(1).startsWith("loads.ice.heightFactor: does not apply with the asce7 wind"), found::toString);
        found = problems("{ \"wind\": { \"method\": \"en1991\", \"basicSpeed\": 24, \"terrain\": \"II\" },"
                + " \"ice\": { \"nominalThickness_mm\": 12, \"importanceFactor\": 1.25 } }");
        assertTrue(found.contains("loads.ice.nominalThickness_mm: applies with the asce7 wind (ASCE 7 chapter 10 design"
                + " thickness); without it give thickness_mm, the design ice thickness at 10 m"), found::toString);
        assertTrue(found.contains("loads.ice.importanceFactor: applies with the asce7 wind (ASCE 7 chapter 10 design"
                + " thickness); without it give thickness_mm, the design ice thickness at 10 m"), found::toString);
        assertEquals(2, found.size(), found::toString);
    }

    @Test
    void missingRequiredKeysAreNamed() {
        List<String> found = problems("{ \"wind\": { \"method\": \"asce7\" } }");
        assertTrue(found.contains("loads.wind.speed: required key is missing; expected a wind speed > 0 m/s"), found::toString);
        assertTrue(found.contains("loads.wind.exposure: required key is missing; expected one of B, C, D"), found::toString);
    }

    @Test
    void everyOptionSpecReadsItsLoads() throws BadInputException {
        LoadsSpec loads = SpecReader.read(Path.of("src/test/resources/good-specs/every-option-generated.json"), CATALOGUE)
                .loads();
        assertEquals(new WindSpec.Uniform(0.9, 2.4), loads.wind());
        assertEquals(2, loads.ancillaries().size());
        assertEquals(new IceSpec(new IceSpec.Given(8, false), 850, Double.NaN, 0.35), loads.ice());
        assertEquals(2, loads.combinations().size());
        assertEquals(2.5, loads.sweepStep());
    }
}
