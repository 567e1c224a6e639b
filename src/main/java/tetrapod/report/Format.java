package tetrapod.report;

import java.util.Locale;

/** Numbers as people read them in the report: fixed decimals, the unit's scale, no "-0". */
final class Format {

    private Format() { }

    /** {@code value} with {@code decimals} decimals, "−0.0" written as "0.0". */
    static String fixed(double value, int decimals) {
        String s = String.format(Locale.ROOT, "%." + decimals + "f", value);
        return s.matches("-0\\.?0*") ? s.substring(1) : s;
    }

    /** N as kN with one decimal. */
    static String kN(double newtons) {
        return fixed(newtons / 1e3, 1);
    }

    /** N·m as kN·m with one decimal. */
    static String kNm(double newtonMetres) {
        return fixed(newtonMetres / 1e3, 1);
    }

    /** Pa as kPa with three decimals. */
    static String kPa(double pascals) {
        return fixed(pascals / 1e3, 3);
    }

    /** A utilisation with three decimals, as the summary and every table give it. */
    static String utilisation(double u) {
        return fixed(u, 3);
    }

    static String metres(double m) {
        return fixed(m, 2);
    }

    /** An azimuth without trailing zeros: 45, 47.5, 0.1. */
    static String degrees(double deg) {
        if (deg == Math.rint(deg) && Math.abs(deg) < 1e9) {
            return Long.toString((long) deg);
        }
        String s = String.format(Locale.ROOT, "%.6f", deg).replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }

    /** A case's azimuth in text: "45°", or "no wind". */
    static String azimuth(Double deg) {
        return deg == null ? "no wind" : degrees(deg) + "°";
    }
}
