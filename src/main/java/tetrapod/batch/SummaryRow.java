package tetrapod.batch;

/**
 * One tower × scenario of a fleet run: the model as the manifest names it, the scenario, how its
 * analysis ended, and the change of its largest member utilisation from the same tower's base
 * scenario (null when either has none).
 */
public record SummaryRow(String towerId, String model, String scenario, Outcome outcome, Double changeFromBase) {

    public Double maxUtilisation() {
        return outcome.figures() == null ? null : outcome.figures().maxUtilisation();
    }
}
