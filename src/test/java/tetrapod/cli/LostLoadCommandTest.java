package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A pin-jointed tower whose single diagonals leave its leg nodes braced in one face only: the wind
 * on those nodes has nowhere to go (issue 11). `analyze` must stop with exit 3 and one line naming
 * the node and the fix, write nothing, and never show a stack trace.
 */
class LostLoadCommandTest {

    /** The tower: 20 m, single diagonals, horizontals at the ends only, pin-jointed. */
    private static final Path TRUSS = Path.of("src/test/resources/load-path/one-face-braced-truss.json");

    @Test
    void aLoadNothingCanCarryIsAnUnstableStructureNamingTheNodeAndTheFix(@TempDir Path dir) throws Exception {
        Path model = TRUSS;
        Path out = dir.resolve("out");
        CliRun run = CliRun.of("analyze", model.toString(), "-o", out.toString(), "--quiet");
        assertEquals(ExitCode.UNSTABLE, run.exitCode(), run.out() + run.err());
        assertTrue(run.err().matches("(?s).*at node \\d+ acts along .*continuous-legs idealisation.*"), run.err());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
        assertFalse(Files.exists(out.resolve("results.json")), "no result with load missing");
    }

    @Test
    void theSameTowerWithContinuousLegsAnalyses(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("legs.json");
        Files.writeString(model, Files.readString(TRUSS).replace("\"truss\"", "\"continuous-legs\""));
        CliRun run = CliRun.of("analyze", model.toString(), "-o", dir.resolve("out").toString(), "--quiet");
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        assertTrue(run.out().contains("equilibrium of the applied loads against the support reactions alone"), run.out());
    }
}
