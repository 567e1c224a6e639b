package tetrapod.model.spec;

/** Which partial factors for actions the default load combinations take. */
public enum ActionFactorSet {
    /** EN 1993-3-1 Annex A, by reliability class: the towers part. */
    EN1993_3_1("en1993-3-1", DesignBasis.EN),
    /** EN 1990 Annex A1 Table A1.2(B): the building factors 1.35 and 1.5. */
    EN1990("en1990", DesignBasis.EN),
    /** ASCE 7 §2.3 strength design. */
    ASCE7("asce7", DesignBasis.US);

    private final String jsonName;
    private final DesignBasis family;

    ActionFactorSet(String jsonName, DesignBasis family) {
        this.jsonName = jsonName;
        this.family = family;
    }

    public String jsonName() {
        return jsonName;
    }

    public DesignBasis family() {
        return family;
    }
}
