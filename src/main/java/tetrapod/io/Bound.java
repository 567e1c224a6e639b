package tetrapod.io;

/** The range a number read from the file must lie in; {@link #describe} words it for messages. */
record Bound(double min, boolean minInclusive, double max, boolean maxInclusive) {

    static final Bound ANY = new Bound(Double.NEGATIVE_INFINITY, false, Double.POSITIVE_INFINITY, false);
    static final Bound POSITIVE = new Bound(0, false, Double.POSITIVE_INFINITY, false);
    static final Bound NON_NEGATIVE = new Bound(0, true, Double.POSITIVE_INFINITY, false);
    /** 0 ≤ a < 1. */
    static final Bound FRACTION = new Bound(0, true, 1, false);

    static Bound atLeast(double min) {
        return new Bound(min, true, Double.POSITIVE_INFINITY, false);
    }

    boolean contains(double value) {
        boolean aboveMin = minInclusive ? value >= min : value > min;
        boolean belowMax = maxInclusive ? value <= max : value < max;
        return aboveMin && belowMax;
    }

    /** "> 0 m", "≥ 0 and < 1", "a finite number in MPa". */
    String describe(String unit) {
        String u = unit.isEmpty() ? "" : " " + unit;
        boolean hasMin = min != Double.NEGATIVE_INFINITY;
        boolean hasMax = max != Double.POSITIVE_INFINITY;
        if (!hasMin && !hasMax) {
            return "a finite number" + (unit.isEmpty() ? "" : " in " + unit);
        }
        String lower = hasMin ? (minInclusive ? "≥ " : "> ") + Numbers.format(min) : "";
        String upper = hasMax ? (maxInclusive ? "≤ " : "< ") + Numbers.format(max) : "";
        if (hasMin && hasMax) {
            return lower + u + " and " + upper + u;
        }
        return (hasMin ? lower : upper) + u;
    }
}
