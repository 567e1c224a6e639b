package tetrapod.analysis;

/** What serviceability measures of a level or an ancillary, each from the rigid-body fit of its level. */
public enum Movement {
    /** Horizontal displacement, m. */
    SWAY("sway"),
    /** Rotation about a horizontal axis, rad. */
    TILT("tilt"),
    /** Rotation about the vertical, rad. */
    TWIST("twist");

    private final String label;

    Movement(String label) {
        this.label = label;
    }

    /** The word for people and the key in results.json. */
    public String label() {
        return label;
    }
}
