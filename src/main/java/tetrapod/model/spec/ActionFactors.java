package tetrapod.model.spec;

import java.util.Objects;

/**
 * The partial factors for actions of the default load combinations.
 *
 * @param set              which published factors
 * @param reliabilityClass EN 1993-3-1 2.1.2 reliability class, 1, 2 or 3 (used by
 *                         {@link ActionFactorSet#EN1993_3_1} only; 2 otherwise)
 */
public record ActionFactors(ActionFactorSet set, int reliabilityClass) {

    /** The reliability class when the model gives none (EN 1993-3-1 Annex A, the middle class). */
    public static final int DEFAULT_RELIABILITY_CLASS = 2;

    public ActionFactors {
        Objects.requireNonNull(set, "set");
        if (reliabilityClass < 1 || reliabilityClass > 3) {
            throw new IllegalArgumentException("reliability class must be 1, 2 or 3, was " + reliabilityClass);
        }
    }

    /** The default of a family: EN 1993-3-1 Annex A class 2, or ASCE 7. */
    public static ActionFactors defaultFor(DesignBasis basis) {
        return new ActionFactors(basis == DesignBasis.US ? ActionFactorSet.ASCE7 : ActionFactorSet.EN1993_3_1,
                DEFAULT_RELIABILITY_CLASS);
    }
}
