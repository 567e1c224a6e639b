package tetrapod.view;

import java.util.ArrayList;
import java.util.List;

/**
 * How member values become colours, one implementation per kind of value. The colours are our own
 * choice: a single-hue-family sequential scale for utilisation (pale blue-grey to deep violet,
 * lightness falling steadily) with a saturated orange reserved for members over the limit, a
 * diverging brick-red / blue scale for axial force, distinct categorical colours for roles and a
 * constant-lightness hue circle for azimuths.
 */
public sealed interface ColourScale permits UtilisationScale, AxialScale, RoleScale, AzimuthScale {

    /** Drawn for a member with no value. */
    Rgb NO_VALUE = Rgb.hex(0xB4B4B4);

    /** The colour of {@code value} ({@link Double#NaN}: {@link #NO_VALUE}). */
    Rgb colour(double value);

    /** The legend that explains this scale. */
    Legend legend();

    /** The scale for {@code colouring} over all of {@code data}'s cases (so colours compare across cases). */
    static ColourScale of(ViewData data, Colouring colouring) {
        return switch (colouring) {
            case ROLE -> new RoleScale();
            case UTILISATION -> new UtilisationScale();
            case AZIMUTH -> new AzimuthScale();
            case AXIAL -> {
                double max = 0;
                for (ViewCase c : data.cases()) {
                    MemberScalars n = c.scalars().get(Colouring.AXIAL);
                    if (n != null) {
                        max = Math.max(max, n.maxAbs());
                    }
                }
                yield new AxialScale(max);
            }
        };
    }

    /** {@link Legend#BAR_SAMPLES} colours of a continuous scale from {@code from} to {@code to}. */
    static List<Rgb> sampleBar(ColourScale scale, double from, double to) {
        List<Rgb> bar = new ArrayList<>();
        for (int k = 0; k < Legend.BAR_SAMPLES; k++) {
            bar.add(scale.colour(from + (to - from) * k / (Legend.BAR_SAMPLES - 1)));
        }
        return bar;
    }
}
