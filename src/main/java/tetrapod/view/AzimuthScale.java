package tetrapod.view;

import java.util.List;

/**
 * Governing wind azimuth, deg: a hue circle at constant Oklab lightness and chroma, so that 0 and
 * 360 meet and no direction looks more important than another.
 */
public record AzimuthScale() implements ColourScale {

    private static final double LIGHTNESS = 0.66;
    private static final double CHROMA = 0.11;
    /** Rotates the hue circle so that 0 deg is a warm red. */
    private static final double HUE_OFFSET_DEG = 25;

    @Override
    public Rgb colour(double value) {
        if (Double.isNaN(value)) {
            return NO_VALUE;
        }
        return OkLab.lch(LIGHTNESS, CHROMA, Angles.normaliseDeg(value) + HUE_OFFSET_DEG);
    }

    @Override
    public Legend legend() {
        return new Legend("governing azimuth, deg", ColourScale.sampleBar(this, 0, 360),
                List.of(new Legend.Tick(0, "0"), new Legend.Tick(0.25, "90"), new Legend.Tick(0.5, "180"),
                        new Legend.Tick(0.75, "270"), new Legend.Tick(1, "360")),
                List.of(new Legend.Swatch(NO_VALUE, "no value")));
    }
}
