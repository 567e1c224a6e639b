package tetrapod.view;

import java.util.List;
import java.util.Locale;

/**
 * Axial force, diverging about zero: compression brick red, tension blue, both ends equally dark,
 * a light neutral grey at zero. Symmetric over ±{@code maxAbs} (N) so that equal forces of either
 * sign get equally strong colours.
 */
public record AxialScale(double maxAbs) implements ColourScale {

    private static final Ramp RAMP = new Ramp(new double[] {0, 0.5, 1},
            List.of(OkLab.lch(0.45, 0.15, 32), OkLab.lch(0.87, 0.008, 250), OkLab.lch(0.45, 0.13, 250)));

    public AxialScale {
        if (!Double.isFinite(maxAbs) || maxAbs < 0) {
            throw new IllegalArgumentException("axial scale maximum must be finite and >= 0, was " + maxAbs);
        }
    }

    /** The scale's half range, N (at least 1 N, so that an all-zero case still has a scale). */
    public double range() {
        return Math.max(maxAbs, 1.0);
    }

    @Override
    public Rgb colour(double value) {
        if (Double.isNaN(value)) {
            return NO_VALUE;
        }
        return RAMP.at(0.5 + 0.5 * value / range());
    }

    @Override
    public Legend legend() {
        double kN = range() / 1000;
        String f = kN >= 100 ? "%.0f" : kN >= 1 ? "%.1f" : "%.3f";  // one format for every tick
        return new Legend("axial force, kN", ColourScale.sampleBar(this, -range(), range()),
                List.of(new Legend.Tick(0, kn(f, -kN) + " compression"), new Legend.Tick(0.25, kn(f, -kN / 2)),
                        new Legend.Tick(0.5, "0"), new Legend.Tick(0.75, kn(f, kN / 2)),
                        new Legend.Tick(1, kn(f, kN) + " tension")),
                List.of(new Legend.Swatch(NO_VALUE, "no value")));
    }

    private static String kn(String format, double value) {
        return String.format(Locale.ROOT, format, value);
    }
}
