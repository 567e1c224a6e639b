package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The messages issue 16 found confusing, as a new user meets them. */
class MessagesTest {

    private static final Path RIDGE = Path.of("models/ridge-lookout-square.json");

    /** Problems found after reading (geometry, loads) carry the line of their key, counted here in the file's text. */
    @Test
    void problemsFoundAfterReadingHaveTheirLines(@TempDir Path dir) throws Exception {
        String text = Files.readString(RIDGE).replaceFirst("\"panels\": 4", "\"panels\": 4, \"panelHeights\": [3, 3, 3, 2]");
        Path geometry = dir.resolve("geometry.json");
        Files.writeString(geometry, text);
        CliRun run = CliRun.of("validate", geometry.toString());
        assertEquals(ExitCode.BAD_INPUT, run.exitCode(), run.out() + run.err());
        int line = lineOf(text, "\"panelHeights\"");
        assertTrue(run.err().contains("segments[0].panelHeights: ") && run.err().contains("(line " + line + ")"),
                "expected line " + line + ":\n" + run.err());

        String tall = Files.readString(RIDGE).replaceFirst("\"height\": 30.0", "\"height\": 60.0");
        Path loads = dir.resolve("loads.json");
        Files.writeString(loads, tall);
        CliRun second = CliRun.of("validate", loads.toString());
        assertEquals(ExitCode.BAD_INPUT, second.exitCode(), second.out() + second.err());
        int itemLine = lineOf(tall, "\"height\": 60.0");
        assertTrue(second.err().contains("(line " + itemLine + ")"), "expected line " + itemLine + ":\n" + second.err());
    }

    /** Issue 13: an unknown grade and a parser limit carry their lines too. */
    @Test
    void anUnknownGradeAndTooDeepNestingHaveTheirLines(@TempDir Path dir) throws Exception {
        String text = Files.readString(RIDGE).replaceFirst("\"material\": \"S355\"", "\"material\": \"S999\"");
        Path grade = dir.resolve("grade.json");
        Files.writeString(grade, text);
        CliRun run = CliRun.of("validate", grade.toString());
        assertEquals(ExitCode.BAD_INPUT, run.exitCode(), run.out() + run.err());
        assertTrue(run.err().contains("material: unknown steel grade 'S999'")
                && run.err().contains("(line " + lineOf(text, "\"S999\"") + ")"), run.err());

        Path deep = dir.resolve("deep.json");
        Files.writeString(deep, "{ \"name\": \"x\",\n \"a\": " + "[".repeat(1500) + "]".repeat(1500) + " }");
        CliRun nested = CliRun.of("validate", deep.toString());
        assertEquals(ExitCode.BAD_INPUT, nested.exitCode());
        assertEquals("error: $: malformed JSON: arrays and objects nested 1001 deep; at most 1000 levels are read (line 2)",
                nested.err().strip());
    }

    /** A typo in the wind and a geometry problem: both reported in one run, each with its line. */
    @Test
    void aGeometryProblemIsReportedBesideAReadingProblemOfTheLoads(@TempDir Path dir) throws Exception {
        String text = Files.readString(RIDGE).replaceFirst("\"panels\": 4", "\"panels\": 4, \"panelHeights\": [3, 3, 3, 2]")
                .replaceFirst("\"basicSpeed\"", "\"basicSped\"");
        Path both = dir.resolve("both.json");
        Files.writeString(both, text);
        CliRun run = CliRun.of("validate", both.toString());
        assertEquals(ExitCode.BAD_INPUT, run.exitCode(), run.out() + run.err());
        assertTrue(run.err().contains("basicSped: unknown key") && run.err().contains("(line " + lineOf(text, "basicSped")
                + ")"), run.err());
        assertTrue(run.err().contains("segments[0].panelHeights: ") && run.err().contains("(line "
                + lineOf(text, "\"panelHeights\"") + ")"), run.err());
    }

    @Test
    void aCsvGivenToReportIsNamedAsNotAResultsFile(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("members.csv");
        Files.writeString(csv, "member,role\n1,leg\n");
        CliRun run = CliRun.of("report", csv.toString());
        assertEquals(ExitCode.BAD_INPUT, run.exitCode());
        assertTrue(run.err().contains("is not a results file") && run.err().contains("results.json"), run.err());
    }

    @Test
    void anAzimuthOnAModelWithoutWindSaysThereIsNoWind(@TempDir Path dir) {
        CliRun run = CliRun.of("render", "models/benchmark-25-bar-space-truss.json", "--azimuth", "45", "--colour",
                "utilisation", "-o", dir.resolve("t.png").toString());
        assertEquals(ExitCode.BAD_INPUT, run.exitCode(), run.err());
        assertTrue(run.err().contains("has no wind"), run.err());
        assertFalse(run.err().contains("cases at none"), run.err());
    }

    @Test
    void theAzimuthHelpSaysTowards() {
        for (String command : List.of("render", "view")) {
            CliRun help = CliRun.of(command, "--help");
            String text = help.out().replaceAll("\\s+", " ");
            assertTrue(text.contains("blowing towards this azimuth"), command + ": " + text);
            assertFalse(text.contains("wind from"), command + ": " + text);
        }
    }

    private static int lineOf(String text, String needle) {
        List<String> lines = text.lines().toList();
        for (int k = 0; k < lines.size(); k++) {
            if (lines.get(k).contains(needle)) {
                return k + 1;
            }
        }
        throw new AssertionError("no " + needle);
    }
}
