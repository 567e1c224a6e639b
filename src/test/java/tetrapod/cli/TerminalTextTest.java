package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.StringWriter;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/** Input text is shown escaped: it cannot drive the terminal or forge lines. */
class TerminalTextTest {

    @Test
    void controlCharactersBecomeVisibleEscapes() {
        assertEquals("a\\x1B[31mred\\x07", TerminalText.escape("a\u001b[31mred\u0007"));
        assertEquals("one\\r\\ntwo\\tthree", TerminalText.escape("one\r\ntwo\tthree"));
        assertEquals("\\x00\\x7F\\x85\\x9B", TerminalText.escape("\u0000\u007f\u0085\u009b"));
        assertEquals("abc\\u202Efdp.exe", TerminalText.escape("abc\u202efdp.exe"));
        assertEquals("\\u2066x\\u2069\\u200F\\u2028\\uFEFF", TerminalText.escape("\u2066x\u2069\u200f\u2028\ufeff"));
    }

    @Test
    void ordinaryTextIsUnchanged() {
        String text = "segments[2].topWidthX: must be > 0 m, was −1.5 (line 14) · kN·m ü 塔";
        assertEquals(text, TerminalText.escape(text));
    }

    @Test
    void theWriterEscapesPrintedTextAndFormatArgumentsButKeepsItsOwnLineEnds() {
        StringWriter sink = new StringWriter();
        SafePrintWriter out = SafePrintWriter.around(sink);
        out.println("name\u001b]0;title\u0007");
        out.printf(Locale.ROOT, "%s = %.1f kN%n", "case\nforged line", 12.25);
        out.print("tail\r");
        out.flush();
        String sep = System.lineSeparator();
        assertEquals("name\\x1B]0;title\\x07" + sep + "case\\nforged line = 12.3 kN" + sep + "tail\\r", sink.toString());
        assertFalse(sink.toString().contains("\u001b"));
    }
}
