package tetrapod.model;

/**
 * The face of a four-leg tower a member lies in, named by the face's outward normal.
 * Legs (shared by two faces), plan bracing and members of explicit frames have {@link #NONE}.
 */
public enum Face {
    X_PLUS("+x"), Y_PLUS("+y"), X_MINUS("-x"), Y_MINUS("-y"), NONE("none");

    private final String label;

    Face(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
