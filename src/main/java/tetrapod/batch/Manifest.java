package tetrapod.batch;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.io.PlainJson;

/**
 * The towers of a fleet run: every {@code *.json} file of a folder (by name), or the rows of a CSV
 * file whose column {@code model} gives a model path relative to the CSV file. Every other column
 * of the CSV is a parameter: its header a dotted key path into the model ({@code loads.wind.basicSpeed}),
 * its cell a JSON value (text that is no JSON is taken as a string; an empty cell sets nothing).
 * A row's parameters are one more scenario of that tower, named {@value #PARAMETERS}.
 */
public record Manifest(Path source, List<Tower> towers) {

    /** The scenario of a row's parameter columns. */
    public static final String PARAMETERS = "parameters";
    static final String MODEL_COLUMN = "model";

    /**
     * One tower: {@code id} unique in the run (the file name without {@code .json}, numbered when
     * two files share a name), its model file, and its parameters as a merge patch (empty: none).
     */
    public record Tower(String id, Path file, Map<String, Object> parameters) { }

    public Manifest {
        towers = List.copyOf(towers);
    }

    public static Manifest read(Path source) throws BadInputException {
        if (Files.isDirectory(source)) {
            return new Manifest(source, folder(source));
        }
        if (!Files.isRegularFile(source)) {
            throw new BadInputException(Problem.at("$", "cannot read the manifest " + source
                    + ": no such file or folder (give a folder of model files or a CSV file)"));
        }
        return new Manifest(source, csv(source));
    }

    private static List<Tower> folder(Path dir) throws BadInputException {
        List<Path> files = new ArrayList<>();
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(dir, "*.json")) {
            entries.forEach(files::add);
        } catch (IOException e) {
            throw BadInputException.at("$", "cannot read the manifest folder " + dir + ": " + e.getMessage());
        }
        files.sort(null);
        if (files.isEmpty()) {
            throw BadInputException.at("$", "the manifest folder " + dir + " holds no .json model file");
        }
        Ids ids = new Ids();
        List<Tower> towers = new ArrayList<>();
        for (Path f : files) {
            towers.add(new Tower(ids.next(f), f, Map.of()));
        }
        return towers;
    }

    private static List<Tower> csv(Path file) throws BadInputException {
        CSVFormat format = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true)
                .setIgnoreSurroundingSpaces(true).setIgnoreEmptyLines(true).get();
        Path base = file.toAbsolutePath().getParent();
        List<Tower> towers = new ArrayList<>();
        Ids ids = new Ids();
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8);
             CSVParser parser = CSVParser.builder().setReader(in).setFormat(format).get()) {
            List<String> header = parser.getHeaderNames();
            if (!header.contains(MODEL_COLUMN)) {
                throw new BadInputException(new Problem("$", 1, file + ": the header row has no column '"
                        + MODEL_COLUMN + "' (the model file of each row, relative to the CSV file)"));
            }
            for (String column : header) {
                if (!column.equals(MODEL_COLUMN) && !column.matches("[A-Za-z_][A-Za-z0-9_]*(\\.[A-Za-z_][A-Za-z0-9_]*)*")) {
                    throw new BadInputException(new Problem(column, 1, file + ": the parameter column '" + column
                            + "' is no dotted key path such as loads.wind.basicSpeed (array items cannot be patched"
                            + " one by one: a merge patch replaces a whole array)"));
                }
            }
            for (CSVRecord row : parser) {
                int line = (int) parser.getCurrentLineNumber();
                String model = row.isMapped(MODEL_COLUMN) && row.isSet(MODEL_COLUMN) ? row.get(MODEL_COLUMN) : "";
                if (model.isBlank()) {
                    throw new BadInputException(new Problem(MODEL_COLUMN, line, file + ": the row gives no model file"));
                }
                Map<String, Object> parameters = new LinkedHashMap<>();
                for (String column : header) {
                    if (!column.equals(MODEL_COLUMN) && row.isSet(column) && !row.get(column).isBlank()) {
                        put(parameters, column.split("\\."), cell(row.get(column)));
                    }
                }
                Path modelFile = base.resolve(model).normalize();
                towers.add(new Tower(ids.next(modelFile), modelFile, parameters));
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            throw BadInputException.at("$", "cannot read the manifest " + file + ": " + e.getMessage());
        }
        if (towers.isEmpty()) {
            throw BadInputException.at("$", "the manifest " + file + " lists no model");
        }
        return towers;
    }

    /** A cell as a JSON value; text that is not JSON (a section name such as L90x8) as a string. */
    private static Object cell(String text) {
        try {
            return PlainJson.parse(text);
        } catch (BadInputException notJson) {
            return text;
        }
    }

    @SuppressWarnings("unchecked")
    private static void put(Map<String, Object> patch, String[] keys, Object value) {
        Map<String, Object> at = patch;
        for (int k = 0; k < keys.length - 1; k++) {
            Object inner = at.get(keys[k]);
            if (!(inner instanceof Map)) {
                inner = new LinkedHashMap<String, Object>();
                at.put(keys[k], inner);
            }
            at = (Map<String, Object>) inner;
        }
        at.put(keys[keys.length - 1], value);
    }

    /** Tower ids from file names, numbered from the second use of a name on. */
    private static final class Ids {
        private final Map<String, Integer> used = new HashMap<>();

        String next(Path file) {
            String name = file.getFileName().toString();
            String stem = name.endsWith(".json") ? name.substring(0, name.length() - 5) : name;
            stem = stem.replaceAll("[^A-Za-z0-9._-]", "_");
            if (stem.isEmpty() || stem.chars().allMatch(c -> c == '.')) {
                stem = "_" + stem;
            }
            int n = used.merge(stem, 1, Integer::sum);
            return n == 1 ? stem : stem + "-" + n;
        }
    }
}
