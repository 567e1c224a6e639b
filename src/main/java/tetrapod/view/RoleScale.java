package tetrapod.view;

import java.util.ArrayList;
import java.util.List;
import tetrapod.model.Role;

/** Member role: one distinct colour per role; the value is the role's ordinal. */
public record RoleScale() implements ColourScale {

    private static final int[] COLOURS = {
        0x2F3B52, // leg: dark slate
        0x2A9D8F, // diagonal: teal
        0xC98A1B, // horizontal: ochre
        0x9C8AC4, // redundant: lavender
        0x6F8F2F, // plan: olive
        0x707070, // general: grey
    };

    /** The colour of {@code role}. */
    public Rgb colour(Role role) {
        return Rgb.hex(COLOURS[role.ordinal()]);
    }

    @Override
    public Rgb colour(double value) {
        if (Double.isNaN(value) || value < 0 || value >= COLOURS.length) {
            return NO_VALUE;
        }
        return Rgb.hex(COLOURS[(int) value]);
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
