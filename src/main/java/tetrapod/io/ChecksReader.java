package tetrapod.io;

import java.util.List;
import tetrapod.model.spec.CheckMethod;
import tetrapod.model.spec.ChecksSpec;

/** Reads {@code checks}: which published rules members, connections and foundations are checked against. */
final class ChecksReader {

    static final List<String> CHECKS_KEYS = List.of("method");

    private final Problems problems;

    ChecksReader(Problems problems) {
        this.problems = problems;
    }

    /** The checks, or null (reported). */
    ChecksSpec read(Fields checks) {
        int before = problems.count();
        checks.allowOnly(CHECKS_KEYS);
        CheckMethod method = Choices.CHECK_METHOD.optional(checks, "method", ChecksSpec.DEFAULT.method());
        return problems.count() == before ? new ChecksSpec(method) : null;
    }
}
