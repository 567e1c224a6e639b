package tetrapod.io;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
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

    @SuppressWarnings("unchecked")
    public static Map<String, Object> read(Path file) throws BadInputException {
        Object root;
        try {
            root = PlainJson.read(file);
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
