package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import tetrapod.io.Sha256;

/** The title block and print footer of the ridge example's report, against the model file itself. */
class TitleBlockTest {

    private static final Path MODEL = Path.of("models/ridge-lookout-square.json");

    /** FIPS 180-2, appendix B.1: SHA-256("abc"). */
    @Test
    void sha256OfAbcIsThePublishedDigest() {
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                Sha256.of("abc".getBytes(java.nio.charset.StandardCharsets.US_ASCII)));
    }

    @Test
    void theFirstPageNamesTheProjectTheProgramAndTheModelsHash() throws Exception {
        String html = Files.readString(ExampleRuns.folder(MODEL).resolve("report.html"));
        JsonNode project = ExampleRuns.JSON.readTree(MODEL.toFile()).get("project");
        assertEquals(project.get("project").asText(), cell(html, "title-project"));
        assertEquals(project.get("structure").asText(), cell(html, "title-structure"));
        assertEquals(project.get("revision").asText(), cell(html, "title-revision"));
        assertEquals(project.get("date").asText(), cell(html, "title-date"));
        assertEquals(project.get("preparedBy").asText(), cell(html, "title-preparedBy"));
        assertTrue(html.contains("<td id=\"title-checkedBy\" class=\"blank\"></td>"), "checked by: a blank line");
        assertTrue(cell(html, "title-program").startsWith("tetrapod "), cell(html, "title-program"));
        String digest = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(MODEL)));
        assertEquals(digest, cell(html, "title-sha256"));
        assertTrue(html.indexOf("id=\"title-block\"") < html.indexOf("id=\"summary\""), "before the first section");
        Matcher footer = Pattern.compile("@bottom-center \\{ content: \"([^\"]*)\"").matcher(html);
        assertTrue(footer.find(), "no print footer");
        assertTrue(footer.group(1).endsWith("SHA-256 " + digest), footer.group(1));
    }

    @Test
    void cssStringsCannotBreakOutOfTheirQuotesOrTheStyleElement() {
        assertEquals("\"a \\\"b\\\" \\\\ \\3C /style>\"", TitleBlock.cssString("a \"b\" \\ </style>"));
    }

    private static String cell(String html, String id) {
        Matcher m = Pattern.compile("<td id=\"" + id + "\"[^>]*>([^<]*)</td>").matcher(html);
        assertTrue(m.find(), "no cell " + id);
        return m.group(1);
    }
}
