package tetrapod.model.spec;

import java.util.Locale;

/** Bracing pattern of a segment's faces. */
public enum Bracing {
    /** Two crossing diagonals per panel. */
    X,
    /** Two diagonals per panel rising from the bottom corners to the middle of the top horizontal. */
    K,
    /** One diagonal per panel, its direction alternating up the face. */
    SINGLE;

    public String jsonName() {
        return name().toLowerCase(Locale.ROOT);
    }
}
