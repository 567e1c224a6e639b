package tetrapod.io;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;

/**
 * Scenario patches (JSON Merge Patch documents, {@link MergePatch}) and the models they change. A
 * model's canonical bytes are its JSON tree, after the patches, written by {@link JsonOutput}
 * (members in document order, two-space layout, numbers as Java writes them): two files that
 * differ only in layout or number spelling give the same bytes, so the same work.
 */
public final class ModelPatches {

    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
            .disable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
            .disable(DeserializationFeature.USE_BIG_INTEGER_FOR_INTS);

    private ModelPatches() { }

    /** A merge patch file as plain values ({@link PlainJson}); bad input with its line when it is not JSON. */
    public static Object readPatch(Path file) throws BadInputException {
        return PlainJson.parse(TextFiles.readUtf8(file, TextFiles.MODEL_MAX_BYTES, "merge patch"));
    }

    /** The canonical bytes (UTF-8) of the model file with {@code patches} (plain values) applied in order. */
    public static byte[] canonical(Path modelFile, List<Object> patches) throws BadInputException {
        JsonNode tree = tree(TextFiles.readUtf8(modelFile));
        for (Object patch : patches) {
            tree = MergePatch.apply(tree, MAPPER.valueToTree(patch));
        }
        try {
            return JsonOutput.toJson(MAPPER.treeToValue(tree, Object.class)).getBytes(StandardCharsets.UTF_8);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree read from JSON converts to plain values", e);
        } catch (IllegalArgumentException e) {
            // JsonOutput refuses a number that is no finite double (1e999 reads as infinity)
            throw BadInputException.at("$", "cannot be written back as JSON: " + e.getMessage());
        }
    }

    /** The text of a model or patch as a Jackson tree (package-level so that tests may use it). */
    static JsonNode tree(String json) throws BadInputException {
        try {
            return MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            int line = e.getLocation() == null ? 0 : Math.max(e.getLocation().getLineNr(), 0);
            throw new BadInputException(new Problem("$", line, MalformedJson.describe(e.getOriginalMessage())));
        }
    }
}
