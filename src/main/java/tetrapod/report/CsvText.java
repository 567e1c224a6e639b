package tetrapod.report;

/**
 * Text cells of the CSV tables made safe for spreadsheets, following OWASP's guidance on CSV
 * injection: a text cell whose first character (after any leading spaces) would make a spreadsheet
 * read it as a formula ({@code = + - @}, their full-width forms, the minus sign U+2212, tab or CR)
 * gets a leading apostrophe, which spreadsheets take as "show as text". Numbers are written by
 * {@link Format} and never pass through here, so {@code -12.5} stays a number.
 */
final class CsvText {

    private CsvText() { }

    /** {@code text} as it can be written into a cell; null becomes the empty cell. */
    static String cell(String text) {
        if (text == null || text.isEmpty()) {
            return "";
        }
        String stripped = text.stripLeading();
        boolean formula = startsAFormula(text.charAt(0)) || !stripped.isEmpty() && startsAFormula(stripped.charAt(0));
        return formula ? "'" + text : text;
    }

    private static boolean startsAFormula(char c) {
        return switch (c) {
            case '=', '+', '-', '@', '\t', '\r', '\u2212', '\uFF1D', '\uFF0B', '\uFF0D', '\uFF20' -> true;
            default -> false;
        };
    }
}
