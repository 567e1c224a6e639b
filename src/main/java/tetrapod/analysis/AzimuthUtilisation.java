package tetrapod.analysis;

import java.util.Objects;

/**
 * The largest member utilisation at one wind azimuth of the sweep, over every combination with
 * wind, and where it occurred.
 *
 * @param azimuthDeg  the azimuth, degrees (0 = wind towards +x, 90 = towards +y)
 * @param utilisation the largest governing utilisation of any member at this azimuth (dimensionless)
 * @param member      the member it belongs to
 * @param combination the combination it occurred in (ties keep the earlier combination)
 */
public record AzimuthUtilisation(double azimuthDeg, double utilisation, int member, String combination) {
    public AzimuthUtilisation {
        Objects.requireNonNull(combination, "combination");
        if (!Double.isFinite(azimuthDeg) || !Double.isFinite(utilisation) || utilisation < 0) {
            throw new IllegalArgumentException("azimuth and utilisation must be finite, utilisation >= 0");
        }
    }
}
