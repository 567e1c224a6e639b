package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The {@code ./tetrapod} launcher with the packaged jar (run by failsafe after the package phase):
 * it records its class-data archive once per build, gives Java the settings docs/performance.md
 * chose, lets TETRAPOD_JAVA_OPTS win, and never lets the JVM's own messages reach standard output
 * (which {@code tetrapod new > model.json} writes a model to). Each test runs a copy of the launcher
 * in a scratch tree holding only what it reads: the jar, the ridge example and sources older than the jar.
 */
class LauncherIT {

    @TempDir
    Path root;

    private Path launcher;
    private Path archive;

    @BeforeEach
    void copyTheLauncherBesideTheJar() throws IOException {
        assumeFalse(System.getProperty("os.name").startsWith("Windows"), "the launcher is a bash script");
        Path jar = Path.of("target", "tetrapod.jar");
        assertTrue(Files.isRegularFile(jar), "the package phase made " + jar);
        launcher = root.resolve("tetrapod");
        Files.copy(Path.of("tetrapod"), launcher);
        assertTrue(launcher.toFile().setExecutable(true));
        Files.createDirectories(root.resolve("target"));
        Files.copy(jar, root.resolve("target/tetrapod.jar"));
        Files.createDirectories(root.resolve("models"));
        Files.copy(Path.of("models/ridge-lookout-square.json"), root.resolve("models/ridge-lookout-square.json"));
        Files.createDirectories(root.resolve("src/main"));
        Files.createDirectories(root.resolve("shaders"));
        Files.copy(Path.of("pom.xml"), root.resolve("pom.xml"));
        FileTime before = FileTime.fromMillis(System.currentTimeMillis() - 3_600_000);
        for (String old : List.of("pom.xml", "src/main", "shaders")) {
            Files.setLastModifiedTime(root.resolve(old), before);
        }
        archive = root.resolve("target/tetrapod.jsa");
    }

    private record Run(int exitCode, String out, String err) { }

    private Run run(String javaOpts, String... args) throws Exception {
        ProcessBuilder builder = new ProcessBuilder();
        builder.command().add(launcher.toString());
        builder.command().addAll(List.of(args));
        builder.directory(root.toFile());
        builder.environment().remove("TETRAPOD_JAVA_OPTS");
        if (javaOpts != null) {
            builder.environment().put("TETRAPOD_JAVA_OPTS", javaOpts);
        }
        Path out = root.resolve("stdout.txt");
        Path err = root.resolve("stderr.txt");
        Process p = builder.redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("the launcher did not finish in 120 s");
        }
        return new Run(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
    }

    @Test
    void theFirstRunRecordsTheArchiveAndLaterRunsUseItQuietly() throws Exception {
        Run first = run(null, "--version");
        assertEquals(0, first.exitCode(), first.err());
        assertTrue(first.out().matches("tetrapod \\S+\\n"), first.out());
        assertTrue(first.err().contains("recording the classes of a run"), first.err());
        assertTrue(Files.size(archive) > 1_000_000, "an archive of the example's classes");

        FileTime recorded = Files.getLastModifiedTime(archive);
        Run second = run(null, "--version");
        assertEquals(first.out(), second.out());
        assertEquals("", second.err());
        assertEquals(recorded, Files.getLastModifiedTime(archive), "not recorded again");
    }

    @Test
    void aNewerJarOrAnotherJavaRecordsAgainAndAnUnusableArchiveOnlySlowsTheStart() throws Exception {
        assertEquals(0, run(null, "--version").exitCode());
        Files.setLastModifiedTime(archive, FileTime.fromMillis(System.currentTimeMillis() - 60_000));
        Run rebuilt = run(null, "--version");
        assertTrue(rebuilt.err().contains("recording the classes of a run"), rebuilt.err());

        Files.writeString(root.resolve("target/tetrapod.jsa.java"), "/opt/another/java 1\n");
        Run otherJava = run(null, "--version");
        assertTrue(otherJava.err().contains("recording the classes of a run"), "another Java: " + otherJava.err());
        assertEquals("", run(null, "--version").err(), "the same Java again: kept");

        archive.toFile().setWritable(true);
        Files.write(archive, "not an archive".getBytes(StandardCharsets.UTF_8));   // newer than the jar: kept
        Run starter = run(null, "new", "--no-size");
        assertEquals(0, starter.exitCode(), starter.err());
        assertEquals("", starter.err());
        Map<?, ?> model = new ObjectMapper().readValue(starter.out(), Map.class);   // nothing but the model on stdout
        assertTrue(model.containsKey("segments"), starter.out());
    }

    @Test
    void theChosenSettingsAreGivenAndTetrapodJavaOptsWins() throws Exception {
        Run chosen = run("-XX:+PrintCommandLineFlags", "--version");
        assertEquals(0, chosen.exitCode(), chosen.err());
        assertTrue(chosen.out().contains("-XX:TieredStopAtLevel=1"), chosen.out());
        assertTrue(chosen.out().contains("-XX:+UseSerialGC"), chosen.out());
        assertTrue(chosen.out().contains("-XX:SharedArchiveFile="), chosen.out());
        Path hugePages = Path.of("/sys/kernel/mm/transparent_hugepage/enabled");
        boolean offered = Files.isReadable(hugePages) && Files.readString(hugePages).matches("(?s).*\\[(madvise|always)].*");
        assertEquals(offered, chosen.out().contains("-XX:+UseTransparentHugePages"), chosen.out());

        Run own = run("-XX:+UseParallelGC -XX:TieredStopAtLevel=4 -XX:+PrintCommandLineFlags", "--version");
        assertEquals(0, own.exitCode(), own.err());
        assertTrue(own.out().contains("-XX:+UseParallelGC"), own.out());
        assertFalse(own.out().contains("-XX:+UseSerialGC"), own.out());
        assertTrue(own.out().contains("-XX:TieredStopAtLevel=4"), own.out());
    }
}
