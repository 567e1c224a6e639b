package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** analyze writes every output into its folder and names the folder; report rebuilds the HTML from results.json. */
class AnalyzeOutputsTest {

    private static final String MODEL = "models/harbour-beacon-rectangular.json";
    private static final List<String> FILES = List.of("results.json", "members.csv", "reactions.csv", "wind.csv", "requirements.csv", "serviceability.csv",
            "report.html", "tower.png");

    @Test
    void analyzeWritesEveryFileAndPrintsTheFolder(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("beacon");
        CliRun run = CliRun.of("analyze", MODEL, "-o", out.toString(), "--quiet");
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        for (String f : FILES) {
            assertTrue(Files.size(out.resolve(f)) > 100, f + " is missing or empty");
        }
        assertTrue(run.out().contains("results written to " + out), run.out());
        assertEquals("", run.err(), "nothing on the error stream: no progress bar without a terminal");
        try (var s = Files.list(out)) {
            assertEquals(FILES.size(), s.count(), "no temporary file left behind");
        }
    }

    @Test
    void reportRebuildsTheHtmlFromResultsJsonAlone(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("beacon");
        assertEquals(ExitCode.DONE, CliRun.of("analyze", MODEL, "-o", out.toString(), "--quiet").exitCode());
        String written = Files.readString(out.resolve("report.html"));

        Path copy = dir.resolve("elsewhere");
        Files.createDirectories(copy);
        Files.copy(out.resolve("results.json"), copy.resolve("results.json"));
        CliRun bare = CliRun.of("report", copy.resolve("results.json").toString());
        assertEquals(ExitCode.DONE, bare.exitCode(), bare.err());
        assertTrue(bare.out().contains("no tower.png beside"), bare.out());
        String rebuilt = Files.readString(copy.resolve("report.html"));
        assertFalse(rebuilt.contains("data:image/png"), "no picture to embed");
        assertEquals(withoutPicture(written), withoutPicture(rebuilt), "the same report, less the picture");

        Path target = dir.resolve("again.html");
        CliRun beside = CliRun.of("report", out.resolve("results.json").toString(), "-o", target.toString());
        assertEquals(ExitCode.DONE, beside.exitCode(), beside.err());
        assertEquals(written, Files.readString(target), "with tower.png beside it, the very same page");
    }

    @Test
    void reportRefusesAFileThatIsNotAResultsFile(@TempDir Path dir) throws IOException {
        CliRun model = CliRun.of("report", MODEL);
        assertEquals(ExitCode.BAD_INPUT, model.exitCode());
        assertTrue(model.err().contains("is not a results file"), model.err());
        Path broken = dir.resolve("broken.json");
        Files.writeString(broken, "{ \"format\": ");
        CliRun bad = CliRun.of("report", broken.toString());
        assertEquals(ExitCode.BAD_INPUT, bad.exitCode());
        assertFalse(bad.err().contains("Exception"), bad.err());
        assertEquals(ExitCode.BAD_INPUT, CliRun.of("report", dir.resolve("none.json").toString()).exitCode());
    }

    private static String withoutPicture(String html) {
        return html.replaceAll("(?s)<figure class=\"picture\".*?</figure>\\s*", "");
    }
}
