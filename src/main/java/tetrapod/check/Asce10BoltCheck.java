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
    public Line resistance(Connection c, double thickness, double fu) {
        int n = c.bolts();
        double fv = 0.62 * c.boltUltimate();                                     // ASCE 10 bolt shear stress
        double shearResistance = n * c.shearPlanes() * fv * c.rootOrShankArea();
        double bearingPerBolt = 1.5 * fu * c.diameter() * thickness;             // ASCE 10 bearing 1.5 F_u d t
        double endPerBolt = c.endDistance() * fu * thickness / 1.2;              // ASCE 10 e ≥ 1.2 P/(F_u t)
        return new Line(c, thickness, fv, shearResistance, bearingPerBolt, n * bearingPerBolt, endPerBolt);
    }

    /**
     * One bolt line's numbers.
     *
     * @param fv                allowed shear stress, Pa
     * @param shearResistance   N
     * @param bearingPerBolt    N
     * @param bearingResistance n × bearing per bolt, N
     * @param endPerBolt        the force one bolt may carry by its end distance, N
     */
    record Line(Connection c, double thickness, double fv, double shearResistance, double bearingPerBolt,
                double bearingResistance, double endPerBolt) implements BoltResistance {

        private double shear(double force) {
            return CheckResult.ratio(force, shearResistance);
        }

        private double bearing(double force) {
            return CheckResult.ratio(force, bearingResistance);
        }

        private double end(double force) {
            return CheckResult.ratio(force / c.bolts(), endPerBolt);
        }

        @Override
        public double utilisation(double force) {
            return Math.max(Math.max(shear(force), bearing(force)), end(force));
        }

        @Override
        public List<CheckResult> check(double force) {
            CheckResult shear = new CheckResult(CheckMode.BOLT_SHEAR, shear(force),
                    "ASCE 10 bolt shear 0.62 F_ub (recalled)",
                    String.format(Locale.ROOT, "%d × M%.0f %s, %.1f kN per plane%s", c.bolts(), c.diameter() * 1e3,
                            c.grade().jsonName(), fv * c.rootOrShankArea() / 1e3, c.assumed() ? " (assumed connection)" : ""));
            CheckResult bearing = new CheckResult(CheckMode.BOLT_BEARING, bearing(force),
                    "ASCE 10 bearing 1.5 F_u d t (recalled)",
                    String.format(Locale.ROOT, "%.1f kN per bolt, t = %.1f mm", bearingPerBolt / 1e3, thickness * 1e3));
            CheckResult end = new CheckResult(CheckMode.BOLT_BEARING, end(force),
                    "ASCE 10 end distance e ≥ 1.2 P/(F_u t) (recalled)",
                    String.format(Locale.ROOT, "e1 = %.0f mm: %.1f kN per bolt", c.endDistance() * 1e3, endPerBolt / 1e3));
            return List.of(shear, bearing, end);
        }
    }
}
