package tetrapod.check;

/** A published method for the bolts of a lapped end connection carrying a member's axial force. */
public sealed interface BoltCheck permits En1993BoltCheck, Asce10BoltCheck {

    /**
     * The bolt line's resistances (shear, bearing on the connected part) and the method's spacing
     * rules, computed once for any force.
     *
     * @param connection the bolts (at least one)
     * @param thickness  thickness of the connected part the bolts bear on, m
     * @param fu         ultimate strength of the connected part, Pa
     */
    BoltResistance resistance(Connection connection, double thickness, double fu);
}
