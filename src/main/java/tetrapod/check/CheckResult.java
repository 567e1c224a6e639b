package tetrapod.check;

import java.util.Objects;

/**
 * One verification: demand over resistance (the utilisation; ≤ 1 passes), the mode it checks,
 * the clause of the published method it follows, and a short note with the values that decided it.
 *
 * @param utilisation demand / resistance, finite and ≥ 0 (dimensionless)
 * @param clause      e.g. "EN 1993-1-1 6.3.1.1 (6.46)"
 * @param note        e.g. "λ̄v = 1.12, χ = 0.49, curve b"; may be empty
 */
public record CheckResult(CheckMode mode, double utilisation, String clause, String note) {

    public CheckResult {
        Objects.requireNonNull(mode, "mode");
        Objects.requireNonNull(clause, "clause");
        note = note == null ? "" : note;
        if (!Double.isFinite(utilisation) || utilisation < 0) {
            throw new IllegalArgumentException("utilisation of " + mode + " must be finite and >= 0, was " + utilisation);
        }
    }

    /**
     * The utilisation shown when a demand meets no resistance at all (an edge distance leaving no
     * bearing, a footing lifted off its base, a compression above the elastic critical force in an
     * amplification factor): a finite number far above 1, never infinity or NaN.
     */
    public static final double NO_RESISTANCE = 99.0;

    public boolean passes() {
        return utilisation <= 1.0;
    }

    /** Demand over resistance, guarded: a demand of zero is utilisation 0 whatever the resistance. */
    static double ratio(double demand, double resistance) {
        if (demand <= 0) {
            return 0;
        }
        if (!(resistance > 0)) {
            throw new IllegalArgumentException("a resistance must be > 0, was " + resistance);
        }
        return demand / resistance;
    }
}
