package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The serviceability verdict on the command line: a line of its own in the summary, a limit not met
 * does not change the exit code (the movement is not a strength check), and a range of levels that
 * holds no level is refused with its line once the tower is built. Invented test tower.
 */
class ServiceabilityCommandTest {

    private static final String TOWER = """
        {
          "name": "serviceability test tower",
          "base": { "widthX": 4.0, "widthY": 4.0 },
          "segments": [
            { "height": 12.0, "topWidthX": 3.0, "topWidthY": 3.0, "panels": 4, "bracing": "x",
              "sections": { "leg": "L100x10", "diagonal": "L60x6", "horizontal": "L60x6" } }
          ],
          "loads": {
            "wind": { "method": "en1991", "basicSpeed": 26.0, "terrain": "II" },
            "ancillaries": [ { "kind": "point", "name": "dish", "height": 11.0, "weight": 1.0, "area": 0.8, "forceCoefficient": 1.5, "face": "+x" } ],
            "sweepStep": 30.0
          },
          "serviceability": {
            %s
          }
        }
        """;

    @Test
    void aLimitNotMetIsTheVerdictLineAndLeavesTheExitCode(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("t.json");
        Files.writeString(model, TOWER.formatted("""
            "ancillaries": [ { "name": "dish", "tilt_deg": 0.001, "twist_deg": 5.0 } ]"""));
        CliRun run = CliRun.of("analyze", model.toString(), "-o", dir.resolve("out").toString(), "--quiet");
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        String verdict = run.out().lines().filter(l -> l.startsWith("serviceability: ")).findFirst().orElseThrow(
                () -> new AssertionError("no verdict line:\n" + run.out()));
        assertTrue(verdict.startsWith("serviceability: NOT MET: 1 ancillary exceeds its tilt limit: dish ("), verdict);
        assertTrue(verdict.contains("> 0.001°, wind "), verdict);
        assertTrue(Files.readString(dir.resolve("out/serviceability.csv")).contains("dish"), "serviceability.csv");
        String results = Files.readString(dir.resolve("out/results.json"));
        assertTrue(results.contains("\"serviceability\""), "results.json has the block");
    }

    @Test
    void aRangeWithoutALevelIsRefusedWithItsLine(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("t.json");
        String text = TOWER.formatted("""
            "levels": [ { "from": 4.0, "to": 5.0, "tilt_deg": 0.5 } ]""");
        Files.writeString(model, text);
        CliRun run = CliRun.of("validate", model.toString());
        assertEquals(ExitCode.BAD_INPUT, run.exitCode(), run.out() + run.err());
        int line = (int) text.substring(0, text.indexOf("\"levels\"")).lines().count();
        assertTrue(run.err().contains("serviceability.levels[0]: holds no panel level above the base; the levels are at "
                + "3, 6, 9, 12 m (line " + line + ")"), run.err());
    }
}
