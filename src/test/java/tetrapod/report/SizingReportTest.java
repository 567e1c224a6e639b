package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The sizing history in the report of a sized model (issue 8: "with the history in the report"). */
class SizingReportTest {

    @Test
    void theReportOfASizedModelPlotsItsHistoryAndAnEditedModelHasNone(@TempDir Path dir) throws Exception {
        Path sized = dir.resolve("sized.json");
        Path folder = dir.resolve("out");
        ExampleRuns.Run size = ExampleRuns.cli("size", "models/ridge-lookout-square.json", "-o", sized.toString(),
                "--history-dir", folder.toString());
        assertEquals(0, size.exitCode(), size.err());
        assertTrue(Files.isRegularFile(folder.resolve(SizingHistoryFile.FILE)));

        ExampleRuns.Run analyse = ExampleRuns.analyze(sized, folder);
        assertEquals(0, analyse.exitCode(), analyse.err());
        String html = Files.readString(folder.resolve(ReportHtml.FILE));
        assertTrue(html.contains("id=\"sizing\""), "a sizing section");
        assertTrue(html.matches("(?s).*<figure[^>]*id=\"fig-sizing\"[^>]*><svg.*"), "the history plotted");
        assertTrue(html.contains("<path"), "drawn");

        // The same folder, a model edited by hand after sizing: the history no longer describes it.
        Path edited = dir.resolve("edited.json");
        Files.writeString(edited, Files.readString(sized).replaceFirst("\"leg\": \"L\\d+x\\d+\"", "\"leg\": \"L200x20\""));
        ExampleRuns.Run again = ExampleRuns.analyze(edited, folder);
        assertEquals(0, again.exitCode(), again.err());
        assertFalse(Files.readString(folder.resolve(ReportHtml.FILE)).contains("id=\"sizing\""));
    }
}
