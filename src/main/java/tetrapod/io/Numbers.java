package tetrapod.io;

import com.fasterxml.jackson.databind.JsonNode;

/** How numbers and values from the file are shown in messages. */
final class Numbers {

    private static final int LONGEST_TEXT = 40;

    private Numbers() { }

    /** A number as a person would write it: 12 rather than 12.0, 1.5, -0.25. */
    static String format(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        return Double.toString(value);
    }

    /** The value as it appeared in the file, shortened, for "was ..." in messages. */
    static String shown(JsonNode node) {
        if (node == null || node.isMissingNode()) {
            return "nothing";
        }
        if (node.isObject()) {
            return "an object";
        }
        if (node.isArray()) {
            return "an array";
        }
        if (node.isTextual()) {
            String text = node.textValue();
            String cut = text.length() > LONGEST_TEXT ? text.substring(0, LONGEST_TEXT) + "..." : text;
            return "\"" + cut + "\"";
        }
        if (node.isFloatingPointNumber()) {
            double d = node.doubleValue();
            return Double.isNaN(d) ? "NaN" : Double.isInfinite(d) ? (d > 0 ? "Infinity" : "-Infinity") : node.asText();
        }
        return node.asText();
    }
}
