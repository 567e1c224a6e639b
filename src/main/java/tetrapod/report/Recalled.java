package tetrapod.report;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The marks that the checks put on values without a published source read while Tetrapod was
 * written ("recalled from memory", "common practice"): found in a clause or note, and taken out of
 * it, so that the report lists each once in its sources section instead of in every row.
 */
final class Recalled {

    /** A parenthesis holding a mark, e.g. "(EN 1993-3-1 Annex H, fraction recalled from memory)". */
    private static final Pattern MARKED = Pattern.compile(
            "\\s*\\(([^()]*?)[,;]?\\s*((?:[a-zA-Z0-9 ]+ )?(?:recalled from memory|common practice))\\)");

    /** One marked value: the reference it belongs to (a clause, or the rule itself) and the mark. */
    record Source(String reference, String mark) { }

    private Recalled() { }

    /** {@code text} without its marks: "(X, fraction recalled from memory)" → "(X)", "(common practice)" → "". */
    static String strip(String text) {
        if (text == null) {
            return "";
        }
        Matcher m = MARKED.matcher(text);
        StringBuilder b = new StringBuilder();
        while (m.find()) {
            String rest = m.group(1).strip();
            m.appendReplacement(b, Matcher.quoteReplacement(rest.isEmpty() ? "" : " (" + rest + ")"));
        }
        m.appendTail(b);
        return b.toString();
    }

    /**
     * The marked values in {@code text}. The reference is the parenthesis without its mark when that
     * names a clause (has a number), else the text before the parenthesis (back to a ';' or ':'),
     * with the parenthesis' remaining words.
     */
    static List<Source> find(String text) {
        List<Source> out = new ArrayList<>();
        if (text == null) {
            return out;
        }
        Matcher m = MARKED.matcher(text);
        while (m.find()) {
            String rest = m.group(1).strip();
            String before = text.substring(0, m.start()).strip();
            int cut = Math.max(before.lastIndexOf(';'), before.lastIndexOf(':'));
            String subject = before.substring(cut + 1).strip();
            String reference = rest.isEmpty() ? subject
                    : rest.matches(".*\\d.*") ? rest : subject + " (" + rest + ")";
            out.add(new Source(reference, m.group(2).strip()));
        }
        return out;
    }
}
