package tetrapod.model.spec;

import java.util.Locale;

/** The published rules members, connections and foundations are checked against. */
public enum CheckMethod {
    /** EN 1993-1-1, EN 1993-1-8 and EN 1993-3-1 (limit states, partial factors). */
    EN1993,
    /** ASCE 10 for latticed steel transmission structures (allowable-stress style). */
    ASCE10;

    public String jsonName() {
        return name().toLowerCase(Locale.ROOT);
    }
}
