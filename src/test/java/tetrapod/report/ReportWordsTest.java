package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The report speaks to people (issue 16): no camelCase key, JSON path or repository path in its
 * text (tables, paragraphs and chart labels), and every link goes somewhere that exists.
 */
class ReportWordsTest {

    /** A lower-case word of two or more letters running into a capital: a key name (units such as kN, kPa pass). */
    private static final Pattern CAMEL = Pattern.compile("\\b[a-z]{2,}[A-Z]\\w*");
    /** A JSON path ($.a.b, a[3].b) or a repository path (docs/x.md, src/..., a .java file). */
    private static final Pattern PATHS = Pattern.compile("\\$\\.\\w+|\\w\\[\\d+]\\.\\w+|\\b(?:docs|src|models)/\\S+"
            + "|\\S+\\.(?:md|java)\\b");

    static Stream<Path> models() throws Exception {
        return ExampleRuns.models();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void theTextHasNoKeyNamesAndEveryLinkResolves(Path model) throws Exception {
        Path folder = ExampleRuns.folder(model);
        String html = Files.readString(folder.resolve("report.html"));
        assertEquals(Set.of(), camelCaseWords(html), model + ": camelCase words");
        assertEquals(Set.of(), paths(html), model + ": JSON or repository paths");
        assertEquals(List.of(), deadLinks(html, folder), model + ": dead links");
    }

    /** The scanners can fail: a page with a key name, a JSON path, a repository path and dead links. */
    @Test
    void theScannersCatchKeyNamesPathsAndDeadLinks(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("here.csv"), "x");
        String page = "<p id=\"top\">anchorTension of connections[3].endDistance_mm, see docs/methods-checks.md; 12 kN,"
                + " 3 kPa</p><a href=\"#top\">ok</a><a href=\"#nowhere\">x</a><a href=\"here.csv\">ok</a>"
                + "<a href=\"missing.csv\">x</a><svg><text>windOnIce</text></svg>";
        assertEquals(Set.of("anchorTension", "endDistance_mm", "windOnIce"), camelCaseWords(page));
        assertEquals(Set.of("s[3].endDistance_mm", "docs/methods-checks.md;"), paths(page));
        assertEquals(List.of("#nowhere", "missing.csv"), deadLinks(page, dir));
    }

    /** The words a reader sees: markup, the style sheet and embedded pictures removed, entities decoded. */
    static String text(String html) {
        String t = html.replaceAll("(?s)<style>.*?</style>", " ").replaceAll("src=\"data:[^\"]*\"", "")
                .replaceAll("<[^>]+>", " ");
        return t.replace("&lt;", "<").replace("&gt;", ">").replace("&quot;", "\"").replace("&#39;", "'")
                .replace("&amp;", "&");
    }

    static Set<String> camelCaseWords(String html) {
        return matches(CAMEL, text(html));
    }

    static Set<String> paths(String html) {
        return matches(PATHS, text(html));
    }

    private static Set<String> matches(Pattern p, String text) {
        Set<String> out = new TreeSet<>();
        Matcher m = p.matcher(text);
        while (m.find()) {
            out.add(m.group());
        }
        return out;
    }

    /** Links to an id the page does not have, or to a file that is not beside the page. */
    static List<String> deadLinks(String html, Path folder) {
        Set<String> ids = matches(Pattern.compile("\\sid=\"([^\"]+)\""), html).stream()
                .map(s -> s.substring(s.indexOf('"') + 1, s.length() - 1)).collect(java.util.stream.Collectors.toSet());
        List<String> dead = new ArrayList<>();
        Matcher m = Pattern.compile("href=\"([^\"]*)\"").matcher(html);
        while (m.find()) {
            String href = m.group(1);
            boolean alive = href.startsWith("#") ? ids.contains(href.substring(1))
                    : !href.contains(":") && Files.isRegularFile(folder.resolve(href));
            if (!alive) {
                dead.add(href);
            }
        }
        return dead;
    }
}
