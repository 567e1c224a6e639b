package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.io.ResultsReader;

/**
 * The report reads results.json streamed and without the bulk it never uses (every case's vectors,
 * every mode's shape): the page is the same byte for byte as from the whole file, the parts left
 * out are exactly those, and what is kept equals Jackson's own reading of the file.
 */
class LeanReadingTest {

    @Test
    void theReportFromTheLeanReadingIsTheReportFromTheWholeFile(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("ridge");
        assertEquals(0, ExampleRuns.analyze(Path.of("models/ridge-lookout-square.json"), out).exitCode());
        Path file = out.resolve("results.json");
        Map<String, Object> whole = ResultsReader.read(file);
        Map<String, Object> lean = ResultsReader.forReport(file);
        assertEquals(ReportHtml.build(new Results(whole), Optional.empty()),
                ReportHtml.build(new Results(lean), Optional.empty()));

        JsonNode jackson = new ObjectMapper().readTree(file.toFile());
        List<?> cases = (List<?>) lean.get("cases");
        assertEquals(jackson.get("cases").size(), cases.size());
        int withVectors = 0;
        for (int k = 0; k < cases.size(); k++) {
            Map<?, ?> c = (Map<?, ?>) cases.get(k);
            JsonNode inFile = jackson.get("cases").get(k);
            withVectors += inFile.has("loads") ? 1 : 0;
            for (String gone : List.of("loads", "displacements", "reactions", "memberForces")) {
                assertFalse(c.containsKey(gone), "case " + k + " keeps " + gone);
                // the vectors only for some cases (docs/methods.md, "The cases written in full"), the reactions for all
                assertTrue(inFile.has(gone) || !gone.equals("reactions") && !inFile.has("loads"), "the file has " + gone);
            }
            assertEquals(jackson.get("cases").get(k).get("id").asText(), c.get("id"));
            assertEquals(jackson.get("cases").get(k).get("equilibriumError").asDouble(), (Double) c.get("equilibriumError"));
        }
        assertTrue(withVectors > 0, "some case is written with its vectors");
        assertEquals(ResultsReader.forReport(whole), lean, "the same lean document from memory as from the file");
        assertTrue(Files.size(file) > 1_000_000, "a file worth streaming");
    }
}
