package tetrapod.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import tetrapod.analysis.NaturalMode;
import tetrapod.analysis.NaturalModes;
import tetrapod.common.BadInputException;
import tetrapod.common.UnstableStructureException;
import tetrapod.io.OutputFiles;
import tetrapod.view.Picture;
import tetrapod.view.PictureRenderer;
import tetrapod.view.RenderRequest;
import tetrapod.view.SceneOptions;
import tetrapod.view.ViewData;

/** Draws the tower to a PNG without a display: OpenGL when any can be had, Java2D otherwise. */
@Command(name = "render", mixinStandardHelpOptions = true,
        description = "Draw the tower in 3D to a PNG file. Needs no display and no GPU: uses OpenGL "
                + "(EGL or OSMesa) when available, else a built-in 2D renderer; prints which.")
final class RenderCommand implements Callable<Integer> {

    @Parameters(paramLabel = "MODEL.json", description = "The tower spec.")
    Path model;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "The PNG to write (default: out/<model file name>/tower.png).")
    Path output;

    @Option(names = "--azimuth", paramLabel = "DEG",
            description = "Draw the wind blowing towards this azimuth, degrees (0 = towards +x, 90 = towards +y): "
                    + "the wind arrow when coloured by role, else the case solved in full at that azimuth.")
    Double azimuth;

    @Option(names = "--size", paramLabel = "WxH", defaultValue = "1600x1200",
            description = "Image size in px (default: ${DEFAULT-VALUE}).")
    String size;

    @Option(names = "--colour", paramLabel = "KIND",
            description = "Colour members by role (the default: no analysis), or by axial, utilisation or azimuth "
                    + "(the model is analysed first; the envelope over every case is drawn unless --azimuth "
                    + "picks a case).")
    String colour;

    @Option(names = "--mode", paramLabel = "N",
            description = "Draw natural mode N (1 = the lowest) as a deformed shape, with its frequency and kind in "
                    + "the caption; members coloured by role.")
    Integer mode;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        int[] wh = ViewInputs.size(size, "--size");
        OptionalDouble az = azimuth == null ? OptionalDouble.empty() : OptionalDouble.of(azimuth);
        Path target = output != null ? output : OutputFolders.forModel(model).resolve("tower.png");
        OutputFiles.check(target);
        // the OpenGL context comes up on its own thread while the model is read
        try (PictureRenderer renderer = PictureRenderer.start(RenderRequest.ALL_ROUTES)) {
            LoadedModel loaded = LoadedModel.read(model);
            ViewData data;
            SceneOptions options;
            if (mode != null) {
                data = modeShape(loaded);
                options = SceneOptions.defaults(data).withDeformed(true);
            } else {
                data = ViewInputs.data(loaded, az, ViewInputs.needsResults(colour));
                options = ViewInputs.options(data, az, colour);
            }
            Picture picture = renderer.draw(data, new RenderRequest(wh[0], wh[1], options, RenderRequest.ALL_ROUTES));
            ViewInputs.writePng(picture.image(), target);
            PrintWriter out = spec.commandLine().getOut();
            out.println(picture.routeLine());
            out.println("  image written  " + target);
        }
        return ExitCode.DONE;
    }

    /** Natural mode {@code mode} of the model as a picture; --colour and --azimuth do not go with it. */
    private ViewData modeShape(LoadedModel loaded) throws BadInputException, UnstableStructureException {
        if (mode < 1) {
            throw BadInputException.at("--mode", "must be 1 or more (1 = the lowest mode), was " + mode);
        }
        if (colour != null || azimuth != null) {
            throw BadInputException.at("--mode", "draws a mode shape coloured by role; leave out "
                    + (colour != null ? "--colour" : "--azimuth"));
        }
        List<NaturalMode> modes = NaturalModes.of(loaded.tower(), loaded.loads(), mode);
        if (modes.size() < mode) {
            throw BadInputException.at("--mode", "asked for mode " + mode + "; the structure has only " + modes.size()
                    + " free translations that carry mass");
        }
        return ModeViews.of(loaded.tower().frame(), modes.get(mode - 1));
    }

    /**
     * Draws {@code data} as {@code request} says and writes it to {@code file} as a PNG; returns the
     * line saying which route drew it (e.g. {@code render: OpenGL 4.5 llvmpipe (software, EGL)}).
     * For `analyze`, which writes tower.png from its results the same way.
     */
    static String write(ViewData data, RenderRequest request, Path file) throws IOException {
        return written(PictureRenderer.render(data, request), file);
    }

    /** As {@link #write(ViewData, RenderRequest, Path)}, by a renderer started before (its routes are used). */
    static String write(PictureRenderer renderer, ViewData data, RenderRequest request, Path file) throws IOException {
        return written(renderer.draw(data, request), file);
    }

    private static String written(Picture picture, Path file) throws IOException {
        ViewInputs.writePng(picture.image(), file);
        return picture.routeLine();
    }
}
