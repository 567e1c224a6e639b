package tetrapod.report;

/** Writes HTML text: every piece of text escaped, tags closed by the caller in order. */
final class Html {

    /** Tags inside running text: no line break after them, which would show as a space. */
    private static final java.util.Set<String> INLINE = java.util.Set.of("a", "span", "strong", "em", "code", "sub",
            "sup");

    private final StringBuilder out = new StringBuilder(1 << 16);

    /** Text made safe for HTML content and attribute values. */
    static String escape(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder b = new StringBuilder(text.length() + 16);
        for (int k = 0; k < text.length(); k++) {
            char c = text.charAt(k);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    /** Markup as it is (for trusted fragments: SVG from the chart library, our own tags). */
    Html raw(String markup) {
        out.append(markup);
        return this;
    }

    Html text(String text) {
        out.append(escape(text));
        return this;
    }

    /** {@code <tag attrs>}; attrs is pre-built markup such as {@code class="x"} or "". */
    Html open(String tag, String attrs) {
        out.append('<').append(tag);
        if (!attrs.isEmpty()) {
            out.append(' ').append(attrs);
        }
        out.append('>');
        return this;
    }

    Html open(String tag) {
        return open(tag, "");
    }

    Html close(String tag) {
        out.append("</").append(tag).append('>');
        if (!INLINE.contains(tag)) {
            out.append('\n');
        }
        return this;
    }

    /** {@code <tag attrs>text</tag>} with the text escaped. */
    Html element(String tag, String attrs, String text) {
        return open(tag, attrs).text(text).close(tag);
    }

    Html element(String tag, String text) {
        return element(tag, "", text);
    }

    Html p(String text) {
        return element("p", text);
    }

    /** {@code name="value"} with the value escaped. */
    static String attr(String name, String value) {
        return name + "=\"" + escape(value) + "\"";
    }

    @Override
    public String toString() {
        return out.toString();
    }
}
