package tetrapod.io;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Turns the JSON parser's syntax-error text into a plain sentence without library jargon. */
final class MalformedJson {

    private static final Pattern CHARACTER = Pattern.compile("\\('(.*?)' \\(code [^)]*\\)\\)");
    private static final Pattern CONTROL = Pattern.compile("\\(\\(CTRL-CHAR, code (\\d+)\\)\\)");
    private static final Pattern SOURCE = Pattern.compile("\\s*\\(?(start marker )?at \\[Source:.*?\\]\\)?", Pattern.DOTALL);
    private static final Pattern VALUE_LIST = Pattern.compile("\\(?JSON String, Number.*'false'\\)?");
    private static final Pattern CODE = Pattern.compile(" \\(code \\d+[^)]*\\)");
    private static final Pattern DEPTH = Pattern.compile("Document nesting depth \\((\\d+)\\) exceeds the maximum allowed \\((\\d+).*");
    private static final Pattern LENGTH = Pattern.compile("(String value|Number value) length \\((\\d+)\\) exceeds the maximum allowed \\((\\d+).*");
    private static final Pattern TOKEN = Pattern.compile("Unrecognized token '(.*?)'.*", Pattern.DOTALL);

    private MalformedJson() { }

    static String describe(String parserMessage) {
        if (parserMessage == null || parserMessage.isBlank()) {
            return "not valid JSON";
        }
        String text = SOURCE.matcher(parserMessage).replaceAll("");
        text = text.lines().findFirst().orElse("").strip();
        Matcher depth = DEPTH.matcher(text);
        if (depth.matches()) {
            return "arrays and objects nested " + depth.group(1) + " deep; at most " + depth.group(2) + " levels are read";
        }
        Matcher length = LENGTH.matcher(text);
        if (length.matches()) {
            return (length.group(1).startsWith("String") ? "a text" : "a number") + " of " + length.group(2)
                    + " characters; at most " + length.group(3) + " are read";
        }
        Matcher token = TOKEN.matcher(text);
        if (token.matches()) {
            return "unrecognised word '" + token.group(1)
                    + "'; expected a string in double quotes, a number, an array, an object, true, false or null";
        }
        if (text.startsWith("Unexpected end-of-input")) {
            return "the text ends before every object and array is closed";
        }
        if (text.startsWith("Illegal unquoted character")) {
            return "a line break or control character inside a string; write it as an escape such as \\n";
        }
        if (text.startsWith("Unexpected close marker")) {
            Matcher c = Pattern.compile("Unexpected close marker '(.)'").matcher(text);
            return c.find() ? "unexpected '" + c.group(1) + "': it closes nothing that is open" : "unbalanced brackets";
        }
        text = CHARACTER.matcher(text).replaceAll(m -> Matcher.quoteReplacement(m.group(1).equals("'")
                ? "\"'\" (a single quote; JSON needs double quotes)"
                : "'" + m.group(1) + "'"));
        text = CONTROL.matcher(text).replaceAll("(control character $1)");
        text = VALUE_LIST.matcher(text).replaceAll("(a string, number, array, object, true, false or null)");
        text = CODE.matcher(text).replaceAll("");
        text = text.replace("Unexpected", "unexpected")
                .replace("Unrecognized", "unrecognised")
                .replace("Invalid", "invalid")
                .replace("Leading zeroes not allowed", "a number may not start with 0")
                .replace("a valid value", "a value")
                .replace("was expecting", "expected")
                .replace("double-quote to start field name", "a key in double quotes")
                .replace("comma to separate Object entries", "a comma between the entries of an object")
                .replace("comma to separate Array entries", "a comma between the values of an array")
                .replace("a colon to separate field name and value", "a colon between the key and its value");
        return text.isEmpty() ? "not valid JSON" : text;
    }
}
