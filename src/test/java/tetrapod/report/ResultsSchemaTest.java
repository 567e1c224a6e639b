package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** docs/results.schema.json: every example's results.json follows it; it documents every property with its unit. */
class ResultsSchemaTest {

    private static final Path SCHEMA = Path.of("docs/results.schema.json");

    static Stream<Path> models() throws IOException {
        return ExampleRuns.models();
    }

    private static JsonSchema schema() throws IOException {
        try (InputStream in = Files.newInputStream(SCHEMA)) {
            return JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012).getSchema(in);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void everyExamplesResultsFollowTheSchema(Path model) throws IOException {
        Set<ValidationMessage> messages = schema().validate(ExampleRuns.results(model));
        assertTrue(messages.isEmpty(), () -> model + ": " + messages);
    }

    @Test
    void theSchemaRefusesAResultsFileWithAMissingOrUnknownKey() throws IOException {
        Path model = ExampleRuns.models().findFirst().orElseThrow();
        ObjectNode missing = (ObjectNode) ExampleRuns.results(model).deepCopy();
        missing.remove("legBases");
        assertFalse(schema().validate(missing).isEmpty(), "results without legBases passed");
        ObjectNode unknown = (ObjectNode) ExampleRuns.results(model).deepCopy();
        ((ObjectNode) unknown.get("sweep")).put("stepDegrees", 5.0);
        assertFalse(schema().validate(unknown).isEmpty(), "an unknown key in sweep passed");
        ObjectNode wrongMode = (ObjectNode) ExampleRuns.results(model).deepCopy();
        ((ObjectNode) wrongMode.get("checks").get(0)).put("mode", "wobble");
        assertFalse(schema().validate(wrongMode).isEmpty(), "an unknown check mode passed");
    }

    @Test
    void everyPropertyHasADescriptionAndNumbersNameTheirUnit() throws IOException {
        JsonNode root = ExampleRuns.JSON.readTree(SCHEMA.toFile());
        List<String> faults = new ArrayList<>();
        walk(root, root, "#", faults);
        assertEquals(List.of(), faults);
        for (String key : List.of("format", "input", "model", "cases", "wind", "sweep", "checks", "foundations",
                "legBases", "handMethod", "handMethodGoverning", "ice", "combinations", "material", "steel", "defaults")) {
            assertTrue(root.path("properties").has(key), "the schema does not describe " + key);
        }
    }

    /** Units as the schema writes them (SI base units in results.json). */
    private static final List<String> UNITS = List.of(", N", " N,", " N.", " N)", "in N", "N·m", "Pa", " m,", " m.", " m;", " m)",
            "m²", "m³", "m⁴", "rad", "kg", "Hz", ", s.", "degrees", "percent", "dimensionless", "no unit", "in years", "m/s");

    private static void walk(JsonNode root, JsonNode schema, String where, List<String> faults) {
        if (!schema.isObject()) {
            return;
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = schema.path("properties").fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            String at = where + "/properties/" + e.getKey();
            JsonNode described = described(root, e.getValue());
            if (!described.has("description")) {
                faults.add(at + ": no description");
            } else if (isNumber(root, e.getValue())
                    && UNITS.stream().noneMatch(described.get("description").asText()::contains)) {
                faults.add(at + ": a number whose description names no unit");
            }
            walk(root, e.getValue(), at, faults);
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = schema.path("$defs").fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            walk(root, e.getValue(), where + "/$defs/" + e.getKey(), faults);
        }
        for (String keyword : List.of("items", "additionalProperties")) {
            walk(root, schema.path(keyword), where + "/" + keyword, faults);
        }
    }

    /** A number, a nullable number, or an array of numbers (directly or through a $ref). */
    private static boolean isNumber(JsonNode root, JsonNode property) {
        JsonNode p = property.has("$ref") ? root.at(property.get("$ref").asText().substring(1)) : property;
        JsonNode type = p.path("type");
        if (type.isArray()) {
            for (JsonNode t : type) {
                if ("number".equals(t.asText())) {
                    return true;
                }
            }
        }
        if ("array".equals(type.asText())) {
            return "number".equals(p.path("items").path("type").asText());
        }
        return "number".equals(type.asText());
    }

    private static JsonNode described(JsonNode root, JsonNode property) {
        if (property.has("description") || !property.has("$ref")) {
            return property;
        }
        return root.at(property.get("$ref").asText().substring(1));
    }
}
