package tetrapod.load;

import java.util.Objects;

/**
 * Names a load case without building its load vector: a combination and, when it has wind, an
 * azimuth (degrees; null otherwise).
 */
public record CaseKey(Combination combination, Double azimuthDeg) {

    public CaseKey {
        Objects.requireNonNull(combination, "combination");
        if (combination.hasWind() != (azimuthDeg != null)) {
            throw new IllegalArgumentException("a combination with wind needs an azimuth, one without wind none: "
                    + combination.name());
        }
    }

    /** {@code 1.35G + 1.5W@45}, {@code 1.0G}: the combination's name, and the azimuth without trailing zeros. */
    public String id() {
        return azimuthDeg == null ? combination.name() : combination.name() + "@" + degrees(azimuthDeg);
    }

    /** An azimuth as people write it: 45, 47.5, 0.1. */
    public static String degrees(double azimuthDeg) {
        return PlainNumbers.of(azimuthDeg);
    }
}
