package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.load.En1991StructuralFactor;
import tetrapod.load.En1991Wind;
import tetrapod.model.spec.TerrainCategory;

/**
 * c_s·c_d computed from the tower reaches the wind (issue 14 item 3): analyze of the ridge example
 * without a structuralFactor gives every panel force c_s·c_d times its force with a given factor of
 * 1, and the factor is EN 1991-1-4 Annex B of the first sway frequency results.json reports.
 */
class StructuralFactorCommandTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    @Test
    void theComputedFactorScalesEveryPanelForceAndFollowsTheFirstSwayFrequency(@TempDir Path dir) throws Exception {
        ObjectNode model = (ObjectNode) MAPPER.readTree(Path.of("models/ridge-lookout-square.json").toFile());
        JsonNode wind = model.at("/loads/wind");
        assertTrue(wind.path("structuralFactor").isMissingNode(), "the example leaves c_s·c_d to be computed");
        JsonNode computed = analyse(dir, "computed", model);
        ((ObjectNode) wind).put("structuralFactor", 1.0);
        JsonNode given = analyse(dir, "given", model);

        JsonNode factor = computed.get("structuralFactor");
        assertEquals("computed", factor.get("source").asText());
        assertEquals("given", given.at("/structuralFactor/source").asText());
        assertEquals(1.0, given.at("/structuralFactor/value").asDouble(), 0);
        double value = factor.get("value").asDouble();
        // the user's value is used, and the computation beside it is the same tower's (the factor changes no mass)
        assertEquals(value, given.at("/structuralFactor/computed").asDouble(), 0);
        assertEquals(value, factor.get("computed").asDouble(), 0);
        for (int a = 0; a < computed.get("wind").size(); a++) {
            JsonNode p = computed.get("wind").get(a).get("panels");
            JsonNode q = given.get("wind").get(a).get("panels");
            for (int k = 0; k < p.size(); k++) {
                assertEquals(value * q.get(k).get("force").asDouble(), p.get(k).get("force").asDouble(),
                        1e-9 * Math.abs(q.get(k).get("force").asDouble()) + 1e-9);
            }
        }
        double firstSway = 0;
        for (JsonNode m : computed.get("modes")) {
            if (m.get("kind").asText().equals("sway")) {
                firstSway = m.get("frequencyHz").asDouble();
                break;
            }
        }
        assertEquals(firstSway, factor.get("frequencyHz").asDouble(), 1e-12);
        En1991Wind profile = new En1991Wind(terrain(wind.get("terrain").asText()),
                wind.get("basicSpeed").asDouble(), wind.path("seasonFactor").asDouble(1), wind.path("orography").asDouble(1),
                wind.path("turbulenceFactor").asDouble(1), wind.path("airDensity").asDouble(1.25), 1.0, java.util.List.of());
        En1991StructuralFactor again = En1991StructuralFactor.of(profile, factor.get("height").asDouble(),
                factor.get("width").asDouble(), firstSway, factor.get("logDecrement").asDouble());
        assertEquals(factor.get("structuralDamping").asDouble() + factor.get("aerodynamicDamping").asDouble(),
                factor.get("logDecrement").asDouble(), 1e-15);   // EN 1991-1-4 (F.15)
        assertEquals(again.value(), value, 1e-12);
    }

    /** ASCE 7: the harbour example sways above 1 Hz, so it is rigid and G = 0.85 (§26.11.1). */
    @Test
    void anAsceTowerSwayingAbove1HzTakesTheRigidGustFactor(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("harbour");
        CliRun run = CliRun.of("analyze", "models/harbour-beacon-rectangular.json", "-o", out.toString(), "--quiet");
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        JsonNode results = MAPPER.readTree(out.resolve("results.json").toFile());
        JsonNode g = results.get("gustFactor");
        assertEquals("rigid", g.get("source").asText());
        assertEquals(0.85, g.get("value").asDouble(), 0);
        assertTrue(g.get("frequencyHz").asDouble() >= 1.0);
        assertTrue(run.out().contains("wind: G = 0.850 computed from the tower (first sway"), run.out());
    }

    private static TerrainCategory terrain(String name) {
        for (TerrainCategory c : TerrainCategory.values()) {
            if (c.jsonName().equals(name)) {
                return c;
            }
        }
        throw new IllegalArgumentException(name);
    }

    private static JsonNode analyse(Path dir, String name, ObjectNode model) throws Exception {
        Path file = dir.resolve(name + ".json");
        Files.writeString(file, MAPPER.writeValueAsString(model));
        Path out = dir.resolve(name);
        CliRun run = CliRun.of("analyze", file.toString(), "-o", out.toString(), "--quiet");
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        if (name.equals("computed")) {
            assertTrue(run.out().contains("c_s·c_d = ") && run.out().contains("computed from the tower"), run.out());
        } else {
            assertTrue(run.out().contains("c_s·c_d = 1.000 as given in the model (loads.wind.structuralFactor); "
                    + "computed from the tower it would be "), run.out());
        }
        return MAPPER.readTree(out.resolve("results.json").toFile());
    }
}
