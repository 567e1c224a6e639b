package tetrapod.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;

/**
 * Reads a results.json written by {@code tetrapod analyze} back into the ordered plain values it
 * was written from (see {@link PlainJson}), after checking that it is one.
 */
public final class ResultsReader {

    /** The format results.json declares in its {@code format} key. */
    public static final String FORMAT = "tetrapod-results/1";

    /** Top-level keys a results file must have for a report to be built from it. */
    private static final List<String> REQUIRED = List.of("input", "model", "cases", "checks", "legBases");

    private ResultsReader() { }

    /**
     * What the report never reads, left out by {@link #forReport}: every case's load vector,
     * displacements, reactions and member forces, and every mode's shape (the bulk of a large file).
     */
    public static final Set<String> NOT_REPORTED = Set.of("$.cases[].loads", "$.cases[].displacements",
            "$.cases[].reactions", "$.cases[].memberForces", "$.modes[].shape");

    /** The results file, streamed, in full. */
    public static Map<String, Object> read(Path file) throws BadInputException {
        return read(file, Set.of());
    }

    /** The results file, streamed, without what the report does not read ({@link #NOT_REPORTED}). */
    public static Map<String, Object> forReport(Path file) throws BadInputException {
        return read(file, NOT_REPORTED);
    }

    /**
     * A results document in memory without what the report does not read ({@link #NOT_REPORTED}):
     * shallow copies of the lists that hold it, the document itself unchanged.
     */
    @SuppressWarnings("unchecked")
    public static Map<String, Object> forReport(Map<String, Object> document) {
        Map<String, Object> lean = new LinkedHashMap<>(document);
        for (String path : NOT_REPORTED) {
            String list = path.substring(2, path.indexOf("[]"));         // $.cases[].loads -> cases, loads
            String key = path.substring(path.indexOf("[]") + 3);
            if (lean.get(list) instanceof List<?> items) {
                List<Object> copies = new ArrayList<>(items.size());
                for (Object item : items) {
                    if (item instanceof Map<?, ?> m) {
                        Map<String, Object> copy = new LinkedHashMap<>((Map<String, Object>) m);
                        copy.remove(key);
                        copies.add(copy);
                    } else {
                        copies.add(item);
                    }
                }
                lean.put(list, copies);
            }
        }
        return lean;
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> read(Path file, Set<String> skipped) throws BadInputException {
        Object root;
        try {
            root = PlainJson.read(file, skipped);
        } catch (BadInputException e) {
            if (!java.nio.file.Files.isReadable(file)) {
                throw e;
            }
            throw new BadInputException(Problem.at("$", file + " is not a results file: expected the results.json "
                    + "that 'tetrapod analyze' writes (" + e.problems().get(0).message() + ")"));
        }
        if (!(root instanceof Map<?, ?>)) {
            throw new BadInputException(Problem.at("$", file + " is not a results file: expected a JSON object"));
        }
        Map<String, Object> doc = (Map<String, Object>) root;
        Object format = doc.get("format");
        if (!FORMAT.equals(format)) {
            throw new BadInputException(Problem.at("$.format", file + " is not a results file of format " + FORMAT
                    + (format == null ? " (it has no format key)" : " (its format is '" + format + "')")));
        }
        for (String key : REQUIRED) {
            if (!doc.containsKey(key)) {
                throw new BadInputException(Problem.at("$." + key, "missing: " + file
                        + " is incomplete; run 'tetrapod analyze' again"));
            }
        }
        return doc;
    }
}
