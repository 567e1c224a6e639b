package tetrapod.check;

import java.util.Objects;
import java.util.function.Supplier;

/**
 * One verification: demand over resistance (the utilisation; ≤ 1 passes), the mode it checks,
 * the clause of the published method it follows, and a short note with the values that decided it.
 *
 * <p>A value like a record of its four parts (equal when they are). The note may be given as words
 * to make only when asked for ({@link #noted}): a sweep checks each member in full in several cases
 * and keeps the words of a few (issue 15: formatting notes that were thrown away was most of the
 * time of the checks).
 */
public final class CheckResult {

    private final CheckMode mode;
    private final double utilisation;
    private final String clause;
    private Supplier<String> words;
    private String note;

    /**
     * @param utilisation demand / resistance, finite and ≥ 0 (dimensionless)
     * @param clause      e.g. "EN 1993-1-1 6.3.1.1 (6.46)"
     * @param note        e.g. "λ̄v = 1.12, χ = 0.49, curve b"; may be empty or null (empty)
     */
    public CheckResult(CheckMode mode, double utilisation, String clause, String note) {
        this(mode, utilisation, clause, null, note == null ? "" : note);
    }

    private CheckResult(CheckMode mode, double utilisation, String clause, Supplier<String> words, String note) {
        this.mode = Objects.requireNonNull(mode, "mode");
        this.clause = Objects.requireNonNull(clause, "clause");
        if (!Double.isFinite(utilisation) || utilisation < 0) {
            throw new IllegalArgumentException("utilisation of " + mode + " must be finite and >= 0, was " + utilisation);
        }
        this.utilisation = utilisation;
        this.words = words;
        this.note = note;
    }

    /** As the constructor, with the note made by {@code words} when first asked for (from values it has captured). */
    public static CheckResult noted(CheckMode mode, double utilisation, String clause, Supplier<String> words) {
        return new CheckResult(mode, utilisation, clause, Objects.requireNonNull(words, "words"), null);
    }

    /**
     * The utilisation shown when a demand meets no resistance at all (an edge distance leaving no
     * bearing, a footing lifted off its base, a compression above the elastic critical force in an
     * amplification factor): a finite number far above 1, never infinity or NaN.
     */
    public static final double NO_RESISTANCE = 99.0;

    public CheckMode mode() {
        return mode;
    }

    public double utilisation() {
        return utilisation;
    }

    public String clause() {
        return clause;
    }

    /** The note, made now if it was given as words to make later (the same text either way). */
    public synchronized String note() {
        if (note == null) {
            String made = words.get();
            note = made == null ? "" : made;
            words = null;
        }
        return note;
    }

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

    @Override
    public boolean equals(Object o) {
        return o instanceof CheckResult c && mode == c.mode && Double.compare(utilisation, c.utilisation) == 0
                && clause.equals(c.clause) && note().equals(c.note());
    }

    @Override
    public int hashCode() {
        return Objects.hash(mode, utilisation, clause, note());
    }

    @Override
    public String toString() {
        return "CheckResult[mode=" + mode + ", utilisation=" + utilisation + ", clause=" + clause + ", note=" + note() + "]";
    }
}
