package tetrapod.report;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import tetrapod.io.AtomicFiles;

/**
 * report.html: one self-contained page (styles inline, charts as inline SVG, the 3D picture as a
 * data: URI, no script and no external address) that reads as a calculation and prints to PDF
 * with sensible page breaks. Built from a results document alone.
 */
public final class ReportHtml {

    public static final String FILE = "report.html";

    /** The sections, in order. */
    static final List<Section> SECTIONS = List.of(new SummarySection(), new InputSection(), new WindSection(),
            new ResultsSection(), new MemberChecksSection(), new RequirementsSection(), new FoundationsSection(), new HandMethodSection(),
            new NaturalModesSection(), new ServiceabilitySection(), new MethodNotesSection(), new SourcesSection(), new CautionsSection(), new AppendixSection());

    private ReportHtml() { }

    /**
     * The page for {@code results}.
     *
     * @param towerPng the 3D picture as PNG bytes, or empty (the summary then has no picture)
     */
    public static String build(Results results, Optional<byte[]> towerPng) {
        return build(results, towerPng, Optional.empty());
    }

    /**
     * The page for {@code results}, with a sizing-history section when {@code sizingHistory}
     * (size-history.json as plain values) is given.
     */
    public static String build(Results results, Optional<byte[]> towerPng, Optional<Map<String, Object>> sizingHistory) {
        Html out = new Html();
        build(out, results, towerPng, sizingHistory);
        return out.toString();
    }

    private static void build(Html out, Results results, Optional<byte[]> towerPng,
                              Optional<Map<String, Object>> sizingHistory) {
        build(out, new ReportInput(results, towerPng.map(png -> Base64.getEncoder().encodeToString(png)),
                sizingHistory));
    }

    private static void build(Html out, ReportInput input) {
        Results results = input.results();
        Optional<Map<String, Object>> sizingHistory = input.sizingHistory();
        List<Section> sections = sections(sizingHistory.isPresent());
        String title = "Tower calculation: " + results.name();
        TitleBlock titleBlock = new TitleBlock(results);
        out.raw("<!DOCTYPE html>\n").open("html", "lang=\"en\"").raw("\n").open("head").raw("\n")
                .raw("<meta charset=\"utf-8\">\n")
                .raw("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .element("title", title)
                .open("style").raw("\n").raw(style()).raw(titleBlock.pageFooterCss()).close("style")
                .close("head").open("body").raw("\n");
        out.open("header").element("h1", title);
        Object description = results.input().get("description");
        if (description != null && !description.toString().isBlank()) {
            out.element("p", "class=\"description\"", description.toString());
        }
        titleBlock.write(out);
        out.element("p", "class=\"caution-line\"", "For checking by a qualified engineer against the codes that "
                + "apply locally. Tetrapod does not certify compliance.");
        out.open("nav", "aria-label=\"Contents\"").open("ol");
        for (Section s : sections) {
            out.open("li").raw("<a href=\"#" + s.id() + "\">").text(s.title()).raw("</a>").close("li");
        }
        out.close("ol").close("nav").close("header");
        int number = 1;
        for (Section s : sections) {
            out.open("section", Html.attr("id", s.id()));
            out.element("h2", number++ + " " + s.title());
            s.write(out, input);
            out.close("section");
        }
        out.open("footer").element("p", "Written by Tetrapod from " + "results.json (format "
                + Tree.str(results.document(), "format") + "). The files beside this report: results.json (every "
                + "number, SI units), members.csv, reactions.csv, wind.csv, requirements.csv, serviceability.csv, tower.png.").close("footer");
        out.close("body").close("html");
    }

    /** Writes the page to {@code file} atomically. */
    public static void write(Path file, Results results, Optional<byte[]> towerPng) throws IOException {
        write(file, results, towerPng, Optional.empty());
    }

    /** Writes the page, with its sizing history when given, to {@code file} atomically. */
    public static void write(Path file, Results results, Optional<byte[]> towerPng,
                             Optional<Map<String, Object>> sizingHistory) throws IOException {
        try {
            AtomicFiles.writeText(file, writer -> {
                Html out = new Html(writer);
                build(out, results, towerPng, sizingHistory);
                out.flush();
            });
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    /**
     * As {@link #write(Path, Results, Optional, Optional)} with a picture still being drawn: the page
     * is written to a scratch file beside {@code file} with the picture's place marked, and only then
     * is {@code towerPng} asked for the picture and the page copied into {@code file} with the picture
     * in its place (the same bytes as with the picture given at once; issue 15: the report is made
     * while the picture is drawn).
     */
    public static void write(Path file, Results results, Callable<byte[]> towerPng,
                             Optional<Map<String, Object>> sizingHistory) throws Exception {
        Path page = Files.createTempFile(file.toAbsolutePath().getParent(), ".report-", ".part");
        try {
            try (Writer writer = Files.newBufferedWriter(page, StandardCharsets.UTF_8)) {
                Html out = new Html(writer);
                build(out, new ReportInput(results, Optional.of(PictureFill.PLACE), sizingHistory));
                out.flush();
            }
            String picture = Base64.getEncoder().encodeToString(towerPng.call());
            AtomicFiles.writeStream(file, stream -> {
                try (InputStream in = Files.newInputStream(page)) {
                    BufferedOutputStream buffered = new BufferedOutputStream(stream, 1 << 16);
                    PictureFill.copy(in, buffered, picture);
                    buffered.flush();
                }
            });
        } finally {
            Files.deleteIfExists(page);
        }
    }

    /** The sections in order; the sizing history after the foundations when there is one. */
    private static List<Section> sections(boolean sized) {
        if (!sized) {
            return SECTIONS;
        }
        List<Section> all = new java.util.ArrayList<>(SECTIONS);
        all.add(all.indexOf(SECTIONS.stream().filter(s -> s instanceof FoundationsSection).findFirst().orElseThrow()) + 1,
                new SizingSection());
        return List.copyOf(all);
    }

    /** A chart as a figure with its caption. */
    static void figure(Html out, Figure f) {
        out.open("figure", "class=\"chart\" " + Html.attr("id", f.id())).raw(f.svg()).raw("\n")
                .element("figcaption", f.caption()).close("figure");
    }

    private static String style() {
        try (InputStream in = ReportHtml.class.getResourceAsStream("report.css")) {
            if (in == null) {
                throw new IllegalStateException("report.css is missing from the class path");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
