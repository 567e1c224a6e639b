package tetrapod.check;

import java.util.List;
import java.util.Locale;

/**
 * Bolts of ASCE 10 (3.9 and 4.3, recalled from memory of ASCE 10-97; design stresses at factored
 * loads): shear 0.62 F_ub on the root area when threads are in the shear plane, on the shank
 * otherwise; bearing 1.5 F_u d t on the connected part; end distance e1 ≥ 1.2 P/(F_u t) for the
 * force P of one bolt. One line of bolts sharing the force equally.
 */
public final class Asce10BoltCheck implements BoltCheck {

    @Override
    public List<CheckResult> check(Connection c, double force, double thickness, double fu) {
        int n = c.bolts();
        double fv = 0.62 * c.boltUltimate();                                     // ASCE 10 bolt shear stress
        double shearResistance = n * c.shearPlanes() * fv * c.rootOrShankArea();
        CheckResult shear = new CheckResult(CheckMode.BOLT_SHEAR, CheckResult.ratio(force, shearResistance),
                "ASCE 10 bolt shear 0.62 F_ub (recalled)",
                String.format(Locale.ROOT, "%d × M%.0f %s, %.1f kN per plane%s", n, c.diameter() * 1e3,
                        c.grade().jsonName(), fv * c.rootOrShankArea() / 1e3, c.assumed() ? " (assumed connection)" : ""));
        double bearingPerBolt = 1.5 * fu * c.diameter() * thickness;             // ASCE 10 bearing 1.5 F_u d t
        CheckResult bearing = new CheckResult(CheckMode.BOLT_BEARING, CheckResult.ratio(force, n * bearingPerBolt),
                "ASCE 10 bearing 1.5 F_u d t (recalled)",
                String.format(Locale.ROOT, "%.1f kN per bolt, t = %.1f mm", bearingPerBolt / 1e3, thickness * 1e3));
        double endPerBolt = c.endDistance() * fu * thickness / 1.2;              // ASCE 10 e ≥ 1.2 P/(F_u t)
        CheckResult end = new CheckResult(CheckMode.BOLT_BEARING, CheckResult.ratio(force / n, endPerBolt),
                "ASCE 10 end distance e ≥ 1.2 P/(F_u t) (recalled)",
                String.format(Locale.ROOT, "e1 = %.0f mm: %.1f kN per bolt", c.endDistance() * 1e3, endPerBolt / 1e3));
        return List.of(shear, bearing, end);
    }
}
