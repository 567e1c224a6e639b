package tetrapod.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads one JSON value as a number, whole number, text, boolean or name from a closed list,
 * reporting what is wrong with it. Each method returns a sentinel on a problem (NaN, null),
 * having reported it, so that reading goes on and every problem is found in one pass.
 */
final class Values {

    private Values() { }

    /** A finite number inside {@code bound}; NaN (reported) otherwise. */
    static double number(JsonNode node, String path, Bound bound, String unit, Problems problems) {
        String unitText = unit.isEmpty() ? "" : " in " + unit;
        if (node.isTextual()) {
            String text = node.textValue().strip();
            String hint = looksNumeric(text)
                    ? "; write the number without quotes"
                    : isNonFinite(text) ? "; a value must be a finite number" : "";
            problems.add(path, "must be a number" + unitText + ", was the text " + Numbers.shown(node) + hint);
            return Double.NaN;
        }
        if (!node.isNumber()) {
            problems.add(path, "must be a number" + unitText + ", was " + Numbers.shown(node));
            return Double.NaN;
        }
        double value = node.doubleValue();
        if (!Double.isFinite(value)) {
            problems.add(path, "must be a finite number" + unitText + ", was " + Numbers.shown(node));
            return Double.NaN;
        }
        if (!bound.contains(value)) {
            problems.add(path, "must be " + bound.describe(unit) + ", was " + Numbers.shown(node));
            return Double.NaN;
        }
        return value;
    }

    /** A whole number in [min, max]; null (reported) otherwise. A number such as 4.0 counts as whole. */
    static Integer whole(JsonNode node, String path, int min, int max, Problems problems) {
        String range = range(min, max);
        if (node.isNumber() && Double.isFinite(node.doubleValue())) {
            double value = node.doubleValue();
            if (value == Math.rint(value) && value >= min && value <= max) {
                return (int) value;
            }
            if (value == Math.rint(value)) {
                problems.add(path, "must be a whole number" + range + ", was " + Numbers.shown(node));
                return null;
            }
        }
        String hint = node.isTextual() && looksNumeric(node.textValue().strip()) ? "; write the number without quotes" : "";
        problems.add(path, "must be a whole number" + range + ", was " + Numbers.shown(node) + hint);
        return null;
    }

    /** Non-empty text; null (reported) otherwise. */
    static String text(JsonNode node, String path, Problems problems) {
        if (!node.isTextual()) {
            problems.add(path, "must be a text in double quotes, was " + Numbers.shown(node));
            return null;
        }
        if (node.textValue().isBlank()) {
            problems.add(path, "must not be empty");
            return null;
        }
        return node.textValue();
    }

    /** Text that may be empty; null (reported) when not text. */
    static String anyText(JsonNode node, String path, Problems problems) {
        if (!node.isTextual()) {
            problems.add(path, "must be a text in double quotes, was " + Numbers.shown(node));
            return null;
        }
        return node.textValue();
    }

    static Boolean bool(JsonNode node, String path, Problems problems) {
        if (!node.isBoolean()) {
            problems.add(path, "must be true or false, was " + Numbers.shown(node));
            return null;
        }
        return node.booleanValue();
    }

    /**
     * One of {@code names}, matched exactly; the value at the same position of {@code values}.
     * Reported as "unknown bracing 'z'; expected one of x, k, single".
     */
    static <E> E choice(JsonNode node, String path, String what, List<String> names, List<E> values,
                        Problems problems) {
        if (!node.isTextual()) {
            problems.add(path, "must be one of " + String.join(", ", names) + ", was " + Numbers.shown(node));
            return null;
        }
        String given = node.textValue();
        int index = names.indexOf(given);
        if (index >= 0) {
            return values.get(index);
        }
        String hint = "";
        for (String name : names) {
            if (name.equalsIgnoreCase(given)) {
                hint = name.equals(name.toLowerCase(Locale.ROOT))
                        ? "; names are lower case: '" + name + "'"
                        : "; write it '" + name + "'";
            }
        }
        problems.add(path, "unknown " + what + " '" + given + "'; expected one of " + String.join(", ", names) + hint);
        return null;
    }

    /** An array; null (reported) otherwise. */
    static JsonNode array(JsonNode node, String path, Problems problems) {
        if (!node.isArray()) {
            problems.add(path, "must be an array [...], was " + Numbers.shown(node));
            return null;
        }
        return node;
    }

    /** An array of numbers each inside {@code bound}; null (reported) when anything is wrong. */
    static List<Double> numbers(JsonNode node, String path, Bound bound, String unit, Problems problems) {
        if (array(node, path, problems) == null) {
            return null;
        }
        int before = problems.count();
        List<Double> values = new ArrayList<>();
        for (int k = 0; k < node.size(); k++) {
            values.add(number(node.get(k), JsonPaths.index(path, k), bound, unit, problems));
        }
        return problems.count() == before ? values : null;
    }

    private static String range(int min, int max) {
        if (min == Integer.MIN_VALUE && max == Integer.MAX_VALUE) {
            return "";
        }
        if (max == Integer.MAX_VALUE) {
            return " ≥ " + min;
        }
        return " from " + min + " to " + max;
    }

    private static boolean looksNumeric(String text) {
        try {
            return Double.isFinite(Double.parseDouble(text));
        } catch (NumberFormatException e) {
            return false;
        }
    }

    private static boolean isNonFinite(String text) {
        String t = text.toLowerCase(Locale.ROOT).replace("+", "").replace("-", "");
        return t.equals("nan") || t.equals("infinity") || t.equals("inf");
    }
}
