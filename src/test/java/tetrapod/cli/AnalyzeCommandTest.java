package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

class AnalyzeCommandTest {

    static Stream<Path> models() throws IOException {
        return CommandLineTest.models();
    }

    @ParameterizedTest
    @MethodSource("models")
    void everyExampleIsAnalysedAndItsResultsWritten(Path model, @TempDir Path dir) throws IOException {
        CliRun run = CliRun.of("analyze", model.toString(), "-o", dir.toString());
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        String results = Files.readString(dir.resolve("results.json"));
        assertTrue(results.contains("\"format\": \"tetrapod-results/1\""));
        assertFalse(results.contains("NaN") || results.contains("Infinity"), "no NaN in the output");
        assertTrue(run.out().contains("most utilised members"), run.out());
        assertTrue(run.out().contains("qualified engineer"), "the caution is printed");
        try (Stream<Path> files = Files.list(dir)) {
            assertTrue(files.noneMatch(p -> p.getFileName().toString().startsWith(".")), "no temporary file left");
        }
    }

    /**
     * EN 1993-3-1 Annex A Table A.1, reliability class 2 (the default; values recalled from memory): the
     * permanent action factored 1.1 where unfavourable (compression), 1.0 where favourable (uplift), the
     * wind 1.4; the summary names the basis and the combination each hand-method comparison is made in.
     */
    @Test
    void theSummaryNamesTheCombinationOfEachHandComparison(@TempDir Path dir) {
        CliRun run = CliRun.of("analyze", "models/ridge-lookout-square.json", "-o", dir.toString());
        assertTrue(run.out().contains("design basis: en; action factors en1993-3-1, reliability class 2"), run.out());
        assertTrue(run.out().contains("  compression in 1.1G + 1.4W (largest leg compression"), run.out());
        assertTrue(run.out().contains("  uplift in 1.0G + 1.4W (largest uplift"), run.out());
        assertFalse(run.out().contains("WARNING"), run.out());
    }

    /** A mix of families allowed by mixedBasis is a warning in the summary, results.json and the report. */
    @Test
    void anAllowedMixIsWarnedEverywhere(@TempDir Path dir) throws IOException {
        Path model = dir.resolve("mixed.json");
        Files.writeString(model, """
                { "name": "mixed", "mixedBasis": true,
                  "base": { "widthX": 3.0, "widthY": 3.0 },
                  "segments": [ { "height": 6.0, "topWidthX": 2.0, "topWidthY": 2.0, "panels": 2, "bracing": "x",
                      "sections": { "leg": "L100x10", "diagonal": "L60x6", "horizontal": "L60x6" } } ],
                  "loads": { "wind": { "method": "en1991", "basicSpeed": 24.0, "terrain": "II" }, "sweepStep": 15 },
                  "checks": { "method": "asce10" } }
                """);
        Path out = dir.resolve("out");
        CliRun run = CliRun.of("analyze", model.toString(), "-o", out.toString());
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        String line = "checks.method: ASCE 10 member and bolt checks (us) in a model of basis en";
        assertTrue(run.out().contains("WARNING: mixed design basis (allowed by mixedBasis): " + line), run.out());
        String results = Files.readString(out.resolve("results.json"));
        assertTrue(results.contains("\"warnings\": [ \"" + line + "\" ]") || results.contains("\"" + line + "\""), results);
        assertTrue(Files.readString(out.resolve("report.html")).contains("Mixed design basis (allowed by mixedBasis): " + line));
        Path strict = dir.resolve("strict.json");
        Files.writeString(strict, Files.readString(model).replace("\"mixedBasis\": true,", ""));
        CliRun refused = CliRun.of("analyze", strict.toString(), "-o", dir.resolve("out2").toString());
        assertEquals(ExitCode.BAD_INPUT, refused.exitCode(), refused.out());
        assertTrue(refused.err().contains("error: checks.method: ASCE 10 member and bolt checks belongs to the us family")
                && refused.err().contains("allowed here: en1993") && refused.err().contains("(line 6)"), refused.err());
    }

    /**
     * ASCE 7 (10.4-5) on the harbour example's map values: t_d = 2.0 · 6.0 mm · I_i 1.00 · f_z · K_zt 1.00^0.35;
     * f_z = 1 at 33 ft: 12.0 mm; at the top, 18 m = 59.06 ft: f_z = (59.06/33)^0.10 = 1.0599, 12.7 mm.
     */
    @Test
    void theSummaryPrintsTheDesignIceThickness(@TempDir Path dir) {
        CliRun run = CliRun.of("analyze", "models/harbour-beacon-rectangular.json", "-o", dir.toString());
        assertTrue(run.out().contains("ice: t_d = 2.0 t I_i f_z K_zt^0.35 (ASCE 7 (10.4-5)) with map t = 6.0 mm, I_i = 1.00,"
                + " K_zt = 1.00: 12.0 mm at 10 m (33 ft), 12.7 mm at the top (18.0 m)"), run.out());
    }

    @ParameterizedTest
    @ValueSource(strings = {"k-panel-without-horizontals.json", "tripod-on-one-support.json"})
    void aMechanismExitsThreeNamingTheFreeNodes(String file, @TempDir Path dir) {
        CliRun run = CliRun.of("analyze", "src/test/resources/mechanisms/" + file, "-o", dir.toString());
        assertEquals(ExitCode.UNSTABLE, run.exitCode(), run.out() + run.err());
        assertTrue(run.err().matches("(?s)error: unstable structure: free motion at node \\d+ \\(u[xyz].*likely cause: .*"),
                run.err());
        assertFalse(run.err().contains("Exception"), run.err());
        assertFalse(Files.exists(dir.resolve("results.json")), "no results for a mechanism");
    }

    @Test
    void strictTurnsOverstressIntoExitOne(@TempDir Path dir) throws Exception {
        // The ridge example with its top legs cut down from L90x7 to L50x5: they cannot carry the platform.
        String ridge = java.nio.file.Files.readString(Path.of("models/ridge-lookout-square.json"));
        String weak = ridge.replace("\"sections\": { \"leg\": \"L90x7\"", "\"sections\": { \"leg\": \"L50x5\"");
        org.junit.jupiter.api.Assertions.assertNotEquals(ridge, weak);
        Path model = dir.resolve("weak-top.json");
        java.nio.file.Files.writeString(model, weak);
        CliRun run = CliRun.of("analyze", model.toString(), "-o", dir.resolve("out").toString(), "--strict");
        assertTrue(run.out().contains("OVERSTRESSED"), run.out());
        assertEquals(ExitCode.OVERSTRESS, run.exitCode());
        CliRun passing = CliRun.of("analyze", "models/ridge-lookout-square.json", "-o", dir.resolve("ok").toString(),
                "--strict", "--quiet");
        assertEquals(ExitCode.DONE, passing.exitCode(), passing.out());
    }
}
