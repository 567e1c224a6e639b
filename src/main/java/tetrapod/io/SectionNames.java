package tetrapod.io;

import tetrapod.common.Suggestions;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import tetrapod.model.SectionLookup;

/**
 * Checks the section names a model file uses: a name is known when the file defines it under
 * {@code userSections} or the catalogue finds it. Unknown names are reported with the nearest
 * known names, the file's own sections first.
 */
final class SectionNames {

    private static final int SUGGESTIONS = 3;

    private final List<String> userNames;
    private final SectionLookup catalogue;

    SectionNames(Collection<String> userNames, SectionLookup catalogue) {
        this.userNames = List.copyOf(userNames);
        this.catalogue = catalogue;
    }

    /** The section name at {@code path}; null (reported) when it is not text or not known. */
    String check(JsonNode node, String path, Problems problems) {
        String name = Values.text(node, path, problems);
        if (name == null || userNames.contains(name) || catalogue.find(name).isPresent()) {
            return name;
        }
        List<String> near = new ArrayList<>(Suggestions.nearest(name, userNames, SUGGESTIONS));
        for (String c : catalogue.nearest(name, SUGGESTIONS)) {
            if (near.size() < SUGGESTIONS && !near.contains(c)) {
                near.add(c);
            }
        }
        problems.add(path, "unknown section '" + name + "'; " + (near.isEmpty()
                ? "it is neither in the catalogue nor defined under userSections"
                : "nearest known: " + String.join(", ", near)));
        return null;
    }
}
