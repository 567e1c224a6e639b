package tetrapod.batch;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import tetrapod.io.AtomicFiles;

/**
 * summary.html: the rows from the worst largest utilisation down (rows without one last), a
 * histogram of the largest utilisations drawn as inline SVG, the towers that fail and the rows that
 * could not be analysed. A row links to its tower's report when reports were written.
 */
public final class SummaryPage {

    public static final String FILE = "summary.html";
    /** Width of a histogram bar, in utilisation. */
    static final double BIN = 0.1;

    private SummaryPage() { }

    public static void write(Path file, List<SummaryRow> rows, String manifest) throws IOException {
        AtomicFiles.writeString(file, html(rows, manifest));
    }

    static String html(List<SummaryRow> rows, String manifest) {
        List<SummaryRow> sorted = new ArrayList<>(rows);
        sorted.sort(Comparator.comparing((SummaryRow r) -> r.maxUtilisation() == null ? Double.NEGATIVE_INFINITY
                : r.maxUtilisation()).reversed());
        StringBuilder h = new StringBuilder();
        h.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>Fleet run: ")
                .append(esc(manifest)).append("</title>\n<style>body{font:14px/1.4 sans-serif;margin:2em;max-width:80em}"
                + "table{border-collapse:collapse}td,th{border:1px solid #bbb;padding:2px 6px;text-align:left}"
                + "td.n{text-align:right}td.m{min-width:28em}tr.fail td{background:#fde8e8}.caution{border:1px solid #a60;padding:.5em;"
                + "background:#fff8e6}</style></head><body>\n");
        h.append("<h1>Fleet run: ").append(esc(manifest)).append("</h1>\n");
        h.append("<p class=\"caution\">Results must be checked by a qualified engineer against the codes that apply"
                + " locally; Tetrapod does not certify compliance with any code.</p>\n");
        long analysed = rows.stream().filter(r -> r.outcome().exitCode() == 0).count();
        List<SummaryRow> failing = sorted.stream().filter(r -> r.outcome().figures() != null && r.outcome().figures().fails())
                .toList();
        List<SummaryRow> notAnalysed = rows.stream().filter(r -> r.outcome().exitCode() != 0).toList();
        h.append(String.format(Locale.ROOT, "<p>%d towers × scenarios: %d analysed, %d fail (overstressed or a"
                + " requirement not met), %d not analysed.</p>%n", rows.size(), analysed, failing.size(), notAnalysed.size()));
        h.append("<h2>Largest member utilisation</h2>\n").append(histogram(rows));
        h.append("<h2>Failing</h2>\n");
        h.append(failing.isEmpty() ? "<p>None.</p>\n" : table(failing));
        h.append("<h2>Not analysed</h2>\n");
        h.append(notAnalysed.isEmpty() ? "<p>None.</p>\n" : table(notAnalysed));
        h.append("<h2>Every tower × scenario, worst first</h2>\n").append(table(sorted));
        h.append("</body></html>\n");
        return h.toString();
    }

    private static String table(List<SummaryRow> rows) {
        StringBuilder t = new StringBuilder("<table><tr>");
        for (String c : List.of("model", "scenario", "status", "largest utilisation", "member", "role",
                "azimuth (deg)", "requirements not met", "footing utilisation", "leg compression (kN)",
                "leg uplift (kN)", "steel (kg)", "serviceability", "change from base", "message")) {
            t.append("<th>").append(esc(c)).append("</th>");
        }
        t.append("</tr>\n");
        for (SummaryRow r : rows) {
            List<String> c = SummaryTable.cells(r);
            Figures f = r.outcome().figures();
            t.append(f != null && f.fails() ? "<tr class=\"fail\">" : "<tr>");
            String report = r.outcome().report();
            t.append("<td>").append(report == null ? esc(c.get(0))
                    : "<a href=\"" + esc(report + "/report.html") + "\">" + esc(c.get(0)) + "</a>").append("</td>");
            t.append("<td>").append(esc(c.get(1))).append("</td><td>").append(esc(c.get(2))).append("</td>");
            for (int k = 5; k <= 15; k++) {
                t.append(k == 7 || k == 14 ? "<td>" : "<td class=\"n\">").append(esc(c.get(k))).append("</td>");
            }
            t.append("<td class=\"m\">").append(esc(c.get(4))).append("</td></tr>\n");
        }
        return t.append("</table>\n").toString();
    }

    /** Bars of BIN wide from 0 to past the largest utilisation (at least to 1.5), the limit 1.0 marked. */
    static String histogram(List<SummaryRow> rows) {
        List<Double> values = rows.stream().map(SummaryRow::maxUtilisation).filter(v -> v != null).toList();
        double top = Math.max(1.5, values.stream().mapToDouble(Double::doubleValue).max().orElse(0));
        int bins = (int) Math.ceil(top / BIN + 1e-9);
        int[] counts = new int[bins];
        for (double v : values) {
            counts[Math.min(bins - 1, (int) Math.floor(v / BIN))]++;
        }
        int most = 1;
        for (int n : counts) {
            most = Math.max(most, n);
        }
        double width = 640;
        double height = 220;
        double left = 40;
        double bottom = 190;
        double barWidth = (width - left - 10) / bins;
        StringBuilder s = new StringBuilder(String.format(Locale.ROOT,
                "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"%.0f\" height=\"%.0f\" role=\"img\""
                        + " aria-label=\"histogram of the largest member utilisation\">%n", width, height + 20));
        for (int k = 0; k < bins; k++) {
            double h = (bottom - 20) * counts[k] / most;
            double x = left + k * barWidth;
            String colour = (k + 1) * BIN > 1.0 + 1e-9 ? "#c0392b" : "#2e6f9e";
            s.append(String.format(Locale.ROOT, "<rect x=\"%.1f\" y=\"%.1f\" width=\"%.1f\" height=\"%.1f\" fill=\"%s\">"
                    + "<title>%.1f to %.1f: %d</title></rect>%n", x + 1, bottom - h, barWidth - 2, h, colour,
                    k * BIN, (k + 1) * BIN, counts[k]));
            if (counts[k] > 0) {
                s.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"10\" text-anchor=\"middle\">%d"
                        + "</text>%n", x + barWidth / 2, bottom - h - 3, counts[k]));
            }
            if (k % 5 == 0) {
                s.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"10\" text-anchor=\"middle\">"
                        + "%.1f</text>%n", x, bottom + 14, k * BIN));
            }
        }
        double limit = left + 1.0 / BIN * barWidth;
        s.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" y1=\"10\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"#000\""
                + " stroke-dasharray=\"4 3\"/><text x=\"%.1f\" y=\"20\" font-size=\"10\">1.0</text>%n", limit, limit, bottom,
                limit + 3));
        s.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"#000\"/>%n",
                left, bottom, width - 10, bottom));
        s.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%.1f\" font-size=\"11\" text-anchor=\"middle\">largest"
                + " member utilisation (bars %.1f wide); height: number of towers × scenarios</text>%n", width / 2,
                height + 12, BIN));
        return s.append("</svg>\n").toString();
    }

    static String esc(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
