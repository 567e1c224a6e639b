package tetrapod.model.spec;

import java.util.Locale;

/** Which leg of an angle its end bolts pass through. */
public enum ConnectedLeg {
    /** The longer leg (either leg of an equal angle). */
    LONG,
    /** The shorter leg of an unequal angle. */
    SHORT;

    public String jsonName() {
        return name().toLowerCase(Locale.ROOT);
    }
}
