package tetrapod.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import tetrapod.analysis.Analysis;
import tetrapod.analysis.AnalysisResult;
import tetrapod.common.BadInputException;
import tetrapod.common.ProgressListener;
import tetrapod.common.UnstableStructureException;
import tetrapod.io.AtomicFiles;
import tetrapod.view.Colouring;
import tetrapod.view.RenderRequest;
import tetrapod.view.SceneOptions;
import tetrapod.view.ViewData;

/** What `render` and `view` share: the data to show, and their options turned into view settings. */
final class ViewInputs {

    private static final Pattern SIZE = Pattern.compile("(\\d{1,5})\\s*[xX×]\\s*(\\d{1,5})");

    private ViewInputs() { }

    /**
     * What is drawn of a loaded model: the geometry coloured by role (with the wind direction when
     * an azimuth is given), or, when {@code withResults}, the model analysed: the envelope over every
     * case and each case solved in full ({@link ResultViews}).
     */
    static ViewData data(LoadedModel loaded, OptionalDouble azimuthDeg, boolean withResults)
            throws UnstableStructureException {
        var items = ResultViews.ancillaries(loaded.spec());
        if (!withResults) {
            return ViewData.geometryOnly(loaded.tower().frame(), azimuthDeg).withAncillaries(items);
        }
        AnalysisResult result = Analysis.run(loaded.tower(), loaded.loads(), loaded.spec().checks(),
                ProgressListener.NONE);
        return ResultViews.of(result, loaded.spec().checks()).withAncillaries(items);
    }

    /** Whether the colouring asked for ({@code --colour}, may be null) needs analysis results. */
    static boolean needsResults(String colour) {
        return colour != null && Colouring.fromOptionName(colour).filter(c -> c != Colouring.ROLE).isPresent();
    }

    /** {@code WxH} in px, each side within what {@link RenderRequest} accepts. */
    static int[] size(String text, String option) throws BadInputException {
        Matcher m = SIZE.matcher(text.trim());
        if (m.matches()) {
            int w = Integer.parseInt(m.group(1));
            int h = Integer.parseInt(m.group(2));
            if (w >= 16 && h >= 16 && w <= RenderRequest.MAX_SIDE && h <= RenderRequest.MAX_SIDE) {
                return new int[] {w, h};
            }
        }
        throw BadInputException.at(option, "expected WIDTHxHEIGHT in px, each 16 to " + RenderRequest.MAX_SIDE
                + ", e.g. 1600x1200; was '" + text + "'");
    }

    /** The options for {@code data}: the case at the azimuth (if given) and the colouring (if given). */
    static SceneOptions options(ViewData data, OptionalDouble azimuthDeg, String colour) throws BadInputException {
        SceneOptions options = SceneOptions.defaults(data);
        List<String> problems = new ArrayList<>();
        if (azimuthDeg.isPresent()) {
            double a = azimuthDeg.getAsDouble();
            OptionalInt index = data.caseAt(a);
            if (!Double.isFinite(a)) {
                problems.add("--azimuth: must be a number of degrees, was " + a);
            } else if (index.isEmpty() && data.azimuths().isEmpty()) {
                problems.add("--azimuth: the model has no wind (no loads.wind), so no case has a wind azimuth; "
                        + "leave out --azimuth, or use --colour role to draw the tower with a wind arrow at " + deg(a));
            } else if (index.isEmpty()) {
                problems.add("--azimuth: no case solved in full with wind towards " + deg(a) + "; cases at "
                        + azimuths(data));
            } else {
                options = options.withCase(index.getAsInt());
            }
        }
        if (colour != null) {
            var c = Colouring.fromOptionName(colour);
            if (c.isEmpty()) {
                problems.add("--colour: unknown value '" + colour + "'; expected one of role, axial, utilisation, azimuth");
            } else if (!data.cases().get(options.caseIndex()).offers(c.get())) {
                problems.add("--colour: no " + c.get().optionName() + " values to colour by in case '"
                        + data.cases().get(options.caseIndex()).name() + "'; available: "
                        + names(data.colourings(options.caseIndex())));
            } else {
                options = options.withColouring(c.get());
            }
        }
        if (!problems.isEmpty()) {
            List<tetrapod.common.Problem> list = new ArrayList<>();
            for (String p : problems) {
                int colon = p.indexOf(": ");
                list.add(tetrapod.common.Problem.at(p.substring(0, colon), p.substring(colon + 2)));
            }
            throw new BadInputException(list);
        }
        return options;
    }

    /** Writes {@code image} as a PNG, replacing {@code file} in one step. */
    static void writePng(java.awt.image.BufferedImage image, Path file) throws IOException {
        AtomicFiles.writeStream(file, out -> {
            if (!ImageIO.write(image, "png", out)) {
                throw new IOException("this Java has no PNG writer");
            }
        });
    }

    private static String azimuths(ViewData data) {
        List<String> list = new ArrayList<>();
        for (double a : data.azimuths()) {
            list.add(deg(a));
        }
        return list.isEmpty() ? "none" : String.join(", ", list);
    }

    private static String names(List<Colouring> colourings) {
        List<String> list = new ArrayList<>();
        for (Colouring c : colourings) {
            list.add(c.optionName());
        }
        return String.join(", ", list);
    }

    private static String deg(double a) {
        return String.format(Locale.ROOT, "%g°", a).replaceAll("\\.?0+°$", "°");
    }
}
