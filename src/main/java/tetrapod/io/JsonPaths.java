package tetrapod.io;

import java.util.regex.Pattern;

/**
 * JSON paths as people read them: {@code segments[2].topWidthX}, {@code userSections.L95x9.angle.t_mm}.
 * The root is the empty string here ({@code $} once it becomes a {@link tetrapod.common.Problem}).
 * A key that is not a plain word (letters, digits, '_' and '-') is quoted: {@code userSections["CHS 60.3"]}.
 */
final class JsonPaths {

    static final String ROOT = "";
    private static final Pattern PLAIN = Pattern.compile("[A-Za-z0-9_\\-]+");

    private JsonPaths() { }

    static String child(String parent, String key) {
        if (PLAIN.matcher(key).matches()) {
            return parent.isEmpty() ? key : parent + "." + key;
        }
        return parent + "[\"" + key.replace("\\", "\\\\").replace("\"", "\\\"") + "\"]";
    }

    static String index(String parent, int index) {
        return parent + "[" + index + "]";
    }

    /** The enclosing path, or null for the root. */
    static String parent(String path) {
        if (path.isEmpty()) {
            return null;
        }
        int end = path.length() - 1;
        if (path.charAt(end) == ']') {
            int open = openingBracket(path, end);
            return path.substring(0, open);
        }
        int dot = path.lastIndexOf('.');
        int bracket = path.lastIndexOf(']');
        if (dot > bracket) {
            return path.substring(0, dot);
        }
        return bracket >= 0 ? path.substring(0, bracket + 1) : ROOT;
    }

    private static int openingBracket(String path, int close) {
        boolean quoted = path.charAt(close - 1) == '"';
        if (!quoted) {
            return path.lastIndexOf('[', close);
        }
        // a quoted key: walk back to the opening quote, skipping escaped quotes
        int k = close - 2;
        while (k > 0 && !(path.charAt(k) == '"' && path.charAt(k - 1) == '[' && !escaped(path, k))) {
            k--;
        }
        return Math.max(0, k - 1);
    }

    private static boolean escaped(String path, int quote) {
        int backslashes = 0;
        for (int k = quote - 1; k >= 0 && path.charAt(k) == '\\'; k--) {
            backslashes++;
        }
        return backslashes % 2 == 1;
    }
}
