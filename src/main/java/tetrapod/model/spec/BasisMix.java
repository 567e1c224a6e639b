package tetrapod.model.spec;

/**
 * One value of a model that belongs to the other family than the model's design basis.
 *
 * @param key    where it is in the model file, e.g. {@code checks.method}
 * @param family the family of the rule the value names
 * @param rule   the rule, as a reader names it, e.g. {@code ASCE 10 member and bolt checks}
 */
public record BasisMix(String key, DesignBasis family, String rule) {

    /** One line: {@code checks.method: ASCE 10 member and bolt checks (US) in a model of basis en}. */
    public String describe(DesignBasis basis) {
        return key + ": " + rule + " (" + family.jsonName() + ") in a model of basis " + basis.jsonName();
    }
}
