package tetrapod.view;

/**
 * Conversion between sRGB and the Oklab perceptual colour space (B. Ottosson, "A perceptual colour
 * space for image processing", 2020; the same matrices as CSS Color Module Level 4, section on Oklab).
 * The matrix coefficients below are recalled from memory and checked in the tests by round trips
 * and by grey mapping to a = b = 0. Colour scales interpolate in Oklab so that equal steps in
 * value look like equal steps in colour.
 */
final class OkLab {

    private OkLab() { }

    /** {L, a, b} of an sRGB colour. */
    static double[] fromSrgb(Rgb c) {
        double r = toLinear(c.r());
        double g = toLinear(c.g());
        double b = toLinear(c.b());
        double l = Math.cbrt(0.4122214708 * r + 0.5363325363 * g + 0.0514459929 * b);
        double m = Math.cbrt(0.2119034982 * r + 0.6806995451 * g + 0.1073969566 * b);
        double s = Math.cbrt(0.0883024619 * r + 0.2817188376 * g + 0.6299787005 * b);
        return new double[] {
            0.2104542553 * l + 0.7936177850 * m - 0.0040720468 * s,
            1.9779984951 * l - 2.4285922050 * m + 0.4505937099 * s,
            0.0259040371 * l + 0.7827717662 * m - 0.8086757660 * s};
    }

    /** The sRGB colour of Oklab (L, a, b), each channel clamped into [0, 1] when out of gamut. */
    static Rgb toSrgb(double lightness, double a, double b) {
        double l = cube(lightness + 0.3963377774 * a + 0.2158037573 * b);
        double m = cube(lightness - 0.1055613458 * a - 0.0638541728 * b);
        double s = cube(lightness - 0.0894841775 * a - 1.2914855480 * b);
        return Rgb.clamped(
                toGamma(4.0767416621 * l - 3.3077115913 * m + 0.2309699292 * s),
                toGamma(-1.2684380046 * l + 2.6097574011 * m - 0.3413193965 * s),
                toGamma(-0.0041960863 * l - 0.7034186147 * m + 1.7076147010 * s));
    }

    /** The sRGB colour of Oklch (L, C, hue in degrees). */
    static Rgb lch(double lightness, double chroma, double hueDeg) {
        double h = Math.toRadians(hueDeg);
        return toSrgb(lightness, chroma * Math.cos(h), chroma * Math.sin(h));
    }

    /** The colour a fraction {@code t} of the way from {@code p} to {@code q}, straight through Oklab. */
    static Rgb mix(Rgb p, Rgb q, double t) {
        double[] a = fromSrgb(p);
        double[] b = fromSrgb(q);
        return toSrgb(a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t, a[2] + (b[2] - a[2]) * t);
    }

    private static double cube(double v) {
        return v * v * v;
    }

    // IEC 61966-2-1 (sRGB) transfer function
    static double toLinear(double v) {
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }

    private static double toGamma(double v) {
        if (v <= 0) {
            return 0;
        }
        return v <= 0.0031308 ? 12.92 * v : 1.055 * Math.pow(v, 1 / 2.4) - 0.055;
    }
}
