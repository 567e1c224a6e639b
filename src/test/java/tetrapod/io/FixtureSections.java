package tetrapod.io;

import tetrapod.common.Suggestions;

import java.util.List;
import java.util.Optional;
import tetrapod.model.Section;
import tetrapod.model.SectionLookup;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;

/**
 * A small stand-in for the section catalogue: the names the example models use. The reader
 * only asks whether a name exists, so the properties are rough values for an equal angle
 * (area t(2b − t); the rest merely positive) and are never checked here.
 */
final class FixtureSections implements SectionLookup {

    static final List<String> NAMES = List.of("L50x4", "L50x5", "L60x5", "L60x6", "L65x7", "L70x6", "L70x7",
            "L75x8", "L80x8", "L90x7", "L90x8", "L90x9", "L100x8", "L100x10", "L120x10", "L120x12", "L150x10",
            "L150x12", "L150x15", "L180x18");

    @Override
    public Optional<Section> find(String name) {
        if (!NAMES.contains(name)) {
            return Optional.empty();
        }
        String[] legAndThickness = name.substring(1).split("x");
        double b = Double.parseDouble(legAndThickness[0]) * 1e-3;
        double t = Double.parseDouble(legAndThickness[1]) * 1e-3;
        double area = t * (2 * b - t);
        double i = area * b * b / 12;
        SectionProperties p = new SectionProperties(area, i, i, 1.6 * i, 0.4 * i, area * t * t / 3,
                0, 0, 1, area * 7850);
        return Optional.of(new Section(name, new SectionShape.Angle(b, b, t, t, t / 2), p));
    }

    @Override
    public List<String> nearest(String name, int count) {
        return Suggestions.nearest(name, NAMES, count);
    }
}
