package tetrapod.report;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tetrapod.common.BadInputException;
import tetrapod.io.PlainJson;

/**
 * The size-history.json that tetrapod size leaves in the folder its sized model is analysed into,
 * taken only when it describes the design in the results: the same model name and, group by
 * group, the same sections as the model that was analysed (an edited model has no history).
 */
public final class SizingHistoryFile {

    public static final String FILE = "size-history.json";

    private SizingHistoryFile() { }

    /** The history in {@code folder} that matches {@code results}, if there is one. */
    public static Optional<Map<String, Object>> matching(Path folder, Results results) {
        Path file = folder.resolve(FILE);
        if (!Files.isRegularFile(file)) {
            return Optional.empty();
        }
        Map<String, Object> history;
        try {
            history = Tree.map(PlainJson.read(file), FILE);
        } catch (BadInputException | IllegalArgumentException e) {
            return Optional.empty();
        }
        return describes(history, results) ? Optional.of(history) : Optional.empty();
    }

    private static boolean describes(Map<String, Object> history, Results results) {
        if (!"tetrapod-size-history/1".equals(history.get("format")) || !results.name().equals(history.get("model"))) {
            return false;
        }
        List<Map<String, Object>> segments = Tree.maps(results.input(), "segments");
        for (Map<String, Object> g : Tree.maps(history, "groups")) {
            int segment = Tree.integer(g, "segment");
            if (segment < 1 || segment > segments.size()) {
                return false;
            }
            Object analysed = Tree.mapOrEmpty(segments.get(segment - 1), "sections").get(Tree.str(g, "role"));
            if (!Tree.str(Tree.map(g, "after"), "section").equals(analysed)) {
                return false;
            }
        }
        return true;
    }
}
