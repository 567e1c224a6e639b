package tetrapod.model.spec;

import java.util.Locale;

/** Whether the crossing of an X-braced pair holds a compressed diagonal out of the face's plane. */
public enum CrossingRule {
    /** Held when the other diagonal of the pair is in tension in that load case. */
    AUTO,
    /** Always held (the user has shown the crossing to be stiff enough). */
    SUPPORTED,
    /** Never held: the out-of-plane buckling length is the whole diagonal. */
    UNSUPPORTED;

    public String jsonName() {
        return name().toLowerCase(Locale.ROOT);
    }
}
