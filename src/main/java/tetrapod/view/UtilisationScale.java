package tetrapod.view;

import java.util.List;

/**
 * Utilisation from 0 to 1: pale blue-grey through steel blue to deep violet, lightness falling
 * steadily so that the order reads in grey too; above 1 a saturated orange that the scale never
 * reaches. Values below 0 are drawn as 0.
 */
public record UtilisationScale() implements ColourScale {

    /** Members over the limit. */
    public static final Rgb OVERSTRESS = Rgb.hex(0xF26B1D);

    private static final Ramp RAMP = new Ramp(new double[] {0, 0.5, 0.85, 1},
            List.of(OkLab.lch(0.86, 0.035, 235), OkLab.lch(0.60, 0.10, 250),
                    OkLab.lch(0.42, 0.13, 285), OkLab.lch(0.30, 0.12, 300)));

    @Override
    public Rgb colour(double value) {
        if (Double.isNaN(value)) {
            return NO_VALUE;
        }
        return value > 1 ? OVERSTRESS : RAMP.at(value);
    }

    @Override
    public Legend legend() {
        return new Legend("utilisation", ColourScale.sampleBar(this, 0, 1),
                List.of(new Legend.Tick(0, "0"), new Legend.Tick(0.25, "0.25"), new Legend.Tick(0.5, "0.50"),
                        new Legend.Tick(0.75, "0.75"), new Legend.Tick(1, "1.00")),
                List.of(new Legend.Swatch(OVERSTRESS, "over 1.00"), new Legend.Swatch(NO_VALUE, "not checked")));
    }
}
