package tetrapod.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;

/**
 * Lines for problems found after reading (generating the geometry, forming the loads), which
 * know their JSON path but not where it is in the file: the line of the value at the path, or of
 * its nearest enclosing value.
 */
public final class ProblemLines {

    private ProblemLines() { }

    /**
     * {@code e}'s problems, each without a line given the line of its path in {@code modelFile}.
     * When the file cannot be read again the problems are returned as they are.
     */
    public static BadInputException located(Path modelFile, BadInputException e) {
        JsonLocations parsed;
        try {
            parsed = JsonLocations.parse(TextFiles.readUtf8(modelFile));
        } catch (BadInputException unreadable) {
            return e;
        }
        List<Problem> out = new ArrayList<>();
        for (Problem p : e.problems()) {
            String path = p.path().startsWith("$.") ? p.path().substring(2) : p.path().equals("$") ? "" : p.path();
            out.add(p.line() > 0 ? p : p.withLine(parsed.line(path)));
        }
        return new BadInputException(out);
    }
}
