package tetrapod.model;

import java.util.Locale;

/** What a member does in the lattice. */
public enum Role {
    LEG, DIAGONAL, HORIZONTAL, REDUNDANT, PLAN,
    /** A member of an explicit frame that has not been given a lattice role. */
    GENERAL;

    public String jsonName() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static Role fromJsonName(String name) {
        for (Role r : values()) {
            if (r.jsonName().equals(name)) {
                return r;
            }
        }
        throw new IllegalArgumentException("unknown role '" + name + "'");
    }
}
