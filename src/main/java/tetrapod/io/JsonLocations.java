package tetrapod.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;

/**
 * A JSON text parsed once with the streaming parser into a tree, remembering the line on which
 * every value starts (by JSON path) and every key given twice in one object.
 *
 * <p>Non-numeric numbers ({@code NaN}, {@code Infinity}) are accepted by the parser so that the
 * readers can reject them with a clear message instead of a syntax error. Of a duplicated key
 * the first value is kept; the duplicate is reported.
 */
final class JsonLocations {

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
            .build();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private final JsonNode root;
    private final Map<String, Integer> lines;
    private final List<Problem> duplicateKeys;

    private JsonLocations(JsonNode root, Map<String, Integer> lines, List<Problem> duplicateKeys) {
        this.root = root;
        this.lines = lines;
        this.duplicateKeys = List.copyOf(duplicateKeys);
    }

    /**
     * Parses {@code text}.
     *
     * @throws BadInputException with one problem, at the parser's line, when the text is not JSON
     */
    static JsonLocations parse(String text) throws BadInputException {
        Builder builder = new Builder();
        try (JsonParser parser = FACTORY.createParser(text)) {
            try {
                JsonToken first = parser.nextToken();
                if (first == null) {
                    throw new BadInputException(new Problem(JsonPaths.ROOT, 1, "the file is empty; expected a JSON object"));
                }
                JsonNode root = builder.value(parser, JsonPaths.ROOT, true);
                if (parser.nextToken() != null) {
                    throw new BadInputException(new Problem(JsonPaths.ROOT, line(parser),
                            "malformed JSON: more text after the end of the top-level value"));
                }
                return new JsonLocations(root, builder.lines, builder.duplicates);
            } catch (JsonProcessingException e) {
                // a limit of the parser (nesting depth, text length) carries no location: the parser's own is used
                int line = e.getLocation() != null && e.getLocation().getLineNr() > 0 ? e.getLocation().getLineNr()
                        : line(parser);
                throw new BadInputException(new Problem(JsonPaths.ROOT, Math.max(line, 0),
                        "malformed JSON: " + MalformedJson.describe(e.getOriginalMessage())));
            }
        } catch (IOException e) {
            // reading from a String cannot fail for any other reason
            throw new IllegalStateException(e);
        }
    }

    JsonNode root() {
        return root;
    }

    /** Line of the value at {@code path}, or of its nearest enclosing value; 0 when unknown. */
    int line(String path) {
        for (String p = path; p != null; p = JsonPaths.parent(p)) {
            Integer line = lines.get(p);
            if (line != null) {
                return line;
            }
        }
        return 0;
    }

    /** Every key given twice in the same object, at the second occurrence. */
    List<Problem> duplicateKeys() {
        return duplicateKeys;
    }

    private static int line(JsonParser parser) {
        return Math.max(parser.currentTokenLocation().getLineNr(), 0);
    }

    /** Builds the tree from the token stream, the parser positioned on a value's first token. */
    private static final class Builder {
        final Map<String, Integer> lines = new HashMap<>();
        final List<Problem> duplicates = new ArrayList<>();

        JsonNode value(JsonParser p, String path, boolean record) throws IOException {
            if (record) {
                lines.put(path, line(p));
            }
            JsonToken token = p.currentToken();
            return switch (token) {
                case START_OBJECT -> object(p, path, record);
                case START_ARRAY -> array(p, path, record);
                case VALUE_STRING -> NODES.textNode(p.getText());
                case VALUE_NUMBER_INT -> switch (p.getNumberType()) {
                    case INT -> NODES.numberNode(p.getIntValue());
                    case LONG -> NODES.numberNode(p.getLongValue());
                    default -> NODES.numberNode(p.getBigIntegerValue());
                };
                case VALUE_NUMBER_FLOAT -> NODES.numberNode(p.getDoubleValue());
                case VALUE_TRUE -> NODES.booleanNode(true);
                case VALUE_FALSE -> NODES.booleanNode(false);
                case VALUE_NULL -> NODES.nullNode();
                default -> throw new IllegalStateException("unexpected token " + token);
            };
        }

        private ObjectNode object(JsonParser p, String path, boolean record) throws IOException {
            ObjectNode object = NODES.objectNode();
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String key = p.currentName();
                int keyLine = line(p);
                p.nextToken();
                String childPath = JsonPaths.child(path, key);
                if (object.has(key)) {
                    if (record) {
                        duplicates.add(new Problem(childPath, keyLine, "duplicate key '" + key
                                + "' (first given on line " + lines.get(childPath) + "); give each key once"));
                    }
                    value(p, childPath, false);
                } else {
                    object.set(key, value(p, childPath, record));
                }
            }
            return object;
        }

        private ArrayNode array(JsonParser p, String path, boolean record) throws IOException {
            ArrayNode array = NODES.arrayNode();
            int index = 0;
            while (p.nextToken() != JsonToken.END_ARRAY) {
                array.add(value(p, JsonPaths.index(path, index), record));
                index++;
            }
            return array;
        }
    }
}
