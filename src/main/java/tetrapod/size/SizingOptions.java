package tetrapod.size;

import java.util.Objects;

/**
 * How to size.
 *
 * @param target        the largest utilisation a chosen section may reach (1.0: every check just passes)
 * @param maxIterations analyses at most (each analysis of a design is one iteration)
 * @param rules         minimum sizes and the sections to choose from
 * @param start         the design the first analysis is made with
 */
public record SizingOptions(double target, int maxIterations, SizingRules rules, Start start) {

    public static final double DEFAULT_TARGET = 1.0;
    public static final int DEFAULT_MAX_ITERATIONS = 20;
    public static final SizingOptions DEFAULT = new SizingOptions(DEFAULT_TARGET, DEFAULT_MAX_ITERATIONS,
            SizingRules.DEFAULT, Start.SPEC);

    /** Where sizing starts from. */
    public enum Start {
        /** The sections the spec gives. */
        SPEC,
        /** The lightest allowed section of each group. */
        LIGHTEST,
        /** The heaviest allowed section of each group. */
        HEAVIEST
    }

    public SizingOptions {
        Objects.requireNonNull(rules, "rules");
        Objects.requireNonNull(start, "start");
        if (!(target > 0) || !Double.isFinite(target)) {
            throw new IllegalArgumentException("the target utilisation must be > 0, was " + target);
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("at least one iteration, was " + maxIterations);
        }
    }

    public SizingOptions withTarget(double value) {
        return new SizingOptions(value, maxIterations, rules, start);
    }

    public SizingOptions withMaxIterations(int value) {
        return new SizingOptions(target, value, rules, start);
    }

    public SizingOptions withRules(SizingRules value) {
        return new SizingOptions(target, maxIterations, value, start);
    }

    public SizingOptions withStart(Start value) {
        return new SizingOptions(target, maxIterations, rules, value);
    }
}
