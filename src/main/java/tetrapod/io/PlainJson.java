package tetrapod.io;

import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.CharConversionException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
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
        return read(file, Set.of());
    }

    /**
     * As {@link #read(Path)}, streamed from the file (never one string), leaving out the values at
     * the paths {@code skipped}, written {@code $.key}, {@code $.list[].key} (any element of a list).
     */
    public static Object read(Path file, Set<String> skipped) throws BadInputException {
        TextFiles.requireReadable(file, TextFiles.RESULTS_MAX_BYTES, "JSON file");
        try (InputStream in = Files.newInputStream(file);
             JsonParser parser = MAPPER.getFactory().createParser(in)) {
            if (parser.nextToken() == null) {
                throw new BadInputException(new Problem("$", 1, "the file is empty: expected a JSON value"));
            }
            Object root = value(parser, "$", skipped);
            if (parser.nextToken() != null) {
                throw new BadInputException(new Problem("$", parser.currentLocation().getLineNr(),
                        "more after the end of the JSON value: one value per file"));
            }
            return root;
        } catch (CharConversionException e) {
            throw TextFiles.refusal(file, "it is not UTF-8 text");
        } catch (JsonProcessingException e) {
            if (String.valueOf(e.getOriginalMessage()).startsWith("Invalid UTF-8")) {
                throw TextFiles.refusal(file, "it is not UTF-8 text");
            }
            int line = e.getLocation() == null ? 0 : Math.max(e.getLocation().getLineNr(), 0);
            throw new BadInputException(new Problem("$", line, MalformedJson.describe(e.getOriginalMessage())));
        } catch (NoSuchFileException e) {
            throw TextFiles.refusal(file, "no such file");
        } catch (IOException e) {
            throw TextFiles.refusal(file, e.getMessage());
        }
    }

    /** The value at the parser's current token and everything inside it. */
    private static Object value(JsonParser p, String path, Set<String> skipped) throws IOException {
        JsonToken token = p.currentToken();
        switch (token) {
            case START_OBJECT -> {
                Map<String, Object> map = new LinkedHashMap<>();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String key = p.currentName();
                    p.nextToken();
                    String inner = path + "." + key;
                    if (skipped.contains(inner)) {
                        p.skipChildren();
                    } else {
                        map.put(key, value(p, inner, skipped));
                    }
                }
                return map;
            }
            case START_ARRAY -> {
                List<Object> list = new ArrayList<>();
                String inner = path + "[]";
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    list.add(value(p, inner, skipped));
                }
                return list;
            }
            case VALUE_STRING -> {
                return p.getText();
            }
            case VALUE_NUMBER_INT -> {
                return p.getNumberValue();
            }
            case VALUE_NUMBER_FLOAT -> {
                return p.getDoubleValue();
            }
            case VALUE_TRUE -> {
                return Boolean.TRUE;
            }
            case VALUE_FALSE -> {
                return Boolean.FALSE;
            }
            case VALUE_NULL -> {
                return null;
            }
            default -> throw new JsonParseException(p, "unexpected " + token);
        }
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
