package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every input the fuzz test ever found breaking the exit contract, kept as a file in
 * {@code src/test/resources/fuzz/findings/} ({@code validate-…} replayed through validate,
 * {@code analyze-…} through analyze).
 */
class FuzzFindingsTest {

    private static final Path FINDINGS = Path.of("src/test/resources/fuzz/findings");

    @TempDir
    Path dir;

    @TestFactory
    Stream<DynamicTest> everyRecordedFindingKeepsTheExitContract() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.list(FINDINGS)) {
            files = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertFalse(files.isEmpty(), "no findings in " + FINDINGS);
        return files.stream().map(f -> DynamicTest.dynamicTest(f.getFileName().toString(), () -> replay(f)));
    }

    private void replay(Path file) throws IOException {
        String name = file.getFileName().toString();
        Path out = dir.resolve(name + ".out");
        CliRun run = name.startsWith("analyze-") ? CliRun.of("analyze", file.toString(), "-o", out.toString(), "--quiet")
                : CliRun.of("validate", file.toString());
        Optional<String> broken = ExitContract.violation(run, out);
        assertTrue(broken.isEmpty(), name + ": " + broken.orElse(""));
    }
}
