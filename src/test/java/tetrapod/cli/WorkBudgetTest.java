package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A sweep too large for one run is refused by validate and analyze alike, at once, with exit 2 (issue 13). */
class WorkBudgetTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    @Test
    void tooManyMemberChecksAreRefusedWithTheSweepStepToChange(@TempDir Path dir) throws Exception {
        ObjectNode root = (ObjectNode) MAPPER.readTree(Path.of("models/ridge-lookout-square.json").toFile());
        root.remove("planBracingLevels");
        for (var segment : root.get("segments")) {
            ((ObjectNode) segment).put("panels", segment.get("panels").asInt() * 20);
        }
        ((ObjectNode) root.get("loads")).put("sweepStep", 0.1);
        Path file = dir.resolve("fine.json");
        Files.writeString(file, MAPPER.writeValueAsString(root));
        for (String command : new String[] {"validate", "analyze"}) {
            CliRun run = command.equals("validate") ? CliRun.of(command, file.toString())
                    : CliRun.of(command, file.toString(), "-o", dir.resolve("out").toString(), "--quiet");
            assertEquals(ExitCode.BAD_INPUT, run.exitCode(), run.err());
            assertTrue(run.err().contains("loads.sweepStep: ") && run.err().contains("load cases (sweep step 0.1°)")
                    && run.err().contains("give a coarser sweepStep"), run.err());
            assertEquals(1, run.err().lines().count(), run.err());
        }
        assertTrue(Files.notExists(dir.resolve("out").resolve("results.json")));
    }
}
