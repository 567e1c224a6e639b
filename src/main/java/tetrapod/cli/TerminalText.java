package tetrapod.cli;

/**
 * Makes text from the input safe to show on a terminal: control characters (C0 including tab,
 * CR and LF, DEL, C1), the Unicode line and paragraph separators, the byte-order mark and the
 * bidirectional formatting characters are shown as escapes ({@code \n}, {@code \x1B},
 * {@code \u202E}) instead of acting on the terminal or forging a line.
 */
final class TerminalText {

    private TerminalText() { }

    static String escape(CharSequence text) {
        StringBuilder out = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            String escape = escapeOf(c);
            if (escape != null && out == null) {
                out = new StringBuilder(text.length() + 16).append(text, 0, i);
            }
            if (out != null) {
                if (escape != null) {
                    out.append(escape);
                } else {
                    out.append(c);
                }
            }
        }
        return out == null ? text.toString() : out.toString();
    }

    /** The escape shown for {@code c}, or null when it is shown as it is. */
    private static String escapeOf(char c) {
        return switch (c) {
            case '\n' -> "\\n";
            case '\r' -> "\\r";
            case '\t' -> "\\t";
            default -> {
                if (c < 0x20 || (c >= 0x7F && c <= 0x9F)) {
                    yield String.format("\\x%02X", (int) c);
                }
                yield isInvisibleFormat(c) ? String.format("\\u%04X", (int) c) : null;
            }
        };
    }

    /** Bidi marks, embeddings, overrides and isolates; line and paragraph separators; the BOM. */
    private static boolean isInvisibleFormat(char c) {
        return c == '\u061C' || c == '\u200E' || c == '\u200F' || (c >= '\u202A' && c <= '\u202E')
                || (c >= '\u2066' && c <= '\u2069') || c == '\u2028' || c == '\u2029' || c == '\uFEFF';
    }
}
