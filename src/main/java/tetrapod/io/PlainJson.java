package tetrapod.io;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;

/**
 * Reads JSON into the plain values {@link JsonOutput} writes: {@code LinkedHashMap} (key order
 * kept), {@code ArrayList}, {@code String}, {@code Integer}/{@code Long} for whole numbers written
 * without a point, {@code Double} otherwise, {@code Boolean} and {@code null}. Other packages read
 * JSON through it, so that none of them needs a JSON library.
 */
public final class PlainJson {

    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
            .disable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
            .disable(DeserializationFeature.USE_BIG_INTEGER_FOR_INTS);

    private PlainJson() { }

    /**
     * The file's JSON as plain values; a file that is missing, no regular file, larger than
     * {@link TextFiles#RESULTS_MAX_BYTES}, not UTF-8 or not JSON is bad input.
     */
    public static Object read(Path file) throws BadInputException {
        String text = TextFiles.readUtf8(file, TextFiles.RESULTS_MAX_BYTES, "JSON file");
        return parse(text);
    }

    /** The JSON text as plain values. */
    public static Object parse(String json) throws BadInputException {
        try {
            return MAPPER.readValue(json, Object.class);
        } catch (JsonProcessingException e) {
            int line = e.getLocation() == null ? 0 : Math.max(e.getLocation().getLineNr(), 0);
            throw new BadInputException(new Problem("$", line, MalformedJson.describe(e.getOriginalMessage())));
        }
    }
}
