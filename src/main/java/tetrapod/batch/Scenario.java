package tetrapod.batch;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import tetrapod.common.BadInputException;
import tetrapod.io.ModelPatches;

/**
 * A change tried on every tower: a JSON Merge Patch read from {@code file} (plain values), or, when
 * the file could not be read, the one-line reason (each of its rows is then bad input). The
 * unpatched model is the scenario {@value #BASE}.
 */
public record Scenario(String name, Optional<Path> file, Object patch, Optional<String> unreadable) {

    public static final String BASE = "base";

    /**
     * The scenario patches of {@code --scenario} options, named by their file names; a file that
     * cannot be read makes bad-input rows, a name used twice or reserved is bad input.
     */
    public static List<Scenario> fromFiles(List<Path> files) throws BadInputException {
        List<Scenario> out = new ArrayList<>();
        Set<String> names = new HashSet<>(Set.of(BASE, Manifest.PARAMETERS));
        for (Path f : files) {
            String file = f.getFileName() == null ? "" : f.getFileName().toString();
            String name = (file.endsWith(".json") ? file.substring(0, file.length() - 5) : file)
                    .replaceAll("[^A-Za-z0-9._-]", "_");
            if (name.isEmpty() || name.chars().allMatch(c -> c == '.') || !names.add(name)) {
                throw BadInputException.at("--scenario", "the scenario name '" + name + "' (from " + f + ") is used "
                        + "twice or is reserved (base, parameters): rename the patch file");
            }
            try {
                out.add(new Scenario(name, Optional.of(f), ModelPatches.readPatch(f), Optional.empty()));
            } catch (BadInputException e) {
                out.add(new Scenario(name, Optional.of(f), null, Optional.of(f + ": " + e.problems().get(0)
                        + Outcome.moreProblems(e.problems().size() - 1))));
            }
        }
        return out;
    }
}
