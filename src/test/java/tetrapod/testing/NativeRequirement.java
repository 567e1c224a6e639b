package tetrapod.testing;

import static org.junit.jupiter.api.Assertions.fail;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.function.Supplier;
import org.junit.jupiter.api.extension.BeforeAllCallback;
import org.junit.jupiter.api.extension.ConditionEvaluationResult;
import org.junit.jupiter.api.extension.ExecutionCondition;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * What a test class needs beyond Java and Maven (a browser, an OpenGL library), probed once when
 * the class is about to run. Present: the class runs. Missing: the class is skipped, with one line
 * on the console naming what is missing and the Debian packages that provide it; or, when the
 * environment variable {@value #VARIABLE} is set (CI sets it), the class fails with that line, so
 * that nothing is skipped there unnoticed.
 *
 * <p>Register it on a static field of the test class:
 * {@code @RegisterExtension static final NativeRequirement BROWSER = NativeRequirement.executable(...)}.
 */
public final class NativeRequirement implements ExecutionCondition, BeforeAllCallback {

    /** Set to anything but empty or {@code 0}, a missing requirement fails its tests instead of skipping them. */
    public static final String VARIABLE = "TETRAPOD_REQUIRE_NATIVE";

    /** What becomes of the tests. */
    enum Verdict { RUN, SKIP, FAIL }

    /** The verdict and the line that explains it. */
    record Decision(Verdict verdict, String message) { }

    private final String packages;
    private final Supplier<Optional<String>> probe;
    private Optional<String> missing;

    private NativeRequirement(String packages, Supplier<Optional<String>> probe) {
        this.packages = packages;
        this.probe = probe;
    }

    /** Needs the executable file {@code path}, which the Debian packages {@code packages} install. */
    public static NativeRequirement executable(Path path, String packages) {
        return probed(packages, () -> Files.isExecutable(path) ? Optional.empty() : Optional.of(path + " is missing"));
    }

    /**
     * Needs what {@code probe} looks for, which the Debian packages {@code packages} install; the
     * probe returns nothing when it is there, else what is missing.
     */
    public static NativeRequirement probed(String packages, Supplier<Optional<String>> probe) {
        return new NativeRequirement(packages, probe);
    }

    /** The decision when {@value #VARIABLE} has the value {@code variable} (null when unset). */
    Decision decide(String variable) {
        Optional<String> why = missing();
        if (why.isEmpty()) {
            return new Decision(Verdict.RUN, "present");
        }
        String line = why.get() + " (Debian: sudo apt-get install " + packages + ")";
        boolean required = variable != null && !variable.isBlank() && !variable.strip().equals("0");
        return required ? new Decision(Verdict.FAIL, line + "; " + VARIABLE + " is set, so this is a failure")
                : new Decision(Verdict.SKIP, line + "; set " + VARIABLE + "=1 to fail instead of skipping");
    }

    private synchronized Optional<String> missing() {
        if (missing == null) {
            missing = probe.get();
        }
        return missing;
    }

    @Override
    public ConditionEvaluationResult evaluateExecutionCondition(ExtensionContext context) {
        if (context.getTestMethod().isPresent()) {
            return ConditionEvaluationResult.enabled("judged for the whole class");
        }
        Decision d = decide(System.getenv(VARIABLE));
        if (d.verdict() != Verdict.SKIP) {
            return ConditionEvaluationResult.enabled(d.message());
        }
        // surefire counts a skipped class but does not print why: say it on the console
        System.err.println("SKIPPED " + context.getDisplayName() + ": " + d.message());
        return ConditionEvaluationResult.disabled(d.message());
    }

    @Override
    public void beforeAll(ExtensionContext context) {
        Decision d = decide(System.getenv(VARIABLE));
        if (d.verdict() == Verdict.FAIL) {
            fail(d.message());
        }
    }
}
