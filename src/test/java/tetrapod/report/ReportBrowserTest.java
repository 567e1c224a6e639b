package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.testing.NativeRequirement;

/**
 * report.html of every example opens in headless Chromium with no console message and no request
 * to the network, shows every plot, and its first page is not blank.
 */
class ReportBrowserTest {

    @RegisterExtension
    static final NativeRequirement BROWSER = NativeRequirement.executable(Chromium.BINARY, "chromium");

    private static Chromium chromium;

    @BeforeAll
    static void start() throws IOException {
        chromium = new Chromium();
    }

    @AfterAll
    static void stop() throws IOException {
        chromium.close();
    }

    static Stream<Path> models() throws IOException {
        return ExampleRuns.models();
    }

    /** The detectors can fail: a page with a console error and an outside image is caught by both. */
    @Test
    void aFaultyPageIsCaught(@TempDir Path dir) throws Exception {
        Path page = dir.resolve("faulty.html");
        // 192.0.2.1 is a documentation address (RFC 5737): never a real server
        Files.writeString(page, "<!DOCTYPE html><html><body><p>x</p><img src=\"http://192.0.2.1/logo.png\">"
                + "<script>console.error('deliberate')</script></body></html>");
        Chromium.Run run = chromium.dumpDom(page);
        assertTrue(run.consoleMessages().stream().anyMatch(l -> l.contains("deliberate")), run.stderr());
        assertTrue(chromium.pageRequests().stream().anyMatch(r -> r.contains("192.0.2.1")), chromium.pageRequests()
                .toString());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void theReportOpensCleanlyWithEveryPlot(Path model) throws Exception {
        Path report = ExampleRuns.folder(model).resolve("report.html");
        String html = Files.readString(report);
        List<String> before = chromium.pageRequests();
        Chromium.Run run = chromium.dumpDom(report);
        assertEquals(List.of(), run.consoleMessages(), model + ": console messages");
        List<String> after = new ArrayList<>(chromium.pageRequests());
        after.removeAll(before);
        assertEquals(List.of(), after, model + ": requests to the network");
        assertEquals(List.of(), outsideReferences(html), model + ": references to outside resources");

        String dom = run.stdout();
        assertTrue(dom.contains("id=\"summary\""), model + ": the DOM was not dumped:\n" + run.stderr());
        for (String id : expectedFigures(ExampleRuns.results(model))) {
            Matcher m = Pattern.compile("<figure [^>]*id=\"" + id + "\"[^>]*>\\s*<svg[^>]*>(.*?)</svg>", Pattern.DOTALL)
                    .matcher(dom);
            assertTrue(m.find(), model + ": no plot " + id);
            assertTrue(m.group(1).contains("<path") || m.group(1).contains("<rect") || m.group(1).contains("<line"),
                    model + ": plot " + id + " draws nothing");
        }
        Matcher img = Pattern.compile("id=\"fig-tower\"[^>]*>\\s*<img[^>]*src=\"data:image/png;base64,([^\"]+)\"")
                .matcher(dom);
        assertTrue(img.find(), model + ": no 3D picture");
        BufferedImage picture = ImageIO.read(new ByteArrayInputStream(Base64.getDecoder().decode(img.group(1))));
        assertNotNull(picture, model + ": the 3D picture is not a PNG");
        assertTrue(picture.getWidth() >= 800, model + ": picture width " + picture.getWidth());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void theFirstPageIsNotBlank(Path model, @TempDir Path dir) throws Exception {
        Path report = ExampleRuns.folder(model).resolve("report.html");
        Path png = dir.resolve("first-page.png");
        // an A4 page at 150 px per inch: 1240 × 1754 px
        Chromium.Run run = chromium.screenshot(report, png, 1240, 1754);
        assertTrue(Files.isRegularFile(png), model + ": no screenshot\n" + run.stderr());
        BufferedImage image = ImageIO.read(png.toFile());
        assertEquals(1240, image.getWidth());
        int inked = 0;
        Set<Integer> colours = new HashSet<>();
        for (int y = 0; y < image.getHeight(); y += 2) {
            for (int x = 0; x < image.getWidth(); x += 2) {
                int rgb = image.getRGB(x, y) & 0xFFFFFF;
                colours.add(rgb);
                int r = rgb >> 16;
                int g = (rgb >> 8) & 0xFF;
                int b = rgb & 0xFF;
                if (r + g + b < 3 * 200) {
                    inked++;
                }
            }
        }
        double share = inked / (double) ((image.getWidth() / 2) * (image.getHeight() / 2));
        assertTrue(share > 0.02, model + ": only " + share + " of the first page is inked");
        assertTrue(colours.size() > 100, model + ": only " + colours.size() + " colours on the first page");
    }

    /** The plots the report must have, from what results.json holds. */
    static List<String> expectedFigures(JsonNode results) {
        List<String> ids = new ArrayList<>(List.of("fig-histogram"));
        if (results.get("wind").size() > 0) {
            ids.add("fig-pressure");
        }
        if (results.get("sweep").get("legBases").size() > 0) {
            ids.addAll(List.of("fig-polar-compression", "fig-polar-uplift", "fig-polar-shear"));
        }
        if (results.get("sweep").get("maxUtilisation").get("azimuthDeg").size() > 0) {
            ids.add("fig-utilisation-azimuth");
        }
        for (JsonNode m : results.get("model").get("members")) {
            if ("leg".equals(m.get("role").asText())) {
                ids.add("fig-leg-envelope");
                break;
            }
        }
        if (results.get("handMethod").size() > 0) {
            ids.add("fig-hand");
        }
        return ids;
    }

    /** src, href and url() values that would load something from outside the file. */
    static List<String> outsideReferences(String html) {
        List<String> out = new ArrayList<>();
        Matcher m = Pattern.compile("(?:src|href)\\s*=\\s*\"([^\"]*)\"|url\\(([^)]*)\\)").matcher(html);
        while (m.find()) {
            String ref = (m.group(1) != null ? m.group(1) : m.group(2)).strip().replace("'", "").replace("\"", "");
            if (!ref.startsWith("#") && !ref.startsWith("data:")) {
                out.add(ref);
            }
        }
        if (html.contains("@import") || html.contains("<link") || html.contains("<script")) {
            out.add("a stylesheet link, @import or script");
        }
        return out;
    }
}
