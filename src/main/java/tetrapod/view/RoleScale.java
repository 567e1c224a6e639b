package tetrapod.view;

import java.util.ArrayList;
import java.util.List;
import tetrapod.model.Role;
import tetrapod.model.RoleColours;

/** Member role: one distinct colour per role; the value is the role's ordinal. */
public record RoleScale() implements ColourScale {

    /** The colour of {@code role} ({@link RoleColours}: the same in the report's charts). */
    public Rgb colour(Role role) {
        return Rgb.hex(RoleColours.rgb(role));
    }

    @Override
    public Rgb colour(double value) {
        if (Double.isNaN(value) || value < 0 || value >= Role.values().length) {
            return NO_VALUE;
        }
        return colour(Role.values()[(int) value]);
    }

    @Override
    public Legend legend() {
        List<Legend.Swatch> swatches = new ArrayList<>();
        for (Role r : Role.values()) {
            swatches.add(new Legend.Swatch(colour(r), r.jsonName()));
        }
        return new Legend("member role", List.of(), List.of(), swatches);
    }
}
