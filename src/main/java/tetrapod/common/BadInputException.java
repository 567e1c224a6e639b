package tetrapod.common;

import java.util.List;
import java.util.stream.Collectors;

/** The input cannot be used as given. Carries every problem found, each with its location. */
public final class BadInputException extends Exception {

    private final List<Problem> problems;

    public BadInputException(List<Problem> problems) {
        super(problems.stream().map(Problem::toString).collect(Collectors.joining("; ")));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("a bad-input error needs at least one problem");
        }
        this.problems = List.copyOf(problems);
    }

    public BadInputException(Problem problem) {
        this(List.of(problem));
    }

    public static BadInputException at(String path, String message) {
        return new BadInputException(Problem.at(path, message));
    }

    public List<Problem> problems() {
        return problems;
    }
}
