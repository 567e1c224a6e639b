package tetrapod.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * The promise of the command line on any input (issue 13): exit 0, 1, 2 or 3 (4 is an internal
 * error, 5 to 7 are not the input's fault here); no stack trace; every exit-2 line one problem
 * with its path and its line in the file (a problem of the whole file, at {@code $}, may have
 * none); no NaN or Infinity in any file written.
 */
final class ExitContract {

    static final Set<Integer> ALLOWED = Set.of(ExitCode.DONE, ExitCode.OVERSTRESS, ExitCode.BAD_INPUT, ExitCode.UNSTABLE);
    private static final Pattern PROBLEM_LINE = Pattern.compile("error: (\\$: .+|\\S.*: .+ \\(line \\d+\\))");
    private static final Pattern NOT_A_NUMBER = Pattern.compile("(?<![A-Za-z0-9+/])(NaN|-?Infinity)(?![A-Za-z0-9+/])");
    private static final Pattern EMBEDDED_PICTURE = Pattern.compile("data:image/png;base64,[A-Za-z0-9+/=]+");

    private ExitContract() { }

    /** What {@code run} broke of the contract, if anything; {@code outputs} is the folder it wrote (or null). */
    static Optional<String> violation(CliRun run, Path outputs) throws IOException {
        List<String> broken = new ArrayList<>();
        if (!ALLOWED.contains(run.exitCode())) {
            broken.add("exit " + run.exitCode());
        }
        String all = run.out() + run.err();
        if (all.contains("\tat ") || all.contains("    at ") || all.contains("Exception in thread")) {
            broken.add("stack trace");
        }
        if (run.exitCode() == ExitCode.BAD_INPUT) {
            run.err().lines().filter(l -> !PROBLEM_LINE.matcher(l).matches()).findFirst()
                    .ifPresent(l -> broken.add("not a one-line problem with its path and line: " + l));
            if (run.err().isBlank()) {
                broken.add("exit 2 without a message");
            }
        }
        if (outputs != null && Files.isDirectory(outputs)) {
            try (Stream<Path> files = Files.walk(outputs)) {
                for (Path f : files.filter(Files::isRegularFile).toList()) {
                    String name = f.getFileName().toString();
                    if (name.endsWith(".json") || name.endsWith(".csv") || name.endsWith(".html")) {
                        String text = EMBEDDED_PICTURE.matcher(Files.readString(f)).replaceAll("");
                        if (NOT_A_NUMBER.matcher(text).find()) {
                            broken.add("NaN or Infinity in " + name);
                        }
                    }
                }
            }
        }
        if (broken.isEmpty()) {
            return Optional.empty();
        }
        String firstErr = run.err().lines().findFirst().orElse("");
        return Optional.of(String.join(", ", broken) + " | first error line: " + firstErr);
    }
}
