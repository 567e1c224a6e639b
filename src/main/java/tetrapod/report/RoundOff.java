package tetrapod.report;

/**
 * The digits of a solved vector that are round-off of the solve, left out of results.json: each
 * number is written rounded to the decimal place of {@link #RELATIVE} times the largest magnitude in
 * its vector (a case's displacements, a case's member end forces, a mode's shape). A direct solve of
 * a large tower balances its loads to a relative residual of about 1e-10 (a 50,000-DOF tower:
 * 1.3e-10, docs/performance.md), and a displacement is no more accurate than that relative to the
 * largest one, so the digits below it are noise (round-off of 1e-8 N in a bar that carries 1e5 N
 * was written as 2.3027382668880605e-08). Tetrapod's rule (issue 15: the size of results.json).
 */
final class RoundOff {

    /** The written resolution relative to the vector's largest magnitude (a power of ten at or below it). */
    static final double RELATIVE = 1e-10;
    /** Beyond ±22 decimal places a power of ten is not an exact double: such a vector is written as it is. */
    private static final int EXACT_POWERS = 22;

    private final int places;
    private final double power;

    private RoundOff(int places) {
        this.places = places;
        this.power = Math.pow(10, Math.abs(places));     // exact for |places| ≤ 22
    }

    /** The rounding for a vector whose largest magnitude is {@code largest} (≥ 0). */
    static RoundOff forLargest(double largest) {
        if (!(largest > 0) || !Double.isFinite(largest)) {
            return new RoundOff(Integer.MIN_VALUE);
        }
        int places = -(int) Math.floor(Math.log10(largest * RELATIVE));
        return new RoundOff(Math.abs(places) > EXACT_POWERS ? Integer.MIN_VALUE : places);
    }

    /**
     * {@code v} rounded to the vector's decimal place: the double nearest to that decimal, so that it
     * is written with no more digits than the decimal has; −0.0 as 0.0.
     */
    double apply(double v) {
        if (places == Integer.MIN_VALUE || v == 0 || !Double.isFinite(v)) {
            return v == 0 ? 0.0 : v;
        }
        // the quotient or product of two exact values is the double nearest to the decimal (IEEE 754)
        double rounded = places >= 0 ? Math.round(v * power) / power : Math.round(v / power) * power;
        return rounded == 0 ? 0.0 : rounded;
    }
}
