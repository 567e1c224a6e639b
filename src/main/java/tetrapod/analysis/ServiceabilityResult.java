package tetrapod.analysis;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import tetrapod.load.ServiceWind;

/**
 * How far the tower moves under the serviceability combination, enveloped over every azimuth of
 * the sweep: each panel level and each ancillary, beside its limits.
 *
 * @param combination the combination's name, e.g. {@code 1.0G + 1.0Ws}
 * @param wind        the service wind, or null when the model has no wind
 * @param levels      every panel level, bottom to top
 * @param ancillaries every ancillary, in the file's order
 */
public record ServiceabilityResult(String combination, ServiceWind wind, List<ServiceMotion.Level> levels,
                                   List<ServiceMotion.Ancillary> ancillaries) {

    public ServiceabilityResult {
        Objects.requireNonNull(combination, "combination");
        levels = List.copyOf(levels);
        ancillaries = List.copyOf(ancillaries);
    }

    public Optional<ServiceWind> serviceWind() {
        return Optional.ofNullable(wind);
    }

    /** Whether any level or ancillary has a limit. */
    public boolean hasLimits() {
        return levels.stream().anyMatch(l -> l.limits().any()) || ancillaries.stream().anyMatch(a -> a.limits().any());
    }

    /** Whether every limit given is met. */
    public boolean allMet() {
        return levels.stream().allMatch(ServiceMotion::allMet) && ancillaries.stream().allMatch(ServiceMotion::allMet);
    }

    /** The top level. */
    public ServiceMotion.Level top() {
        return levels.get(levels.size() - 1);
    }
}
