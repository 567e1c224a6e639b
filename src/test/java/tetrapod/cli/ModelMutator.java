package tetrapod.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Seeded mutations of a model file, as a hostile or careless user would make them: keys removed,
 * values of the wrong type, tiny, huge and NaN-like numbers, huge counts, odd text, grown arrays,
 * and truncated text. Each mutant says what was done, so that a finding can be read and replayed.
 */
final class ModelMutator {

    /** A mutated model: its text and what was done to the original. */
    record Mutant(String text, String description) { }

    static final List<Double> NUMBERS = List.of(0.0, -0.0, -1.0, 1e-300, 4.9e-324, 1e-12, 1e-6, 0.4e-3, 1e6, 1e12, 1e100,
            1e300, Double.MAX_VALUE, 2147483647.0, -2147483648.0, 1e9, 0.5, 3.5, 10000.0);
    static final List<String> NAN_TOKENS = List.of("NaN", "Infinity", "-Infinity", "1e999", "-1e999", "\"NaN\"", "1e-999");
    static final List<String> TEXTS = List.of("", " ", "\u001b[31mred\u001b[0m", "=1+1", "+cmd", "-2+3", "@SUM(A1)",
            "a\u202eb", "line\r\nbreak", "x".repeat(10_000), "\u5854\uD83D\uDCA1", "\u0000\u0007", "\uFEFFbom", "../../etc");

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private final Random random;

    ModelMutator(long seed) {
        this.random = new Random(seed);
    }

    /** One to three mutations of {@code original}. */
    Mutant mutate(JsonNode original) throws Exception {
        JsonNode tree = original.deepCopy();
        List<String> done = new ArrayList<>();
        int count = 1 + random.nextInt(3);
        for (int i = 0; i < count; i++) {
            done.add(mutateTree(tree));
        }
        String text = MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(tree);
        int textual = random.nextInt(20);
        if (textual == 0) {
            int cut = random.nextInt(text.length());
            done.add("truncated at character " + cut);
            text = text.substring(0, cut);
        } else if (textual == 1) {
            String token = pick(NAN_TOKENS);
            String replaced = text.replaceFirst(":\\s*-?\\d+(\\.\\d+)?([eE][-+]?\\d+)?(?=[,\\s}])", ": " + token);
            if (!replaced.equals(text)) {
                done.add("first number written as " + token);
                text = replaced;
            }
        } else if (textual == 2) {
            done.add("byte-order mark in front");
            text = "\uFEFF" + text;
        }
        return new Mutant(text, String.join("; ", done));
    }

    /** One mutation at a random place of the tree; returns what it did. */
    private String mutateTree(JsonNode root) {
        List<Place> places = new ArrayList<>();
        collect(root, "$", places);
        if (places.isEmpty()) {
            return "nothing to mutate";
        }
        Place place = pick(places);
        JsonNode current = place.get();
        int kind = random.nextInt(6);
        if (kind == 0) {
            place.remove();
            return "removed " + place.path;
        }
        if (kind == 1 || (kind == 2 && !current.isNumber()) || (kind == 3 && !current.isTextual())) {
            JsonNode wrong = switch (random.nextInt(6)) {
                case 0 -> NODES.textNode("text");
                case 1 -> NODES.booleanNode(true);
                case 2 -> NODES.nullNode();
                case 3 -> NODES.arrayNode();
                case 4 -> NODES.objectNode();
                default -> NODES.numberNode(1);
            };
            place.set(wrong);
            return "set " + place.path + " = " + wrong;
        }
        if (kind == 2) {
            double v = pick(NUMBERS);
            JsonNode number = v == Math.rint(v) && Math.abs(v) < 1e15 ? NODES.numberNode((long) v) : NODES.numberNode(v);
            place.set(number);
            return "set " + place.path + " = " + number;
        }
        if (kind == 3) {
            String text = pick(TEXTS);
            place.set(NODES.textNode(text));
            return "set " + place.path + " = " + MAPPER.valueToTree(text.length() > 40 ? text.substring(0, 40) + "..." : text)
                    + (text.length() > 40 ? " (" + text.length() + " characters)" : "");
        }
        if (kind == 4 && current.isArray() && !current.isEmpty()) {
            ArrayNode array = (ArrayNode) current;
            int copies = 1 + random.nextInt(3);
            for (int i = 0; i < copies; i++) {
                array.add(array.get(random.nextInt(array.size())).deepCopy());
            }
            return "grew " + place.path + " by " + copies + " copied elements";
        }
        place.set(NODES.numberNode(pick(NUMBERS)));
        return "set " + place.path + " = " + place.get();
    }

    private <T> T pick(List<T> list) {
        return list.get(random.nextInt(list.size()));
    }

    /** Every value in the tree with its JSON path. */
    private static void collect(JsonNode node, String path, List<Place> places) {
        if (node instanceof ObjectNode object) {
            object.fieldNames().forEachRemaining(key -> {
                String child = path + "." + key;
                places.add(new Place(object, key, -1, child));
                collect(object.get(key), child, places);
            });
        } else if (node instanceof ArrayNode array) {
            for (int i = 0; i < array.size(); i++) {
                String child = path + "[" + i + "]";
                places.add(new Place(array, null, i, child));
                collect(array.get(i), child, places);
            }
        }
    }

    /** A value's place in its parent. */
    private record Place(JsonNode parent, String key, int index, String path) {
        JsonNode get() {
            return key != null ? parent.get(key) : parent.get(index);
        }

        void set(JsonNode value) {
            if (key != null) {
                ((ObjectNode) parent).set(key, value);
            } else {
                ((ArrayNode) parent).set(index, value);
            }
        }

        void remove() {
            if (key != null) {
                ((ObjectNode) parent).remove(key);
            } else {
                ((ArrayNode) parent).remove(index);
            }
        }
    }
}
