package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The numbers report.html shows (the largest utilisation, the governing azimuths, the leg base
 * reactions) are those of results.json, found here from the JSON with Jackson and rounded as the
 * report rounds them.
 */
class ReportNumbersTest {

    static Stream<Path> models() throws IOException {
        return ExampleRuns.models();
    }

    private static String byId(String html, String id) {
        Matcher m = Pattern.compile("id=\"" + Pattern.quote(id) + "\"[^>]*>([^<]*)<").matcher(html);
        assertTrue(m.find(), "no element " + id);
        return m.group(1).strip();
    }

    private static String azimuthText(JsonNode azimuthDeg) {
        if (azimuthDeg.isNull()) {
            return "no wind";
        }
        double a = azimuthDeg.asDouble();
        return (a == Math.rint(a) ? Long.toString((long) a) : Double.toString(a)) + "°";
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void theReportShowsTheNumbersOfResultsJson(Path model) throws IOException {
        JsonNode results = ExampleRuns.results(model);
        String html = Files.readString(ExampleRuns.folder(model).resolve("report.html"));

        double max = 0;
        JsonNode top = null;
        for (JsonNode c : results.get("checks")) {
            double u = c.get("utilisation").asDouble();
            if (top == null || u > top.get("utilisation").asDouble()) {
                top = c; // ties keep the lower member id: checks are in member order
            }
            max = Math.max(max, u);
        }
        for (JsonNode f : results.get("foundations")) {
            for (JsonNode c : f.get("checks")) {
                max = Math.max(max, c.get("utilisation").asDouble());
            }
        }
        assertEquals(String.format(Locale.ROOT, "%.3f", max), byId(html, "max-utilisation"), "largest utilisation");
        Matcher verdict = Pattern.compile("class=\"verdict (over|pass)\" id=\"verdict\"><strong>([^<]*)<").matcher(html);
        assertTrue(verdict.find(), "no verdict");
        assertEquals(max > 1.0 ? "over" : "pass", verdict.group(1));
        assertEquals(max > 1.0 ? "OVERSTRESSED" : "All checks pass", verdict.group(2));
        assertEquals(String.format(Locale.ROOT, "%.3f", top.get("utilisation").asDouble()),
                byId(html, "top-1-utilisation"), "most utilised member");
        assertEquals(azimuthText(top.get("azimuthDeg")), byId(html, "governing-member-azimuth"),
                "governing azimuth of the most utilised member");

        JsonNode worstCompression = null;
        for (JsonNode leg : results.get("legBases")) {
            int node = leg.get("node").asInt();
            for (String[] q : new String[][] {{"maxCompression", "compression"}, {"maxUplift", "uplift"},
                    {"maxShear", "shear"}}) {
                JsonNode peak = leg.get(q[0]);
                String expected = peak.get("case").isNull() ? "none"
                        : String.format(Locale.ROOT, "%.1f", peak.get("value").asDouble() / 1e3);
                assertEquals(expected, byId(html, "reaction-" + node + "-" + q[1]), model + " node " + node + " " + q[1]);
            }
            JsonNode c = leg.get("maxCompression");
            if (!c.get("case").isNull() && (worstCompression == null
                    || c.get("value").asDouble() > worstCompression.get("value").asDouble())) {
                worstCompression = c;
            }
        }
        if (worstCompression != null) {
            assertEquals(azimuthText(worstCompression.get("azimuthDeg")), byId(html, "governing-compression-azimuth"),
                    "governing azimuth of the largest leg base compression");
        }
    }

    /**
     * The report compares compression in the combination of the largest analysed leg compression and
     * uplift in that of the largest uplift, found here from results.json handMethod with Jackson.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void theHandMethodIsShownInTheCombinationGoverningEachQuantity(Path model) throws IOException {
        JsonNode results = ExampleRuns.results(model);
        String html = Files.readString(ExampleRuns.folder(model).resolve("report.html"));
        JsonNode compression = null;
        JsonNode uplift = null;
        for (JsonNode h : results.get("handMethod")) {
            if (compression == null || h.at("/fe/maxCompression").asDouble() > compression.at("/fe/maxCompression").asDouble()) {
                compression = h;
            }
            if (uplift == null || h.at("/fe/maxTension").asDouble() > uplift.at("/fe/maxTension").asDouble()) {
                uplift = h;
            }
        }
        if (compression == null) {
            assertTrue(results.get("handMethodGoverning").isNull(), "no hand method, no governing cases");
            return;
        }
        String c = compression.get("combination").asText();
        String u = uplift.get("combination").asText();
        assertEquals(c, results.at("/handMethodGoverning/compression/combination").asText());
        assertEquals(u, results.at("/handMethodGoverning/uplift/combination").asText());
        assertEquals(compression.at("/fe/maxCompression").asDouble(), results.at("/handMethodGoverning/compression/fe").asDouble());
        assertEquals(uplift.at("/fe/maxTension").asDouble(), results.at("/handMethodGoverning/uplift/fe").asDouble());
        assertTrue(html.contains("<h3>Compression, " + c + "</h3>"), model + ": compression table of " + c);
        assertTrue(html.contains("<h3>Uplift, " + u + "</h3>"), model + ": uplift table of " + u);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void theModeTableShowsTheFrequenciesOfResultsJson(Path model) throws IOException {
        JsonNode results = ExampleRuns.results(model);
        String html = Files.readString(ExampleRuns.folder(model).resolve("report.html"));
        int t = html.indexOf("id=\"mode-table\"");
        assertTrue(t > 0, "no mode table");
        String table = html.substring(t, html.indexOf("</table>", t));
        for (JsonNode m : results.get("modes")) {
            String f = String.format(Locale.ROOT, "%.3f", m.get("frequencyHz").asDouble());
            assertTrue(table.contains(">" + f + "<"), "mode " + m.get("number") + " at " + f + " Hz");
        }
    }
}
