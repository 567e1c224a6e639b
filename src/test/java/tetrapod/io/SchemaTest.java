package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
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
import org.junit.jupiter.params.provider.ValueSource;

/** docs/tower-spec.schema.json: accepts every example model, refuses bad ones, documents every property's unit. */
class SchemaTest {

    private static final Path SCHEMA = Path.of("docs/tower-spec.schema.json");
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private static JsonSchema schema() throws IOException {
        try (InputStream in = Files.newInputStream(SCHEMA)) {
            return JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012).getSchema(in);
        }
    }

    static Stream<Path> goodFiles() {
        return SpecWriterTest.everyModelUnchecked();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("goodFiles")
    void everyExampleModelIsValid(Path file) throws IOException {
        Set<ValidationMessage> messages = schema().validate(MAPPER.readTree(file.toFile()));
        assertTrue(messages.isEmpty(), () -> file + ": " + messages);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("goodFiles")
    void theWritersOutputIsValid(Path file) throws Exception {
        String written = SpecWriter.write(SpecReader.read(file, new FixtureSections()));
        Set<ValidationMessage> messages = schema().validate(MAPPER.readTree(written));
        assertTrue(messages.isEmpty(), () -> file + ": " + messages);
    }

    /** Bad specs whose fault a schema can express. */
    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"wrong-type-panels.json", "wrong-type-quoted-number.json", "wrong-type-crossing.json",
        "negative-width.json", "zero-height.json", "zero-base-width.json", "zero-width-below-segment.json",
        "zero-panels.json", "unknown-bracing.json", "unknown-key.json", "unknown-top-key.json", "empty-segments.json",
        "both-base-and-frame.json", "neither-base-nor-frame.json", "missing-name.json", "missing-bracing.json",
        "missing-horizontal-section.json", "redundants-out-of-range.json", "connection-allowance-range.json",
        "restraint-wrong-length.json", "frame-unknown-role.json", "frame-with-tower-supports.json",
        "not-an-object.json", "wind-negative-speed.json", "wind-absurd-speed.json", "wind-unknown-terrain.json",
        "wind-unknown-exposure.json", "wind-unknown-method.json", "wind-key-of-other-method.json",
        "wind-direction-factors-count.json", "ice-negative-thickness.json", "ice-asce7-design-thickness.json", "combination-misspelt-action.json",
        "wind-on-explicit-frame.json",
        "checks-unknown-key.json", "checks-bolt-grade.json", "checks-bolt-size.json", "checks-uplift-both.json", "checks-anchor-no-resistance.json", "checks-anchor-grade.json",
        "checks-frustum-angle.json", "serviceability-negative-tilt.json", "serviceability-absurd-sway.json",
        "serviceability-return-period-range.json"})
    void schemaRefusesBadSpecs(String file) throws IOException {
        JsonNode tree = MAPPER.readTree(BadSpecsTest.resource(file));
        assertFalse(schema().validate(tree).isEmpty(), file + " passed the schema");
    }

    /** Faults only the reader can find: cross-references, sums, names, relations between values. */
    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"unknown-section.json", "panel-heights-sum.json", "panel-heights-count.json",
        "material-fu-below-fy.json", "user-angle-too-thick.json", "frame-member-missing-node.json",
        "frame-duplicate-node-id.json", "load-on-missing-node.json", "ancillary-above-top.json",
        "combination-wind-without-wind.json", "sweep-step-not-divisor.json",
        "checks-factors-asce.json", "checks-connection-overlap.json", "checks-segment-out-of-range.json",
        "serviceability-unknown-ancillary.json", "serviceability-wind-key-of-other-method.json",
        "serviceability-level-range-without-level.json"})
    void someFaultsNeedTheReader(String file) throws IOException {
        JsonNode tree = MAPPER.readTree(BadSpecsTest.resource(file));
        assertEquals(Set.of(), schema().validate(tree), file);
    }

    @Test
    void segmentRulesForHorizontalAndRedundantSections() throws IOException {
        String base = "{ \"name\": \"T\", \"base\": { \"widthX\": 4, \"widthY\": 4 }, \"segments\": [ %s ] }";
        String none = "{ \"height\": 8, \"panels\": 4, \"bracing\": \"x\", \"horizontals\": \"none\","
                + " \"sections\": { \"leg\": \"A\", \"diagonal\": \"B\" } }";
        String redundant = "{ \"height\": 8, \"panels\": 4, \"bracing\": \"x\", \"horizontals\": \"none\", \"redundants\": 1,"
                + " \"sections\": { \"leg\": \"A\", \"diagonal\": \"B\" } }";
        String defaultAll = "{ \"height\": 8, \"panels\": 4, \"bracing\": \"x\", \"sections\": { \"leg\": \"A\", \"diagonal\": \"B\" } }";
        assertTrue(schema().validate(MAPPER.readTree(String.format(base, none))).isEmpty());
        assertFalse(schema().validate(MAPPER.readTree(String.format(base, redundant))).isEmpty());
        assertFalse(schema().validate(MAPPER.readTree(String.format(base, defaultAll))).isEmpty());
    }

    @Test
    void everyPropertyHasADescriptionAndNumbersNameTheirUnit() throws IOException {
        JsonNode root = MAPPER.readTree(SCHEMA.toFile());
        List<String> faults = new ArrayList<>();
        walk(root, root, "#", faults);
        assertEquals(List.of(), faults);
    }

    private static final List<String> UNITS = List.of(" m", "m.", "m,", "MPa", "kN", "mm", "cm²", "cm⁴", "kg/m", "dimensionless",
            "kPa", "m/s", "degrees");

    /** Walks schema objects only: the values of properties and $defs, and the sub-schemas of the keywords. */
    private static void walk(JsonNode root, JsonNode schema, String where, List<String> faults) {
        if (!schema.isObject()) {
            return;
        }
        boolean conditional = where.contains("/if") || where.contains("/then") || where.contains("/not");
        JsonNode properties = schema.path("properties");
        for (Iterator<Map.Entry<String, JsonNode>> it = properties.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            String at = where + "/properties/" + e.getKey();
            JsonNode described = described(root, e.getValue());
            // an if/then/not clause restating another rule is not a property definition
            if (!conditional) {
                if (!described.has("description")) {
                    faults.add(at + ": no description");
                } else if ("number".equals(described.path("type").asText())
                        && UNITS.stream().noneMatch(described.get("description").asText()::contains)) {
                    faults.add(at + ": a number whose description names no unit");
                }
            }
            walk(root, e.getValue(), at, faults);
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = schema.path("$defs").fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            walk(root, e.getValue(), where + "/$defs/" + e.getKey(), faults);
        }
        for (String keyword : List.of("items", "additionalProperties", "not", "if", "then", "else")) {
            walk(root, schema.path(keyword), where + "/" + keyword, faults);
        }
        for (String keyword : List.of("oneOf", "anyOf", "allOf")) {
            JsonNode list = schema.path(keyword);
            for (int k = 0; k < list.size(); k++) {
                walk(root, list.get(k), where + "/" + keyword + "/" + k, faults);
            }
        }
    }

    /** The property's own schema if it has a description, else the one its $ref points to. */
    private static JsonNode described(JsonNode root, JsonNode property) {
        if (property.has("description") || !property.has("$ref")) {
            return property;
        }
        return root.at(property.get("$ref").asText().substring(1));
    }
}
