package tetrapod.batch;

import java.nio.file.Path;
import java.util.Optional;

/** The analysis of one model file as {@code analyze} does it; never throws: every end is an {@link Outcome}. */
@FunctionalInterface
public interface TowerJob {

    /**
     * Analyses {@code model}; when {@code reportFolder} is given, writes there every output that
     * {@code analyze} writes (its path relative to the run's folder is {@code reportLink}).
     */
    Outcome analyse(Path model, Optional<Path> reportFolder, String reportLink);
}
