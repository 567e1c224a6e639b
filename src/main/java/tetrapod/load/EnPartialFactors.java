package tetrapod.load;

/**
 * Partial factors for actions of the EN family, dimensionless.
 *
 * @param gammaG            γ_G on the permanent action where it is unfavourable
 * @param gammaGFavourable  γ_G where it is favourable (it holds the tower down: uplift)
 * @param gammaQ            γ_Q on each variable action (wind, ice, wind on ice)
 */
public record EnPartialFactors(double gammaG, double gammaGFavourable, double gammaQ) {

    /** EN 1990 Annex A1 Table A1.2(B), recommended values (buildings): 1.35, 1.0, 1.5. */
    public static final EnPartialFactors EN1990_BUILDINGS = new EnPartialFactors(1.35, 1.0, 1.5);

    /*
     * EN 1993-3-1 Annex A Table A.1, partial factors for actions on towers and masts by reliability
     * class (recalled from memory, not read in a source; a National Annex may set other values):
     *
     *   class               3     2     1
     *   permanent, unfav.   1.2   1.1   1.0
     *   permanent, fav.     1.0   1.0   1.0
     *   variable            1.6   1.4   1.2
     */
    private static final EnPartialFactors[] ANNEX_A = {
        new EnPartialFactors(1.0, 1.0, 1.2),
        new EnPartialFactors(1.1, 1.0, 1.4),
        new EnPartialFactors(1.2, 1.0, 1.6),
    };

    /** EN 1993-3-1 Annex A Table A.1 for reliability class 1, 2 or 3 (recalled from memory). */
    public static EnPartialFactors annexA(int reliabilityClass) {
        if (reliabilityClass < 1 || reliabilityClass > 3) {
            throw new IllegalArgumentException("reliability class must be 1, 2 or 3, was " + reliabilityClass);
        }
        return ANNEX_A[reliabilityClass - 1];
    }
}
