package tetrapod.load;

import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;
import tetrapod.model.spec.LoadAction;

/**
 * A factored load combination: the factored load vector is Σ factor(action) × load(action), with
 * the wind actions taken at each azimuth of the sweep.
 *
 * @param name    e.g. {@code 1.35G + 1.5W}
 * @param factors factor per action (dimensionless); actions not listed have factor 0
 */
public record Combination(String name, Map<LoadAction, Double> factors) {

    public Combination {
        Objects.requireNonNull(name, "name");
        Map<LoadAction, Double> copy = new EnumMap<>(LoadAction.class);
        factors.forEach((a, f) -> {
            if (!Double.isFinite(f)) {
                throw new IllegalArgumentException("factor of " + a.jsonName() + " in " + name + " is not finite");
            }
            if (f != 0) {
                copy.put(a, f);
            }
        });
        factors = Map.copyOf(copy);
    }

    public double factor(LoadAction action) {
        return factors.getOrDefault(action, 0.0);
    }

    /** Whether the combination has wind in it, and so one load case per azimuth. */
    public boolean hasWind() {
        return factor(LoadAction.WIND) != 0 || factor(LoadAction.WIND_ON_ICE) != 0;
    }
}
