package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RenderCommandTest {

    @Test
    void renderWritesAPngOfTheAskedSizeAndSaysWhichRouteDrewIt(@TempDir Path dir) throws IOException {
        Path png = dir.resolve("tower.png");
        CliRun run = CliRun.of("render", "models/hilltop-relay-k.json", "-o", png.toString(), "--size", "320x240",
                "--azimuth", "45");
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        assertTrue(run.out().lines().anyMatch(l -> l.startsWith("render: OpenGL ") || l.startsWith("render: no OpenGL found")),
                run.out());
        BufferedImage image = ImageIO.read(png.toFile());
        assertEquals(320, image.getWidth());
        assertEquals(240, image.getHeight());
        assertTrue(Files.size(png) > 1000);
    }

    @Test
    void badOptionsAreBadInputWithTheOptionNamed(@TempDir Path dir) {
        Path png = dir.resolve("x.png");
        CliRun size = CliRun.of("render", "models/hilltop-relay-k.json", "-o", png.toString(), "--size", "big");
        assertEquals(ExitCode.BAD_INPUT, size.exitCode());
        assertTrue(size.err().contains("error: --size: expected WIDTHxHEIGHT"), size.err());
        CliRun colour = CliRun.of("render", "models/hilltop-relay-k.json", "-o", png.toString(), "--colour", "rainbow");
        assertEquals(ExitCode.BAD_INPUT, colour.exitCode());
        assertTrue(colour.err().contains("error: --colour: unknown value 'rainbow'"), colour.err());
        // a case solved in full has axial forces and utilisations, but no governing azimuth: that is the envelope's
        CliRun noAzimuth = CliRun.of("render", "models/harbour-beacon-rectangular.json", "-o", png.toString(),
                "--azimuth", "45", "--colour", "azimuth");
        assertEquals(ExitCode.BAD_INPUT, noAzimuth.exitCode());
        assertTrue(noAzimuth.err().contains("error: --colour: no azimuth values to colour by in case"),
                noAzimuth.err());
        assertFalse(Files.exists(png), "nothing is written on bad input");
        assertFalse(colour.err().contains("Exception"), colour.err());
    }

    @Test
    void renderColouredByUtilisationAnalysesTheModelFirst(@TempDir Path dir) throws IOException {
        Path png = dir.resolve("utilisation.png");
        CliRun run = CliRun.of("render", "models/harbour-beacon-rectangular.json", "-o", png.toString(), "--size",
                "400x300", "--colour", "utilisation");
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        BufferedImage image = ImageIO.read(png.toFile());
        assertEquals(400, image.getWidth());
        CliRun axial = CliRun.of("render", "models/harbour-beacon-rectangular.json", "-o", png.toString(), "--size",
                "400x300", "--colour", "axial", "--azimuth", "90");
        assertEquals(ExitCode.DONE, axial.exitCode(), axial.err());
    }

    @Test
    void viewWithoutADisplaySaysSoAndPointsToRender() {
        boolean display = System.getenv("DISPLAY") != null || System.getenv("WAYLAND_DISPLAY") != null;
        org.junit.jupiter.api.Assumptions.assumeFalse(display, "a display exists: the window would open");
        CliRun run = CliRun.of("view", "models/hilltop-relay-k.json");
        assertEquals(6, run.exitCode(), "README: 6 is the bad-environment code\n" + run.out() + run.err());
        assertTrue(run.err().contains("view: cannot open a window"), run.err());
        assertTrue(run.err().contains("tetrapod render"), run.err());
    }

    @Test
    void helpWorks() {
        for (String command : new String[] {"render", "view"}) {
            CliRun help = CliRun.of(command, "--help");
            assertEquals(ExitCode.DONE, help.exitCode());
            assertTrue(help.out().contains("Usage: tetrapod " + command), help.out());
        }
    }
}
