package tetrapod.load;

import java.math.BigDecimal;
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
        BigDecimal d = BigDecimal.valueOf(Math.round(azimuthDeg * 1e9) / 1e9).stripTrailingZeros();
        return d.scale() < 0 ? d.setScale(0).toPlainString() : d.toPlainString();
    }
}
