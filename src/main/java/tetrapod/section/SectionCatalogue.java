package tetrapod.section;

import tetrapod.common.Suggestions;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tetrapod.common.BadInputException;
import tetrapod.common.Units;
import tetrapod.model.Section;
import tetrapod.model.SectionLookup;
import tetrapod.model.SectionShape;
import tetrapod.model.spec.UserSectionSpec;

/**
 * An immutable set of named sections: the EN 10056-1 angle range ({@link #standard()}), any round
 * tube named {@code CHS<D>x<t>} (mm), and user sections added with {@link #with}, which shadow
 * catalogue sections of the same name. Names ignore case and spaces; {@code L90x90x8} finds
 * {@code L90x8}. Every angle's properties are computed from its dimensions ({@link AngleProperties}).
 */
public final class SectionCatalogue implements SectionLookup {

    private static final SectionCatalogue STANDARD = new SectionCatalogue(AngleSizes.sections());

    /** Sections by lookup key, in {@link #names()} order. */
    private final Map<String, Section> byKey;

    private SectionCatalogue(List<Section> sections) {
        List<Section> ordered = new ArrayList<>(sections);
        ordered.sort(Comparator.comparingDouble(Section::massPerMetre).thenComparing(Section::name));
        Map<String, Section> map = new LinkedHashMap<>();
        for (Section s : ordered) {
            map.put(SectionNames.key(s.name()), s);
        }
        this.byKey = Collections.unmodifiableMap(map);
    }

    /** The EN 10056-1 equal and unequal angles from L40x4 to L250x35 (and every CHS by name). */
    public static SectionCatalogue standard() {
        return STANDARD;
    }

    /**
     * A catalogue holding this one's sections plus {@code userSections} (name → spec in mm, cm², cm⁴);
     * a user section replaces a section of the same name. This catalogue is not changed.
     *
     * @throws BadInputException every problem found, at {@code userSections.<NAME>.<key>}
     */
    public SectionCatalogue with(Map<String, ? extends UserSectionSpec> userSections) throws BadInputException {
        List<Section> user = UserSections.build(userSections);
        Map<String, Section> merged = new LinkedHashMap<>(byKey);
        for (Section s : user) {
            merged.put(SectionNames.key(s.name()), s);
        }
        return new SectionCatalogue(new ArrayList<>(merged.values()));
    }

    @Override
    public Optional<Section> find(String name) {
        if (name == null || name.isBlank()) {
            return Optional.empty();
        }
        Section known = byKey.get(SectionNames.key(name));
        if (known != null) {
            return Optional.of(known);
        }
        return SectionNames.tubeSize(name)
                .filter(size -> size.t() > 0 && size.d() > 2 * size.t())
                .map(SectionCatalogue::tube);
    }

    /**
     * The section named {@code name}.
     *
     * @param path where the name stands in the model file, e.g. {@code segments[0].sections.leg}
     * @throws BadInputException when there is no such section, with the nearest names
     */
    public Section require(String name, String path) throws BadInputException {
        Optional<Section> found = find(name);
        if (found.isPresent()) {
            return found.get();
        }
        if (name != null && SectionNames.tubeSize(name).isPresent()) {
            throw BadInputException.at(path, "tube '" + name + "' needs outside diameter D > 2t > 0 "
                    + "(CHS<D>x<t>, both in mm)");
        }
        List<String> near = nearest(name, 3);
        throw BadInputException.at(path, "unknown section '" + name + "'"
                + (near.isEmpty() ? "" : "; did you mean " + String.join(", ", near) + "?")
                + " (angles as L90x8 or L100x65x7, tubes as CHS<D>x<t> in mm, or a user section)");
    }

    @Override
    public List<String> nearest(String name, int count) {
        return Suggestions.closest(name, names(), count);
    }

    /** Every named section (tubes only when added as user sections), lightest first, then by name. */
    public List<String> names() {
        return byKey.values().stream().map(Section::name).toList();
    }

    private static Section tube(SectionNames.TubeSize size) {
        var shape = new SectionShape.Tube(size.d() * Units.MM, size.t() * Units.MM);
        return new Section(SectionNames.tube(size), shape, TubeProperties.of(shape));
    }
}
