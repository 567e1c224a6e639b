package tetrapod.model;

/** How the members are idealised for analysis. */
public enum Idealisation {
    /** Pin-jointed: three translations per node, every member axial only. */
    TRUSS,
    /** Six degrees of freedom per node; legs and members marked continuous are beam-columns. */
    FRAME;

    public String jsonName() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
