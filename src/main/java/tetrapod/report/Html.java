package tetrapod.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;

/**
 * Writes HTML text: every piece of text escaped, tags closed by the caller in order. Either kept in
 * memory ({@link #toString}) or passed on to a writer in pieces as it grows ({@link #Html(Writer)},
 * {@link #flush}), so that a long report is never one string.
 */
final class Html {

    /** Tags inside running text: no line break after them, which would show as a space. */
    private static final java.util.Set<String> INLINE = java.util.Set.of("a", "span", "strong", "em", "code", "sub",
            "sup");

    /** Pending text passed on to the sink beyond this many characters. */
    private static final int PIECE = 1 << 16;

    private final StringBuilder out = new StringBuilder(PIECE);
    private final Writer sink;

    /** HTML kept in memory. */
    Html() {
        this.sink = null;
    }

    /** HTML passed on to {@code sink} as it grows; {@link #flush} at the end. */
    Html(Writer sink) {
        this.sink = sink;
    }

    /** Passes what is pending on to the sink. */
    void flush() throws IOException {
        if (sink != null) {
            sink.append(out);
            out.setLength(0);
        }
    }

    private void passOn() {
        if (sink != null && out.length() > PIECE) {
            try {
                flush();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

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
        passOn();
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

    /** The HTML kept in memory (of an HTML with a sink: what is not yet passed on). */
    @Override
    public String toString() {
        return out.toString();
    }
}
