package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.testing.NativeRequirement;

/**
 * The ridge example's report printed to A4 by headless Chromium: the body of the calculation
 * (everything before the appendix) fits in {@value #BODY_PAGES} pages (issue 16), and the
 * appendix starts on a page of its own after it.
 */
class ReportPrintTest {

    /** The most pages the body of the ridge example's calculation may print to (issue 16). */
    static final int BODY_PAGES = 12;

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

    /** The counter can fail: three sections, each forced onto a new A4 page, print to three pages. */
    @Test
    void threeForcedPagesCountAsThree(@TempDir Path dir) throws Exception {
        Path page = dir.resolve("three.html");
        Files.writeString(page, "<!DOCTYPE html><html><head><style>@page { size: A4; } section + section "
                + "{ break-before: page; }</style></head><body><section>one</section><section>two</section>"
                + "<section>three</section></body></html>");
        Path pdf = dir.resolve("three.pdf");
        chromium.printToPdf(page, pdf);
        assertEquals(3, PdfPages.count(pdf));
    }

    @Test
    void theRidgeBodyPrintsToAtMostTwelveA4Pages(@TempDir Path dir) throws Exception {
        Path model = Path.of("models/ridge-lookout-square.json");
        String html = Files.readString(ExampleRuns.folder(model).resolve("report.html"));
        int appendix = html.indexOf("<section id=\"" + AppendixSection.ID + "\"");
        assertTrue(appendix > 0, "the report has no appendix");
        Path body = dir.resolve("body.html");
        Files.writeString(body, html.substring(0, appendix) + "</body></html>");
        Path whole = dir.resolve("report.html");
        Files.writeString(whole, html);
        int bodyPages = print(body, dir.resolve("body.pdf"));
        int allPages = print(whole, dir.resolve("report.pdf"));
        assertTrue(bodyPages <= BODY_PAGES, "the body prints to " + bodyPages + " A4 pages");
        assertTrue(allPages > bodyPages, "the appendix adds no page: " + allPages + " pages in all");
    }

    private static int print(Path page, Path pdf) throws Exception {
        Chromium.Run run = chromium.printToPdf(page, pdf);
        assertTrue(Files.isRegularFile(pdf), "no PDF of " + page + "\n" + run.stderr());
        return PdfPages.count(pdf);
    }
}
