package tetrapod.model;

import java.util.List;
import java.util.Objects;

/**
 * A structural steel (or other metal) grade. Strengths may fall with thickness, as in
 * EN 10025-2 Table 7; each band holds up to its {@code maxThickness}.
 *
 * @param name     grade, e.g. S355
 * @param e        Young's modulus, Pa
 * @param g        shear modulus, Pa
 * @param density  kg/m³
 * @param bands    strength bands by ascending maximum thickness; the last may be infinite
 * @param source   where E, G and the strengths come from, for the report
 */
public record Material(String name, double e, double g, double density, List<StrengthBand> bands, String source) {

    /** Yield and ultimate strength (Pa) for nominal thicknesses up to {@code maxThickness} (m). */
    public record StrengthBand(double maxThickness, double fy, double fu) { }

    public Material {
        Objects.requireNonNull(name, "name");
        bands = List.copyOf(bands);
        if (bands.isEmpty()) {
            throw new IllegalArgumentException("material " + name + " has no strength band");
        }
        if (!(e > 0) || !(g > 0) || !(density > 0)) {
            throw new IllegalArgumentException("material " + name + ": E, G and density must be > 0");
        }
    }

    private StrengthBand band(double thickness) {
        for (StrengthBand b : bands) {
            if (thickness <= b.maxThickness() + 1e-9) {
                return b;
            }
        }
        throw new IllegalArgumentException("material " + name + " has no strength for thickness "
                + thickness * 1e3 + " mm");
    }

    /** Yield strength for a nominal thickness in m, Pa. */
    public double fy(double thickness) {
        return band(thickness).fy();
    }

    /** Ultimate tensile strength for a nominal thickness in m, Pa. */
    public double fu(double thickness) {
        return band(thickness).fu();
    }
}
