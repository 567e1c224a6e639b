package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestReporter;
import org.junit.jupiter.api.io.TempDir;

/**
 * Property: on every mutation of the bundled models, validate and analyze (in this process,
 * through the command line) keep the {@link ExitContract}. The default run checks a few thousand
 * inputs in about a minute; {@code -Dtetrapod.fuzz.validate=N -Dtetrapod.fuzz.analyze=M
 * -Dtetrapod.fuzz.seed=S} runs a longer campaign (DEVELOPERS.md, "Fuzz test").
 */
class FuzzContractTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    /** Azimuth step of analysed mutants, degrees: a small sweep keeps each analysis short. */
    private static final double FUZZ_SWEEP_STEP = 90.0;

    private static int property(String name, int defaultValue) {
        return Integer.parseInt(System.getProperty("tetrapod.fuzz." + name, String.valueOf(defaultValue)));
    }

    private static List<JsonNode> models() throws IOException {
        List<JsonNode> list = new ArrayList<>();
        try (Stream<Path> s = Files.list(Path.of("models"))) {
            for (Path p : s.filter(x -> x.toString().endsWith(".json")).sorted().toList()) {
                list.add(MAPPER.readTree(p.toFile()));
            }
        }
        return list;
    }

    @Test
    void validateKeepsTheExitContractOnMutatedModels(@TempDir Path dir, TestReporter reporter) throws Exception {
        campaign(dir, reporter, "validate", property("validate", 3000), property("seed", 13), models());
    }

    @Test
    void analyzeKeepsTheExitContractOnMutatedModels(@TempDir Path dir, TestReporter reporter) throws Exception {
        List<JsonNode> small = new ArrayList<>();
        for (JsonNode m : models()) {
            if (m.path("loads").has("sweepStep")) {
                ((ObjectNode) m.get("loads")).put("sweepStep", FUZZ_SWEEP_STEP);
            }
            small.add(m);
        }
        campaign(dir, reporter, "analyze", property("analyze", 150), property("seed", 13) + 1, small);
    }

    /** With -Dtetrapod.fuzz.record=DIR, every input that breaks the contract is kept there to become a regression file. */
    private static void record(String command, int seed, int input, ModelMutator.Mutant mutant) throws IOException {
        String dir = System.getProperty("tetrapod.fuzz.record");
        if (dir != null) {
            Path target = Files.createDirectories(Path.of(dir)).resolve(command + "-seed" + seed + "-input" + input + ".json");
            Files.writeString(target, mutant.text(), StandardCharsets.UTF_8);
        }
    }

    private static void campaign(Path dir, TestReporter reporter, String command, int inputs, int seed,
                                 List<JsonNode> models) throws Exception {
        ModelMutator mutator = new ModelMutator(seed);
        List<String> findings = new ArrayList<>();
        Path file = dir.resolve("mutant.json");
        Path out = dir.resolve("out");
        for (int i = 0; i < inputs; i++) {
            JsonNode model = models.get(i % models.size());
            ModelMutator.Mutant mutant = mutator.mutate(model);
            Files.writeString(file, mutant.text(), StandardCharsets.UTF_8);
            CliRun run = command.equals("validate") ? CliRun.of("validate", file.toString())
                    : CliRun.of("analyze", file.toString(), "-o", out.toString(), "--quiet");
            Optional<String> broken = ExitContract.violation(run, command.equals("analyze") ? out : null);
            if (broken.isPresent()) {
                findings.add("input " + i + " of seed " + seed + " (" + model.path("name").asText() + "): "
                        + mutant.description() + " -> " + broken.get());
                record(command, seed, i, mutant);
            }
            if (Files.exists(out)) {
                tetrapod.io.TestFiles.deleteTree(out);
            }
        }
        reporter.publishEntry(command + " inputs", String.valueOf(inputs));
        assertTrue(findings.isEmpty(), findings.size() + " inputs broke the exit contract:\n" + String.join("\n", findings));
    }
}
