package tetrapod.io;

import tetrapod.common.Suggestions;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

/**
 * One JSON object of the file with its path: "expect these keys" (unknown ones reported with the
 * nearest valid key), and typed getters for required and optional keys that report what is
 * wrong and return a sentinel (NaN, null) so that reading continues.
 */
final class Fields {

    private final JsonNode node;
    private final String path;
    private final Problems problems;

    private Fields(JsonNode node, String path, Problems problems) {
        this.node = node;
        this.path = path;
        this.problems = problems;
    }

    /** The object at {@code path}, or null (reported) when the value is not an object. */
    static Fields of(JsonNode node, String path, Problems problems) {
        if (!node.isObject()) {
            problems.add(path, "must be an object { ... }, was " + Numbers.shown(node));
            return null;
        }
        return new Fields(node, path, problems);
    }

    String path() {
        return path;
    }

    String path(String key) {
        return JsonPaths.child(path, key);
    }

    boolean has(String key) {
        return node.has(key);
    }

    JsonNode get(String key) {
        return node.get(key);
    }

    List<String> keys() {
        List<String> keys = new ArrayList<>();
        for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
            keys.add(it.next());
        }
        return keys;
    }

    /** Reports every key not in {@code allowed}, suggesting the nearest allowed key. */
    void allowOnly(List<String> allowed) {
        for (String key : keys()) {
            if (!allowed.contains(key)) {
                String near = Suggestions.nearest(key, allowed);
                problems.add(path(key), near != null
                        ? "unknown key; did you mean '" + near + "'?"
                        : "unknown key; expected " + (allowed.size() == 1 ? "" : "one of ") + String.join(", ", allowed));
            }
        }
    }

    /** Reports a missing required key, at the key's path and the object's line. */
    void missing(String key, String expected) {
        problems.add(path(key), "required key is missing; expected " + expected);
    }

    double requiredNumber(String key, Bound bound, String unit) {
        if (!has(key)) {
            missing(key, "a number " + bound.describe(unit).replace("a finite number ", ""));
            return Double.NaN;
        }
        return Values.number(get(key), path(key), bound, unit, problems);
    }

    double optionalNumber(String key, Bound bound, String unit, double byDefault) {
        return has(key) ? Values.number(get(key), path(key), bound, unit, problems) : byDefault;
    }

    Integer requiredWhole(String key, int min, int max) {
        if (!has(key)) {
            missing(key, "a whole number");
            return null;
        }
        return Values.whole(get(key), path(key), min, max, problems);
    }

    Integer optionalWhole(String key, int min, int max, int byDefault) {
        return has(key) ? Values.whole(get(key), path(key), min, max, problems) : Integer.valueOf(byDefault);
    }

    String requiredText(String key) {
        if (!has(key)) {
            missing(key, "a text");
            return null;
        }
        return Values.text(get(key), path(key), problems);
    }

    String optionalText(String key, String byDefault) {
        return has(key) ? Values.anyText(get(key), path(key), problems) : byDefault;
    }

    Boolean optionalBool(String key, boolean byDefault) {
        return has(key) ? Values.bool(get(key), path(key), problems) : Boolean.valueOf(byDefault);
    }

    Boolean requiredBool(String key) {
        if (!has(key)) {
            missing(key, "true or false");
            return null;
        }
        return Values.bool(get(key), path(key), problems);
    }

    <E> E requiredChoice(String key, String what, List<String> names, List<E> values) {
        if (!has(key)) {
            missing(key, "one of " + String.join(", ", names));
            return null;
        }
        return Values.choice(get(key), path(key), what, names, values, problems);
    }

    <E> E optionalChoice(String key, String what, List<String> names, List<E> values, E byDefault) {
        return has(key) ? Values.choice(get(key), path(key), what, names, values, problems) : byDefault;
    }

    /** The object under {@code key}, or null (reported when present but not an object; when missing only if required). */
    Fields object(String key, boolean required) {
        if (!has(key)) {
            if (required) {
                missing(key, "an object { ... }");
            }
            return null;
        }
        return of(get(key), path(key), problems);
    }

    /** The array under {@code key}, or null (reported when present but not an array; when missing only if required). */
    JsonNode array(String key, boolean required) {
        if (!has(key)) {
            if (required) {
                missing(key, "an array [ ... ]");
            }
            return null;
        }
        return Values.array(get(key), path(key), problems);
    }
}
