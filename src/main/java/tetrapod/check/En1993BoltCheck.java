package tetrapod.check;

import java.util.List;
import java.util.Locale;
import tetrapod.model.spec.PartialFactors;

/**
 * Bolts in shear and bearing, EN 1993-1-8 Table 3.4, for one line of n bolts along the force in
 * a lapped joint (category A, bearing type). The group resistance is n times the smallest bolt
 * resistance (EN 1993-1-8 3.7 (1), the safe side of the rule). Every bolt is an edge bolt across
 * the force (one line), bearing on the member's own thickness (gusset plates are not modelled).
 */
public final class En1993BoltCheck implements BoltCheck {

    private final PartialFactors factors;

    public En1993BoltCheck(PartialFactors factors) {
        this.factors = factors;
    }

    @Override
    public Line resistance(Connection c, double thickness, double fu) {
        int n = c.bolts();
        double fub = c.boltUltimate();
        double alphaV = c.threadsInShearPlane() ? BoltStrengths.alphaVThreads(c.grade()) : 0.6;   // EN 1993-1-8 Table 3.4
        double fvRd = alphaV * fub * c.shearArea() / factors.gammaM2();                            // EN 1993-1-8 Table 3.4, F_v,Rd
        double shearResistance = n * c.shearPlanes() * fvRd;

        double d = c.diameter();
        double d0 = c.holeDiameter();
        double k1 = Math.min(2.8 * c.edgeDistance() / d0 - 1.7, 2.5);                             // EN 1993-1-8 Table 3.4, edge bolts
        double alphaEnd = c.endDistance() / (3 * d0);                                               // Table 3.4, end bolts
        double alphaInner = c.pitch() / (3 * d0) - 0.25;                                            // Table 3.4, inner bolts
        double alphaD = n >= 2 ? Math.min(alphaEnd, alphaInner) : alphaEnd;
        double alphaB = Math.min(Math.min(alphaD, fub / fu), 1.0);                                  // Table 3.4, α_b
        double fbRd = Math.max(k1, 0) * alphaB * fu * d * thickness / factors.gammaM2();            // Table 3.4, F_b,Rd
        boolean lapLimit = false;
        if (n == 1) {
            double cap = 1.5 * fu * d * thickness / factors.gammaM2();                             // EN 1993-1-8 3.6.1 (10)
            if (cap < fbRd) {
                fbRd = cap;
                lapLimit = true;
            }
        }
        double spacing = Math.max(1.2 * d0 / c.endDistance(), 1.2 * d0 / c.edgeDistance());        // EN 1993-1-8 Table 3.3
        if (n >= 2) {
            spacing = Math.max(spacing, 2.2 * d0 / c.pitch());                                      // EN 1993-1-8 Table 3.3
        }
        return new Line(c, thickness, fvRd, shearResistance, k1, alphaB, fbRd, n * fbRd, lapLimit, spacing);
    }

    /**
     * One bolt line's numbers.
     *
     * @param fvRd            F_v,Rd per shear plane, N
     * @param shearResistance n × planes × F_v,Rd, N
     * @param fbRd            F_b,Rd per bolt, N
     * @param bearingResistance n × F_b,Rd, N
     * @param lapLimit        a single bolt held to 1.5 f_u d t/γM2 (3.6.1 (10))
     * @param spacing         the largest ratio of a minimum distance to the distance given
     */
    record Line(Connection c, double thickness, double fvRd, double shearResistance, double k1, double alphaB,
                double fbRd, double bearingResistance, boolean lapLimit, double spacing) implements BoltResistance {

        private double shear(double force) {
            return CheckResult.ratio(force, shearResistance);
        }

        private double bearing(double force) {
            return fbRd > 0 ? CheckResult.ratio(force, bearingResistance) : (force > 0 ? CheckResult.NO_RESISTANCE : 0);
        }

        @Override
        public double utilisation(double force) {
            return Math.max(shear(force), bearing(force));
        }

        @Override
        public List<CheckResult> check(double force) {
            CheckResult shear = CheckResult.noted(CheckMode.BOLT_SHEAR, shear(force),
                    "EN 1993-1-8 3.6.1, Table 3.4 (F_v,Rd)",
                    () -> String.format(Locale.ROOT, "%d × M%.0f %s, F_v,Rd = %.1f kN per plane%s", c.bolts(), c.diameter() * 1e3,
                            c.grade().jsonName(), fvRd / 1e3, c.assumed() ? " (assumed connection)" : ""));
            CheckResult bearing = CheckResult.noted(CheckMode.BOLT_BEARING, bearing(force),
                    "EN 1993-1-8 3.6.1, Table 3.4 (F_b,Rd)",
                    () -> String.format(Locale.ROOT, "k1 = %.3f, α_b = %.3f, F_b,Rd = %.1f kN per bolt, t = %.1f mm%s", k1, alphaB,
                            fbRd / 1e3, thickness * 1e3,
                            lapLimit ? ", single-bolt lap limit 1.5 f_u d t/γM2 (3.6.1 (10))" : ""));
            CheckResult detailing = CheckResult.noted(CheckMode.BOLT_SPACING, spacing,
                    "EN 1993-1-8 3.5, Table 3.3 (minimum e1, e2 ≥ 1.2 d0, p1 ≥ 2.2 d0)",
                    () -> String.format(Locale.ROOT, "d0 = %.0f mm, e1 = %.0f, e2 = %.0f, p1 = %.0f mm", c.holeDiameter() * 1e3,
                            c.endDistance() * 1e3, c.edgeDistance() * 1e3, c.pitch() * 1e3));
            return List.of(shear, bearing, detailing);
        }
    }
}
