package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class CommandLineTest {

    static Stream<Path> models() throws IOException {
        return files(Path.of("models"));
    }

    static Stream<Path> badSpecs() throws IOException {
        return files(Path.of("src/test/resources/bad-specs"));
    }

    private static Stream<Path> files(Path dir) throws IOException {
        List<Path> list;
        try (Stream<Path> s = Files.list(dir)) {
            list = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertFalse(list.isEmpty(), "no .json files in " + dir);
        return list.stream();
    }

    @ParameterizedTest
    @MethodSource("models")
    void everyExampleModelIsValid(Path model) {
        CliRun run = CliRun.of("validate", model.toString());
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        assertTrue(run.out().contains("valid"), run.out());
    }

    @ParameterizedTest
    @MethodSource("badSpecs")
    void everyBadSpecIsRejectedWithLocatedOneLineMessagesAndExitTwo(Path spec) {
        CliRun run = CliRun.of("validate", spec.toString());
        assertEquals(ExitCode.BAD_INPUT, run.exitCode(), run.out() + run.err());
        List<String> lines = run.err().lines().toList();
        assertFalse(lines.isEmpty());
        for (String line : lines) {
            assertTrue(line.matches("error: \\S.*: .+"), "not a located one-line message: " + line);
        }
        assertFalse(run.err().contains("Exception"), run.err());
        assertFalse(run.err().contains("\tat "), run.err());
    }

    @Test
    void aMissingFileIsBadInputNotACrash() {
        CliRun run = CliRun.of("validate", "no/such/model.json");
        assertEquals(ExitCode.BAD_INPUT, run.exitCode(), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
    }

    @Test
    void theStarterSpecIsValidAndBuilds(@TempDir Path dir) throws IOException {
        CliRun made = CliRun.of("new", "--height", "24", "--segments", "3", "--bracing", "k", "--base-width", "5");
        assertEquals(ExitCode.DONE, made.exitCode(), made.err());
        Path spec = dir.resolve("starter.json");
        Files.writeString(spec, made.out());
        CliRun check = CliRun.of("validate", spec.toString());
        assertEquals(ExitCode.DONE, check.exitCode(), check.err());
        // issue 12: the starter has a loads block and passes its own checks
        assertTrue(made.out().contains("\"wind\""), made.out());
        CliRun analysed = CliRun.of("analyze", spec.toString(), "-o", dir.resolve("out").toString(), "--quiet");
        assertEquals(ExitCode.DONE, analysed.exitCode(), analysed.err());
        assertTrue(analysed.out().contains("all checks pass"), analysed.out());
        assertTrue(analysed.out().contains("requirements: every requirement is met"), analysed.out());
    }

    @Test
    void badStarterOptionsAreNamed() {
        CliRun run = CliRun.of("new", "--height", "-3", "--bracing", "zigzag");
        assertEquals(ExitCode.BAD_INPUT, run.exitCode());
        assertTrue(run.err().contains("--height: must be > 0 m"), run.err());
        assertTrue(run.err().contains("--bracing: unknown value 'zigzag'"), run.err());
    }

    @Test
    void geometryWritesANodeByNodeSpecThatGivesTheSameFrame(@TempDir Path dir) {
        Path frame = dir.resolve("frame.json");
        CliRun run = CliRun.of("geometry", "models/ridge-lookout-square.json", "-o", frame.toString());
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        assertTrue(run.out().contains("steel mass"), run.out());
        CliRun again = CliRun.of("geometry", frame.toString(), "-o", dir.resolve("again.json").toString());
        assertEquals(ExitCode.DONE, again.exitCode(), again.err());
        assertEquals(counts(run.out()), counts(again.out()));
    }

    @Test
    void versionAndHelpWork() {
        assertEquals(ExitCode.DONE, CliRun.of("--version").exitCode());
        for (String command : List.of("validate", "new", "geometry")) {
            CliRun help = CliRun.of(command, "--help");
            assertEquals(ExitCode.DONE, help.exitCode());
            assertTrue(help.out().contains("Usage: tetrapod " + command), help.out());
        }
    }

    /** The node, support, member and mass lines of a geometry summary. */
    private static List<String> counts(String summary) {
        return summary.lines().filter(l -> l.matches("\\s+(nodes|supports|members|steel mass|leg|diagonal).*")).toList();
    }
}
