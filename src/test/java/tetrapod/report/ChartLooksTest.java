package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import tetrapod.view.Legend;
import tetrapod.view.RoleScale;

/**
 * The report's charts (issue 16, item 6): each role has the colour of the 3D picture's role
 * legend in the histogram, and no two labels of a polar plot overlap.
 */
class ChartLooksTest {

    private static final Path MODEL = Path.of("models/ridge-lookout-square.json");

    @Test
    void theHistogramGivesEachRoleTheColourOfThe3dLegend() throws Exception {
        String svg = svg(Files.readString(ExampleRuns.folder(MODEL).resolve("report.html")), "fig-histogram");
        Matcher m = Pattern.compile("fill:rgb\\((\\d+),(\\d+),(\\d+)\\);stroke:none'[^>]*><path[^>]*/></g><g><text[^>]*>"
                + "([a-z]+)</text>").matcher(svg);
        Map<String, Integer> histogram = new HashMap<>();
        while (m.find()) {
            histogram.put(m.group(4), (Integer.parseInt(m.group(1)) << 16) | (Integer.parseInt(m.group(2)) << 8)
                    | Integer.parseInt(m.group(3)));
        }
        assertEquals(java.util.Set.of("leg", "diagonal", "horizontal", "redundant", "plan"), histogram.keySet());
        Map<String, Integer> picture = new HashMap<>();
        for (Legend.Swatch s : new RoleScale().legend().swatches()) {
            picture.put(s.label(), s.colour().packed() & 0xFFFFFF);
        }
        histogram.forEach((role, rgb) -> assertEquals(Integer.toHexString(picture.get(role)), Integer.toHexString(rgb),
                role));
        assertEquals(picture.size(), new HashSet<>(picture.values()).size(), "one colour per role");
    }

    @Test
    void noTwoLabelsOfAPolarPlotOverlap() throws Exception {
        String html = Files.readString(ExampleRuns.folder(MODEL).resolve("report.html"));
        for (String id : List.of("fig-polar-compression", "fig-polar-uplift", "fig-polar-shear")) {
            List<double[]> boxes = textBoxes(svg(html, id));
            assertTrue(boxes.size() > 8, id + ": " + boxes.size() + " labels");
            assertEquals(List.of(), overlaps(boxes), id + ": overlapping labels (x0, y0, x1, y1)");
        }
    }

    /** The detector can fail: a label across a tick label, and one 2 px above it (the old layout), are caught. */
    @Test
    void anAxisLabelOnOrJustAboveATickLabelIsCaught() {
        String tick = "<text x='365.0' y='242.1' style='font-size: 10px;'>100</text>";
        assertFalse(overlaps(textBoxes(tick + "<text x='340.0' y='240.0' style='font-size: 12px;'>leg base uplift, kN"
                + "</text>")).isEmpty());
        assertFalse(overlaps(textBoxes(tick + "<text x='317.75' y='227.0' style='font-size: 12px;'>leg base uplift, kN"
                + "</text>")).isEmpty());
        assertEquals(List.of(), overlaps(textBoxes(tick + "<text x='317.75' y='215.0' style='font-size: 12px;'>"
                + "leg base uplift, kN</text>")));
    }

    private static String svg(String html, String id) {
        int start = html.indexOf("id=\"" + id + "\"");
        assertTrue(start > 0, "no figure " + id);
        return html.substring(start, html.indexOf("</svg>", start));
    }

    /**
     * Each text's box: from its baseline up by the font size, down by a quarter of it, and 0.6 of
     * the font size wide per character (a generous width for a sans-serif face).
     */
    static List<double[]> textBoxes(String svg) {
        Matcher m = Pattern.compile("<text x='([-0-9.]+)' y='([-0-9.]+)' style='[^']*font-size: ([0-9.]+)px;[^']*'[^>]*>"
                + "([^<]*)</text>").matcher(svg);
        List<double[]> out = new ArrayList<>();
        while (m.find()) {
            double x = Double.parseDouble(m.group(1));
            double y = Double.parseDouble(m.group(2));
            double size = Double.parseDouble(m.group(3));
            out.add(new double[] {x, y - size, x + 0.6 * size * m.group(4).length(), y + 0.25 * size});
        }
        return out;
    }

    /** Labels closer than this (px) read as one: the old radial axis label sat 2 px above the tick labels. */
    static final double GAP = 4;

    /** Pairs of boxes closer than {@link #GAP}. */
    static List<String> overlaps(List<double[]> boxes) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < boxes.size(); i++) {
            for (int j = i + 1; j < boxes.size(); j++) {
                double[] a = boxes.get(i);
                double[] b = boxes.get(j);
                if (a[0] < b[2] + GAP && b[0] < a[2] + GAP && a[1] < b[3] + GAP && b[1] < a[3] + GAP) {
                    out.add(java.util.Arrays.toString(a) + " and " + java.util.Arrays.toString(b));
                }
            }
        }
        return out;
    }
}
