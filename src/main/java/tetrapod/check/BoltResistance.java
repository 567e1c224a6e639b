package tetrapod.check;

import java.util.List;

/**
 * The resistances of one bolt line by one method ({@link BoltCheck}), for any axial force:
 * {@link #utilisation} gives the numbers alone, {@link #check} the checks with their notes.
 */
public sealed interface BoltResistance permits En1993BoltCheck.Line, Asce10BoltCheck.Line {

    /**
     * The largest ratio of the strength checks (shear, bearing) for {@code force}: the
     * utilisation {@link #check} gives to its governing strength check, to the last bit.
     *
     * @param force the member's axial force carried by the bolt line, N (≥ 0)
     */
    double utilisation(double force);

    /** Bolt shear, bearing on the connected part and the method's spacing rules, for {@code force} (N, ≥ 0). */
    List<CheckResult> check(double force);
}
