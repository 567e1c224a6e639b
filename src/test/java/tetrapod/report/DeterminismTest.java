package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.io.ResultsReader;

/** DESIGN.md: the same input gives a byte-identical results.json (and the same tables and report). */
class DeterminismTest {

    private static final Path MODEL = Path.of("models/harbour-beacon-rectangular.json");

    @Test
    void analysingTwiceGivesTheSameBytes(@TempDir Path dir) throws Exception {
        Path a = dir.resolve("a");
        Path b = dir.resolve("b");
        assertEquals(0, ExampleRuns.analyze(MODEL, a).exitCode());
        assertEquals(0, ExampleRuns.analyze(MODEL, b).exitCode());
        for (String file : new String[] {"results.json", "members.csv", "reactions.csv", "wind.csv"}) {
            assertArrayEquals(Files.readAllBytes(a.resolve(file)), Files.readAllBytes(b.resolve(file)), file);
        }
        String reportA = ReportHtml.build(new Results(ResultsReader.read(a.resolve("results.json"))), Optional.empty());
        String reportB = ReportHtml.build(new Results(ResultsReader.read(b.resolve("results.json"))), Optional.empty());
        assertEquals(reportA, reportB, "report.html without the picture");
    }
}
