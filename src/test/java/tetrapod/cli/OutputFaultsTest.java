package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Output faults are reported before the analysis with exit 5; a killed run never leaves a mixed folder. */
class OutputFaultsTest {

    private static final String SMALL = "models/benchmark-25-bar-space-truss.json";

    @Test
    void anOutputOntoAFileIsRefusedBeforeTheAnalysis(@TempDir Path dir) throws Exception {
        Path file = Files.writeString(dir.resolve("taken"), "x");
        long t0 = System.nanoTime();
        // the hilltop tower takes several seconds to analyse: a refusal after the analysis would be slow
        CliRun run = CliRun.of("analyze", "models/hilltop-relay-k.json", "-o", file.toString(), "--quiet");
        double seconds = (System.nanoTime() - t0) / 1e9;
        assertEquals(ExitCode.OUTPUT_FAILED, run.exitCode(), run.err());
        assertEquals("error: " + file + " is a file, not a folder: choose a folder with -o", run.err().strip());
        assertEquals("", run.out(), "no summary: nothing was analysed");
        assertTrue(seconds < 5, "refused after " + seconds + " s");
        CliRun under = CliRun.of("render", SMALL, "-o", file.resolve("x.png").toString());
        assertEquals(ExitCode.OUTPUT_FAILED, under.exitCode(), under.err());
        assertTrue(under.err().contains(file + " is a file"), under.err());
    }

    @Test
    void folderNamesFromFileNamesStayInsideOut() {
        Map<String, String> expected = Map.of("...json", "_..", "..json", "_.", ".json", "_", "ridge.json", "ridge",
                ".hidden.json", ".hidden", "a..json", "a.");
        expected.forEach((file, stem) -> {
            assertEquals(stem, OutputFolders.stem(Path.of("models", file)), file);
            Path folder = OutputFolders.forModel(Path.of(file)).normalize();
            assertEquals(Path.of("out"), folder.getParent(), file + " -> " + folder);
        });
    }

    @Test
    void aRunKilledWhileWritingLeavesThePreviousSetWholeAndTheNextRunCleansUp(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("tower");
        assertEquals(ExitCode.DONE, CliRun.of("analyze", SMALL, "-o", out.toString(), "--quiet").exitCode());
        Map<String, byte[]> before = contents(out);

        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"), "tetrapod.cli.Main", "analyze",
                "models/harbour-beacon-rectangular.json", "-o", out.toString(), "--quiet")
                .redirectErrorStream(true).redirectOutput(dir.resolve("log").toFile()).start();
        Optional<Path> staging = Optional.empty();
        for (int i = 0; i < 1200 && staging.isEmpty() && p.isAlive(); i++) {
            Thread.sleep(50);
            staging = stagingWithResults(dir);
        }
        assertTrue(staging.isPresent(), "the run reached its writes: " + Files.readString(dir.resolve("log")));
        p.destroyForcibly().waitFor(); // SIGKILL: no clean-up code runs
        Map<String, byte[]> after = contents(out);
        assertEquals(before.keySet(), after.keySet(), "the folder holds the previous set");
        before.forEach((name, bytes) -> assertArrayEquals(bytes, after.get(name), name + " unchanged"));
        assertTrue(Files.exists(dir.resolve("tower.lock")), "the killed run's lock is left, stale");

        CliRun next = CliRun.of("analyze", SMALL, "-o", out.toString(), "--quiet");
        assertEquals(ExitCode.DONE, next.exitCode(), next.err());
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(List.of("log", "tower"), s.map(x -> x.getFileName().toString()).sorted().toList(),
                    "the staging folder and the stale lock of the killed run are gone");
        }
        assertEquals(AnalyzeCommand.OUTPUTS, contents(out).keySet());
    }

    private static Optional<Path> stagingWithResults(Path dir) throws Exception {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(x -> x.getFileName().toString().startsWith("tower.tmp-"))
                    .filter(x -> Files.exists(x.resolve("results.json"))).findFirst();
        }
    }

    private static Map<String, byte[]> contents(Path folder) throws Exception {
        Map<String, byte[]> files = new HashMap<>();
        try (Stream<Path> s = Files.list(folder)) {
            for (Path p : s.toList()) {
                files.put(p.getFileName().toString(), Files.readAllBytes(p));
            }
        }
        return files;
    }
}
