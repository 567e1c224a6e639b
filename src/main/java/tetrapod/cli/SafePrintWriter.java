package tetrapod.cli;

import java.io.IOException;
import java.io.InterruptedIOException;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.file.Path;
import java.util.Locale;

/**
 * The one place every message of the command line passes through: all text written is escaped by
 * {@link TerminalText}, so input can never move the cursor, ring, recolour, reorder or break a
 * line. Line ends come only from {@code println()} and from {@code %n} in a format string (which is
 * the program's own), never from the text printed or the arguments formatted.
 */
final class SafePrintWriter extends PrintWriter {

    private final Writer target;

    private SafePrintWriter(Writer target) {
        super(target, true);
        this.target = target;
    }

    /** {@code writer} itself when it already escapes, else an escaping writer around it. */
    static SafePrintWriter around(Writer writer) {
        return writer instanceof SafePrintWriter safe ? safe : new SafePrintWriter(writer);
    }

    /** A writer to the same place that does not escape: for the help pages, which are the program's own text. */
    PrintWriter raw() {
        return new PrintWriter(target, true);
    }

    @Override
    public void write(int c) {
        writeEscaped(String.valueOf((char) c));
    }

    @Override
    public void write(char[] buf, int off, int len) {
        writeEscaped(new String(buf, off, len));
    }

    @Override
    public void write(String s, int off, int len) {
        writeEscaped(s.substring(off, off + len));
    }

    private void writeEscaped(String s) {
        String escaped = TerminalText.escape(s);
        super.write(escaped, 0, escaped.length());
    }

    @Override
    public PrintWriter format(String format, Object... args) {
        return format(Locale.getDefault(Locale.Category.FORMAT), format, args);
    }

    @Override
    public PrintWriter format(Locale locale, String format, Object... args) {
        Object[] safe = new Object[args.length];
        for (int i = 0; i < args.length; i++) {
            safe[i] = escapedArgument(args[i]);
        }
        String text = String.format(locale, format, safe);
        synchronized (lock) {
            try {
                out.write(text);
                out.flush();
            } catch (InterruptedIOException e) {
                Thread.currentThread().interrupt();
            } catch (IOException e) {
                setError();
            }
        }
        return this;
    }

    /** Numbers, booleans and characters are formatted as they are; anything else as its escaped text. */
    private static Object escapedArgument(Object arg) {
        if (arg == null || arg instanceof Number || arg instanceof Boolean) {
            return arg;
        }
        if (arg instanceof Character c) {
            return TerminalText.escape(String.valueOf(c));
        }
        if (arg instanceof CharSequence || arg instanceof Path) {
            return TerminalText.escape(arg.toString());
        }
        return TerminalText.escape(String.valueOf(arg));
    }
}
