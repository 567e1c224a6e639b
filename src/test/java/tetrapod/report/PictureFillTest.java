package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.io.ResultsReader;

/**
 * A report written before its picture, the picture put in afterwards, is the report written with
 * the picture at once: the copy replaces the mark and nothing else, whatever comes round it.
 */
class PictureFillTest {

    private static final String MARK = PictureFill.PLACE;

    @Test
    void theMarkIsReplacedWhereverItStandsAndNothingElseChanges() throws IOException {
        String[] pages = {
            MARK, "a" + MARK, MARK + "b", "<p>" + MARK + "</p>", "no mark at all", "",
            "<@tetrapod-pic</p>" + MARK, "<" + MARK + "<@", "<@tetrapod-picture@" + MARK + "<@tetrapod-picture@",
            "Größe ≤ 5 µm — " + MARK + " ünd <@tetrapod-picture",
        };
        for (String page : pages) {
            assertEquals(page.replace(MARK, "iVBORw0KGgo="), copied(page, "iVBORw0KGgo="), page);
        }
    }

    /** The test can fail: random pages of mark pieces, tag openings and multi-byte letters, against String.replace. */
    @Test
    void randomPagesOfMarkPiecesAreCopiedAsStringReplaceWouldCopyThem() throws IOException {
        Random random = new Random(15);
        String[] pieces = {MARK, MARK.substring(0, 5), MARK.substring(0, MARK.length() - 1), "<", "@", ">", "é", "€",
            "x", "<@", "\n"};
        for (int k = 0; k < 2_000; k++) {
            StringBuilder page = new StringBuilder();
            for (int n = random.nextInt(12); n > 0; n--) {
                page.append(pieces[random.nextInt(pieces.length)]);
            }
            String text = page.toString();
            assertEquals(text.replace(MARK, "PNG"), copied(text, "PNG"), text);
        }
    }

    @Test
    void theReportWrittenBeforeItsPictureIsTheReportWrittenWithIt(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("ridge");
        assertEquals(0, ExampleRuns.analyze(Path.of("models/ridge-lookout-square.json"), out).exitCode());
        Results results = new Results(ResultsReader.forReport(out.resolve("results.json")));
        byte[] png = Files.readAllBytes(out.resolve("tower.png"));
        Path atOnce = dir.resolve("at-once.html");
        Path later = dir.resolve("later.html");
        ReportHtml.write(atOnce, results, Optional.of(png), Optional.empty());
        ReportHtml.write(later, results, () -> png, Optional.empty());
        assertArrayEquals(Files.readAllBytes(atOnce), Files.readAllBytes(later));
        try (var files = Files.list(dir)) {
            assertFalse(files.anyMatch(f -> f.getFileName().toString().endsWith(".part")), "the scratch page is gone");
        }

        // a picture that fails leaves no report and no scratch page
        Path failed = dir.resolve("failed.html");
        IOException drawing = new IOException("no picture");
        assertEquals(drawing, assertThrows(IOException.class, () -> ReportHtml.write(failed, results, () -> {
            throw drawing;
        }, Optional.empty())));
        assertFalse(Files.exists(failed));
        try (var files = Files.list(dir)) {
            assertFalse(files.anyMatch(f -> f.getFileName().toString().endsWith(".part")), "the scratch page is gone");
        }
    }

    private static String copied(String page, String picture) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PictureFill.copy(new ByteArrayInputStream(page.getBytes(StandardCharsets.UTF_8)), out, picture);
        return out.toString(StandardCharsets.UTF_8);
    }
}
