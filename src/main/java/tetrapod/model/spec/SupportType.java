package tetrapod.model.spec;

import java.util.Locale;

/** How the leg bases of a generated tower are held. */
public enum SupportType {
    /** Translations held, rotations free. */
    PINNED,
    /** All six degrees of freedom held. */
    FIXED;

    public String jsonName() {
        return name().toLowerCase(Locale.ROOT);
    }
}
