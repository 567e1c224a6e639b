package tetrapod.model.spec;

import java.util.Objects;

/** How members, connections and foundations are checked. */
public record ChecksSpec(CheckMethod method) {

    public static final ChecksSpec DEFAULT = new ChecksSpec(CheckMethod.EN1993);

    public ChecksSpec {
        Objects.requireNonNull(method, "method");
    }
}
