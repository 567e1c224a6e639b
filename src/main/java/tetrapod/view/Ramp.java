package tetrapod.view;

import java.util.List;

/**
 * A continuous colour ramp over [0, 1]: colours at ascending stops, interpolated in Oklab between
 * them. Sampled once into a table so that colouring 40,000 members costs a lookup each.
 */
final class Ramp {

    private static final int SAMPLES = 1024;

    private final Rgb[] table = new Rgb[SAMPLES + 1];

    /** {@code stops} ascending from 0 to 1, one colour each. */
    Ramp(double[] stops, List<Rgb> colours) {
        if (stops.length != colours.size() || stops.length < 2 || stops[0] != 0 || stops[stops.length - 1] != 1) {
            throw new IllegalArgumentException("a ramp needs stops from 0 to 1, one colour each");
        }
        int segment = 0;
        for (int k = 0; k <= SAMPLES; k++) {
            double t = (double) k / SAMPLES;
            while (segment < stops.length - 2 && t > stops[segment + 1]) {
                segment++;
            }
            double local = (t - stops[segment]) / (stops[segment + 1] - stops[segment]);
            table[k] = OkLab.mix(colours.get(segment), colours.get(segment + 1), local);
        }
    }

    /** The colour at {@code t}, clamped into [0, 1]. */
    Rgb at(double t) {
        double c = Math.max(0, Math.min(1, t));
        return table[(int) Math.round(c * SAMPLES)];
    }
}
