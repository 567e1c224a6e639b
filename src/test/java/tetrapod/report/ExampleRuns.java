package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import picocli.CommandLine;
import tetrapod.cli.Main;

/**
 * Every example model analysed once per test run with {@code tetrapod analyze} into a folder of
 * its own, shared by the report's tests. A model that does not analyse (any exit code but 0) fails
 * the test that asks for it.
 */
final class ExampleRuns {

    static final ObjectMapper JSON = new ObjectMapper();

    private static final Map<Path, Path> FOLDERS = new HashMap<>();
    private static Path root;

    private ExampleRuns() { }

    /** The example models, sorted. */
    static Stream<Path> models() throws IOException {
        List<Path> list;
        try (Stream<Path> s = Files.list(Path.of("models"))) {
            list = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertFalse(list.isEmpty(), "no example models");
        return list.stream();
    }

    /** The output folder of {@code analyze model}, run on first use. */
    static synchronized Path folder(Path model) {
        return FOLDERS.computeIfAbsent(model, m -> {
            try {
                if (root == null) {
                    root = Files.createTempDirectory(Files.createDirectories(Path.of("target")), "tetrapod-examples");
                }
                Path out = root.resolve(m.getFileName().toString().replace(".json", ""));
                Run run = analyze(m, out);
                assertEquals(0, run.exitCode(), "analyze " + m + " exited " + run.exitCode() + ":\n" + run.err());
                return out;
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
    }

    /** results.json of the example, read with Jackson (independently of the report's own reader). */
    static JsonNode results(Path model) {
        try {
            return JSON.readTree(folder(model).resolve("results.json").toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    record Run(int exitCode, String out, String err) { }

    /** Runs {@code tetrapod analyze model -o out --quiet} in this process. */
    static Run analyze(Path model, Path out) {
        return cli("analyze", model.toString(), "-o", out.toString(), "--quiet");
    }

    static Run cli(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = Main.commandLine(out, err);
        int code = cl.execute(args);
        return new Run(code, out.toString(), err.toString());
    }
}
