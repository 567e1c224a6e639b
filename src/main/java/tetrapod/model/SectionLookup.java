package tetrapod.model;

import java.util.List;
import java.util.Optional;

/** Finds sections by name (catalogue and user-defined). */
public interface SectionLookup {

    Optional<Section> find(String name);

    /** Up to {@code count} known names nearest to {@code name}, nearest first. */
    List<String> nearest(String name, int count);
}
