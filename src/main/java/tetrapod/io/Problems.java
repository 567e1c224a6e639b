package tetrapod.io;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;

/** The problems found while reading one file, each placed on its line. One per read; not shared. */
final class Problems {

    private final JsonLocations locations;
    private final List<Problem> found = new ArrayList<>();

    Problems(JsonLocations locations) {
        this.locations = locations;
    }

    /** A problem at {@code path}, on the line of that value (or of its nearest enclosing value). */
    void add(String path, String message) {
        found.add(new Problem(path, locations.line(path), message));
    }

    void add(Problem problem) {
        found.add(problem);
    }

    int count() {
        return found.size();
    }

    /** Throws when anything was found: every problem, in file order (those without a line last). */
    void throwIfAny() throws BadInputException {
        if (!found.isEmpty()) {
            List<Problem> ordered = new ArrayList<>(found);
            ordered.sort(Comparator.comparingInt((Problem p) -> p.line() > 0 ? p.line() : Integer.MAX_VALUE));
            throw new BadInputException(ordered);
        }
    }
}
