package tetrapod.view;

import java.util.List;

/**
 * Governing wind azimuth, deg: a closed loop through Oklab, so that 0 and 360 meet and no
 * direction looks more important than another. A hue circle at one lightness (the former scale)
 * collapses to about three colours for a reader with deuteranopia, so the loop also goes round in
 * lightness and mostly along the blue-yellow axis, which the red-green deficiencies keep: neighbours
 * 30° apart stay apart under protanopia, deuteranopia and tritanopia (view.ColourVisionTest). The
 * loop's constants were chosen by a search for the largest least distance between such neighbours
 * with every colour inside the sRGB gamut.
 */
public record AzimuthScale() implements ColourScale {

    /** Mean Oklab lightness, and how far it swings, with the azimuth of its peak, deg. */
    private static final double LIGHTNESS = 0.68;
    private static final double LIGHTNESS_SWING = 0.16;
    private static final double LIGHTNESS_PEAK_DEG = 10;
    /** Swing along Oklab a (green-red), with the azimuth of its peak, deg, and along b (blue-yellow). */
    private static final double A_SWING = 0.05;
    private static final double A_PEAK_DEG = 110;
    private static final double B_SWING = 0.14;

    @Override
    public Rgb colour(double value) {
        if (Double.isNaN(value)) {
            return NO_VALUE;
        }
        double[] lab = lab(value);
        return OkLab.toSrgb(lab[0], lab[1], lab[2]);
    }

    /** The Oklab {L, a, b} of azimuth {@code deg}, before conversion to sRGB. */
    static double[] lab(double deg) {
        double t = Math.toRadians(Angles.normaliseDeg(deg));
        return new double[] {
            LIGHTNESS + LIGHTNESS_SWING * Math.cos(t - Math.toRadians(LIGHTNESS_PEAK_DEG)),
            A_SWING * Math.cos(t - Math.toRadians(A_PEAK_DEG)),
            B_SWING * Math.sin(t)};
    }

    @Override
    public Legend legend() {
        return new Legend("governing azimuth, deg", ColourScale.sampleBar(this, 0, 360),
                List.of(new Legend.Tick(0, "0"), new Legend.Tick(0.25, "90"), new Legend.Tick(0.5, "180"),
                        new Legend.Tick(0.75, "270"), new Legend.Tick(1, "360")),
                List.of(new Legend.Swatch(NO_VALUE, "no value")));
    }
}
