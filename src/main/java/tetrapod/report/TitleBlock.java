package tetrapod.report;

import java.util.List;
import java.util.Map;

/**
 * The calculation's title block: project, structure, revision, date, prepared by and checked by
 * (from the model file's {@code project}; a blank line to write on when not given), the program
 * and the model file with the SHA-256 of its bytes (results.json {@code source}). Written on the
 * first page and, as CSS page margin boxes, in the footer of every printed page.
 */
final class TitleBlock {

    private static final List<String[]> FIELDS = List.of(new String[] {"project", "project"},
            new String[] {"structure", "structure"}, new String[] {"revision", "revision"},
            new String[] {"date", "date"}, new String[] {"preparedBy", "prepared by"},
            new String[] {"checkedBy", "checked by"});

    private final Map<String, Object> project;
    private final Map<String, Object> source;

    TitleBlock(Results r) {
        this.project = Tree.mapOrEmpty(r.input(), "project");
        this.source = Tree.mapOrEmpty(r.document(), "source");
    }

    private String field(Map<String, Object> from, String key) {
        Object v = from.get(key);
        return v == null ? "" : v.toString();
    }

    /** The title block as a table of label and value; blank values as a line to write on. */
    void write(Html out) {
        out.open("table", "id=\"title-block\" class=\"title-block\"").open("tbody");
        for (String[] f : FIELDS) {
            row(out, f[1], field(project, f[0]), "title-" + f[0]);
        }
        row(out, "program", field(source, "program"), "title-program");
        row(out, "model file", field(source, "file"), "title-file");
        row(out, "SHA-256 of the model file", field(source, "sha256"), "title-sha256");
        out.close("tbody").close("table");
    }

    private static void row(Html out, String label, String value, String id) {
        out.open("tr").element("th", "scope=\"row\"", label);
        out.element("td", Html.attr("id", id) + (value.isEmpty() ? " class=\"blank\"" : ""), value);
        out.close("tr");
    }

    /**
     * CSS page margin boxes that print the identity of the calculation at the foot of every page:
     * the structure, project, revision and date at the left, the model file's SHA-256 in the
     * middle, the program and the page number at the right.
     */
    String pageFooterCss() {
        String left = String.join(" · ", nonBlank(field(project, "project"), field(project, "structure"),
                revision(), field(project, "date")));
        String sha = field(source, "sha256");
        String middle = sha.isEmpty() ? "" : "model " + field(source, "file") + " SHA-256 " + sha;
        String right = field(source, "program");
        String font = " font-family: \"DejaVu Sans\", Arial, sans-serif;";
        return "@page {\n"
                + "  @bottom-left { content: " + cssString(left) + "; font-size: 7pt; color: #5f6368;" + font + " }\n"
                + "  @bottom-center { content: " + cssString(middle) + "; font-size: 6pt; color: #5f6368;" + font + " }\n"
                + "  @bottom-right { content: " + cssString(right.isEmpty() ? "" : right + " · ")
                + " \"page \" counter(page) \" of \" counter(pages); font-size: 7pt; color: #5f6368;" + font + " }\n}\n";
    }

    private String revision() {
        String rev = field(project, "revision");
        return rev.isEmpty() ? "" : "revision " + rev;
    }

    private static List<String> nonBlank(String... parts) {
        return java.util.Arrays.stream(parts).filter(s -> !s.isBlank()).toList();
    }

    /** A CSS string literal: quotes, backslashes and line breaks escaped; "<" escaped so the text cannot end the style element. */
    static String cssString(String text) {
        StringBuilder b = new StringBuilder("\"");
        for (char c : text.toCharArray()) {
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n', '\r' -> b.append("\\A ");
                case '<' -> b.append("\\3C ");
                default -> b.append(c);
            }
        }
        return b.append('"').toString();
    }
}
