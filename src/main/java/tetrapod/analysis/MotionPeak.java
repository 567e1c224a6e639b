package tetrapod.analysis;

/**
 * The largest value of one movement over the serviceability sweep, and where it occurred.
 *
 * @param value      m (sway) or rad (tilt, twist), ≥ 0
 * @param azimuthDeg the wind azimuth of the case, degrees; null when the combination has no wind
 * @param z          the height it occurred at, m (an ancillary running up the tower moves most at one height)
 */
public record MotionPeak(double value, Double azimuthDeg, double z) {

    public MotionPeak {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException("a movement is finite and ≥ 0, was " + value);
        }
    }
}
