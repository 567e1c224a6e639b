package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.analysis.NaturalMode;
import tetrapod.analysis.NaturalModes;
import tetrapod.view.NodeVector;
import tetrapod.view.ViewData;

/** render --mode N (issue 14 item 2): the mode's shape drawn as the displacements of one case. */
class RenderModeTest {

    private static final Path RIDGE = Path.of("models/ridge-lookout-square.json");

    @Test
    void theCaseCarriesTheModeShapeAtEveryNodeAndNamesItsFrequency() throws Exception {
        LoadedModel loaded = LoadedModel.read(RIDGE);
        NaturalMode first = NaturalModes.of(loaded.tower(), loaded.loads(), 1).get(0);
        ViewData data = ModeViews.of(loaded.tower().frame(), first);
        List<NodeVector> d = data.cases().get(0).displacements();
        assertEquals(loaded.tower().frame().nodes().size(), d.size());
        for (int k = 0; k < d.size(); k++) {
            assertEquals(loaded.tower().frame().nodes().get(k).id(), d.get(k).node());
            assertEquals(first.shape()[6 * k], d.get(k).vector().x(), 0);
            assertEquals(first.shape()[6 * k + 2], d.get(k).vector().z(), 0);
        }
        assertTrue(data.cases().get(0).name().startsWith(String.format(java.util.Locale.ROOT, "mode 1: %.3f Hz, sway",
                first.frequencyHz())), data.cases().get(0).name());
    }

    @Test
    void aModeIsDrawnAndAModeThatDoesNotExistIsRefused(@TempDir Path dir) throws Exception {
        Path png = dir.resolve("mode.png");
        CliRun run = CliRun.of("render", RIDGE.toString(), "--mode", "2", "--size", "320x240", "-o", png.toString());
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        assertTrue(Files.size(png) > 0);
        CliRun zero = CliRun.of("render", RIDGE.toString(), "--mode", "0", "-o", png.toString());
        assertEquals(ExitCode.BAD_INPUT, zero.exitCode());
        assertTrue(zero.err().contains("--mode: must be 1 or more"), zero.err());
        CliRun many = CliRun.of("render", RIDGE.toString(), "--mode", "5000", "-o", png.toString());
        assertEquals(ExitCode.BAD_INPUT, many.exitCode());
        assertTrue(many.err().contains("the structure has only"), many.err());
        CliRun both = CliRun.of("render", RIDGE.toString(), "--mode", "1", "--colour", "axial", "-o", png.toString());
        assertEquals(ExitCode.BAD_INPUT, both.exitCode());
    }
}
