package tetrapod.load;

/**
 * The probability factor c_prob of EN 1991-1-4:2005 4.2(2)P Note 2: the factor on the basic wind
 * velocity v_b (whose annual probability of exceedance is 0.02, a 50-year return period) for an
 * annual probability of exceedance p,
 * <pre>  c_prob = ( (1 − K ln(−ln(1 − p))) / (1 − K ln(−ln(0.98))) )^n</pre>
 * with the recommended values K = 0.2 (shape parameter) and n = 0.5 (exponent); a National Annex
 * may give others (then give c_prob itself as {@code serviceability.wind.probabilityFactor}).
 */
public final class En1991ProbabilityFactor {

    /** Shape parameter K, the recommended value of 4.2 Note 2. */
    public static final double K = 0.2;
    /** Exponent n, the recommended value of 4.2 Note 2. */
    public static final double N = 0.5;
    /** The annual probability of exceedance of the characteristic wind (4.2 (1)). */
    static final double P_CHARACTERISTIC = 0.02;

    private En1991ProbabilityFactor() { }

    /** c_prob for an annual probability of exceedance 0 < p < 1 (EN 1991-1-4 (4.2)). */
    public static double ofProbability(double p) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("the annual probability of exceedance must lie between 0 and 1, was " + p);
        }
        // EN 1991-1-4 4.2(2)P Note 2, (4.2)
        double numerator = 1 - K * Math.log(-Math.log(1 - p));
        double denominator = 1 - K * Math.log(-Math.log(1 - P_CHARACTERISTIC));
        return Math.pow(numerator / denominator, N);
    }

    /** c_prob for a return period of T years, p = 1/T (so that 50 years gives 1 exactly). */
    public static double ofReturnPeriod(double years) {
        if (!(years > 1)) {
            throw new IllegalArgumentException("the return period must be more than 1 year, was " + years);
        }
        return ofProbability(1 / years);
    }
}
