package tetrapod.model.spec;

import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;

/**
 * A factored load combination the user gave: a name and a factor per kind of load (dimensionless;
 * kinds not listed have factor 0).
 */
public record CombinationSpec(String name, Map<LoadAction, Double> factors) {

    public CombinationSpec {
        Objects.requireNonNull(name, "name");
        Map<LoadAction, Double> copy = new EnumMap<>(LoadAction.class);
        factors.forEach((action, factor) -> {
            if (factor != 0) {
                copy.put(action, factor);
            }
        });
        factors = Map.copyOf(copy);
    }

    /** The factor of {@code action}, 0 when not given. */
    public double factor(LoadAction action) {
        return factors.getOrDefault(action, 0.0);
    }
}
