package tetrapod.check;

import java.util.List;

/** A published method for the bolts of a lapped end connection carrying a member's axial force. */
public sealed interface BoltCheck permits En1993BoltCheck, Asce10BoltCheck {

    /**
     * Bolt shear, bearing on the connected part and the method's spacing rules.
     *
     * @param connection the bolts (at least one)
     * @param force      the member's axial force carried by the bolt line, N (≥ 0)
     * @param thickness  thickness of the connected part the bolts bear on, m
     * @param fu         ultimate strength of the connected part, Pa
     */
    List<CheckResult> check(Connection connection, double force, double thickness, double fu);
}
