package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SizeCommandTest {

    private static final String RIDGE = "models/ridge-lookout-square.json";

    @Test
    void anExampleSizedComesOutValidAndMeetsEveryRequirement(@TempDir Path dir) throws Exception {
        Path sized = dir.resolve("ridge-sized.json");
        CliRun run = CliRun.of("size", RIDGE, "-o", sized.toString(), "--history-dir", dir.toString());
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        assertTrue(run.out().contains("converged after"), run.out());
        assertTrue(run.out().contains("segment 1 leg"), run.out());
        assertTrue(run.out().matches("(?s).*steel mass \\(bare\\): \\d+ kg before, \\d+ kg after \\([-+]\\d.*"), run.out());
        assertEquals(ExitCode.DONE, CliRun.of("validate", sized.toString()).exitCode());
        Path history = dir.resolve("size-history.json");
        assertTrue(Files.readString(history).contains("\"format\": \"tetrapod-size-history/1\""));
        CliRun analysed = CliRun.of("analyze", sized.toString(), "-o", dir.resolve("analysed").toString());
        assertEquals(ExitCode.DONE, analysed.exitCode(), analysed.err());
        assertTrue(analysed.out().contains("all checks pass"), analysed.out());
        assertTrue(analysed.out().contains("requirements: every requirement is met"), analysed.out());
    }

    @Test
    void anUnderSizedExampleComesOutPassing(@TempDir Path dir) throws Exception {
        Path sized = dir.resolve("hilltop-sized.json");
        CliRun run = CliRun.of("size", "models/hilltop-relay-k.json", "-o", sized.toString(), "--history-dir",
                dir.toString(), "--target", "0.95");
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        assertTrue(run.out().contains("  iteration"), run.out());
        // the target given on the command line bounds the result: 0 < largest utilisation ≤ 0.95
        java.util.regex.Matcher after = java.util.regex.Pattern.compile("largest utilisation after sizing: ([0-9.]+)")
                .matcher(run.out());
        assertTrue(after.find(), run.out());
        double largest = Double.parseDouble(after.group(1));
        assertTrue(largest > 0 && largest <= 0.95, run.out());
    }

    @Test
    void anUnmeetableRequirementNamesTheMemberAndItsBestAndWritesNothing(@TempDir Path dir) throws Exception {
        // The segment 2-3 diagonals' M16 bolts moved to e1 = e2 = 20 mm: 1.2 d0 / e = 1.2 × 18 / 20 = 1.08
        // by EN 1993-1-8 Table 3.3 whatever the section, a requirement no section can meet.
        String ridge = Files.readString(Path.of(RIDGE));
        String close = ridge.replaceFirst("\"endDistance_mm\": 30, \"edgeDistance_mm\": 30",
                "\"endDistance_mm\": 20, \"edgeDistance_mm\": 20");
        assertNotEquals(ridge, close);
        Path model = dir.resolve("close-bolts.json");
        Files.writeString(model, close);
        Path sized = dir.resolve("never.json");
        CliRun run = CliRun.of("size", model.toString(), "-o", sized.toString(), "--history-dir", dir.toString());
        assertEquals(ExitCode.INFEASIBLE, run.exitCode(), run.out() + run.err());
        assertTrue(run.err().contains("infeasible"), run.err());
        assertTrue(run.err().matches("(?s).*segment 2 diagonal: member \\d+ needs more than any allowed section gives; "
                + "best L\\S+ at utilisation [0-9.]+ \\(.*breaks the bolt end/edge distance and spacing \\(1\\.080, .*"),
                run.err());
        assertFalse(Files.exists(sized));
        assertFalse(Files.exists(dir.resolve("size-history.json")));
        assertFalse(run.err().contains("Exception"), run.err());
    }

    @Test
    void badOptionsAreBadInput() {
        CliRun role = CliRun.of("size", RIDGE, "--min-thickness", "spire=4");
        assertEquals(ExitCode.BAD_INPUT, role.exitCode());
        assertTrue(role.err().contains("--min-thickness: unknown role 'spire'"), role.err());
        CliRun section = CliRun.of("size", RIDGE, "--allowed", "L60x6,L61x6");
        assertEquals(ExitCode.BAD_INPUT, section.exitCode());
        assertTrue(section.err().contains("allowed: unknown section 'L61x6'"), section.err());
        CliRun target = CliRun.of("size", RIDGE, "--target", "-1");
        assertEquals(ExitCode.BAD_INPUT, target.exitCode());
        CliRun frame = CliRun.of("size", "models/benchmark-25-bar-space-truss.json");
        assertEquals(ExitCode.BAD_INPUT, frame.exitCode());
        assertTrue(frame.err().contains("generated tower"), frame.err());
    }
}
