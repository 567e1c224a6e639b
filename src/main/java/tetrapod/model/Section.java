package tetrapod.model;

import java.util.Objects;

/** A named cross-section: its shape and its properties. */
public record Section(String name, SectionShape shape, SectionProperties properties) {
    public Section {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(shape, "shape");
        Objects.requireNonNull(properties, "properties");
    }

    public double area() {
        return properties.area();
    }

    public double massPerMetre() {
        return properties.massPerMetre();
    }
}
