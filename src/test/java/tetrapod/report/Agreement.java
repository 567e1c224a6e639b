package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * How far reported values lie from reference values, in the max norm relative to the reference,
 * kept apart for two kinds of one quantity (kind 0: translations or forces; kind 1: rotations or
 * moments), whose units differ: max |reference − reported| ≤ tolerance × max |reference| per kind.
 */
final class Agreement {

    private final double[] largest = new double[2];
    private final double[] difference = new double[2];

    /** Adds one pair of values of {@code kind} (0 or 1). */
    void add(int kind, double reference, double reported) {
        largest[kind] = Math.max(largest[kind], Math.abs(reference));
        difference[kind] = Math.max(difference[kind], Math.abs(reference - reported));
    }

    /** max |reference − reported| / max |reference| of {@code kind}; 0 when both are all zero. */
    double relative(int kind) {
        return difference[kind] == 0 ? 0 : difference[kind] / largest[kind];
    }

    void assertWithin(double tolerance, String what) {
        for (int kind = 0; kind < 2; kind++) {
            assertTrue(difference[kind] <= tolerance * largest[kind], what + (kind == 0 ? " (forces/translations)" : " (moments/rotations)")
                    + ": max difference " + difference[kind] + " against max reference " + largest[kind]);
        }
    }
}
