package tetrapod.model.spec;

/** Exposure categories of ASCE 7 §26.7.3. */
public enum Exposure {
    B, C, D;

    public String jsonName() {
        return name();
    }
}
