package tetrapod.model.spec;

import java.util.Locale;

/** Which panel levels of a segment carry horizontal members. */
public enum Horizontals {
    /** Every panel level of the segment, its bottom and top included. */
    ALL,
    /** Only the segment's bottom and top levels. */
    ENDS,
    /** None. */
    NONE;

    public String jsonName() {
        return name().toLowerCase(Locale.ROOT);
    }
}
