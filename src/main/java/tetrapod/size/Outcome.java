package tetrapod.size;

/** How a sizing run ended. */
public enum Outcome {
    /** An analysis changed no group: every group has the lightest allowed section that passes. */
    CONVERGED("converged", "no group changed after the last analysis"),
    /**
     * The designs went round a cycle; each group was held at the heaviest section it had in the
     * cycle and sizing went on until no group changed.
     */
    CONVERGED_AFTER_CYCLE("convergedAfterCycle",
            "the designs cycled; each group was held at its heaviest section of the cycle, then no group changed"),
    /** The iteration limit came first: the lightest design analysed that passes is returned. */
    ITERATION_LIMIT("iterationLimit", "the iteration limit was reached before the design settled"),
    /** Some group has no allowed section that passes. */
    INFEASIBLE("infeasible", "some group has no allowed section that passes");

    private final String jsonName;
    private final String explanation;

    Outcome(String jsonName, String explanation) {
        this.jsonName = jsonName;
        this.explanation = explanation;
    }

    public String jsonName() {
        return jsonName;
    }

    public String explanation() {
        return explanation;
    }
}
