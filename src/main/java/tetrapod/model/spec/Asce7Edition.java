package tetrapod.model.spec;

/** The edition of ASCE 7 whose wind provisions are applied: their exposure constants differ. */
public enum Asce7Edition {
    ASCE_7_16("7-16"), ASCE_7_22("7-22");

    private final String jsonName;

    Asce7Edition(String jsonName) {
        this.jsonName = jsonName;
    }

    public String jsonName() {
        return jsonName;
    }
}
