package tetrapod.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import tetrapod.view.InputMap;
import tetrapod.view.SceneOptions;
import tetrapod.view.ViewData;
import tetrapod.view.ViewerWindow;

/** Opens the interactive 3D window (needs a display). */
@Command(name = "view", mixinStandardHelpOptions = true,
        description = "Open an interactive 3D window on the tower (needs a display; "
                + "'tetrapod render' draws a picture without one).",
        footer = {"%nKeys and mouse:", InputMap.HELP})
final class ViewCommand implements Callable<Integer> {

    @Parameters(paramLabel = "MODEL.json", description = "The tower spec.")
    Path model;

    @Option(names = "--azimuth", paramLabel = "DEG", description = "Start with the wind blowing towards this azimuth, degrees (0 = towards +x, 90 = towards +y): "
                    + "the wind arrow when coloured by role, else the case solved in full at that azimuth.")
    Double azimuth;

    @Option(names = "--colour", paramLabel = "KIND", description = "Start coloured by role, or by axial, utilisation or azimuth (the model is analysed first and the window steps through the envelope and every case solved in full).")
    String colour;

    @Option(names = "--size", paramLabel = "WxH", defaultValue = "1280x960",
            description = "Window size (default: ${DEFAULT-VALUE}).")
    String size;

    @Option(names = "--measure-frames", paramLabel = "N", defaultValue = "0",
            description = "Orbit for N frames as fast as possible, print the frame rate and close (for measuring).")
    int measureFrames;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        LoadedModel loaded = LoadedModel.read(model);
        OptionalDouble az = azimuth == null ? OptionalDouble.empty() : OptionalDouble.of(azimuth);
        ViewData data = ViewInputs.data(loaded, az, ViewInputs.needsResults(colour));
        int[] wh = ViewInputs.size(size, "--size");
        SceneOptions options = ViewInputs.options(data, az, colour);
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Path folder = OutputFolders.forModel(model);
        ViewerWindow window = new ViewerWindow(data, options, image -> {
            Path file = folder.resolve("view-" + LocalDateTime.now().format(DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss"))
                    + ".png");
            try {
                ViewInputs.writePng(image, file);
                out.println("view: saved " + file);
                out.flush();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
        try {
            String line = window.run(wh[0], wh[1], Math.max(0, measureFrames));
            if (!line.isEmpty()) {
                out.println(line);
            }
            return ExitCode.DONE;
        } catch (ViewerWindow.Unavailable e) {
            err.println("view: " + e.getMessage());
            err.println("view: 'tetrapod render " + model + " -o tower.png' draws a picture without a display");
            return ExitCode.BAD_ENVIRONMENT;
        }
    }
}
