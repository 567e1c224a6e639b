package tetrapod.model.spec;

import java.util.Locale;

/** The kinds of load a combination factors. */
public enum LoadAction {
    /** Permanent: the steelwork's self-weight with the connection allowance, and the ancillaries' weight. */
    DEAD("dead"),
    /** Wind on the bare tower and its ancillaries. */
    WIND("wind"),
    /** Weight of the ice on members and ancillaries. */
    ICE("ice"),
    /** Wind on the iced tower and ancillaries, at the wind speed that comes with ice. */
    WIND_ON_ICE("windOnIce"),
    /** The nodal loads given in the file. */
    NODAL("nodal");

    private final String jsonName;

    LoadAction(String jsonName) {
        this.jsonName = jsonName;
    }

    public String jsonName() {
        return jsonName;
    }

    public static LoadAction fromJsonName(String name) {
        for (LoadAction a : values()) {
            if (a.jsonName.equals(name) || a.name().toLowerCase(Locale.ROOT).equals(name)) {
                return a;
            }
        }
        throw new IllegalArgumentException("unknown load action '" + name + "'");
    }
}
