package tetrapod.batch;

import java.nio.file.Path;
import java.util.Optional;

/**
 * A change tried on every tower: a JSON Merge Patch read from {@code file} (plain values), or, when
 * the file could not be read, the one-line reason (each of its rows is then bad input). The
 * unpatched model is the scenario {@value #BASE}.
 */
public record Scenario(String name, Optional<Path> file, Object patch, Optional<String> unreadable) {

    public static final String BASE = "base";
}
