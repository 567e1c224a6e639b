package tetrapod.section;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Section names. Angles: {@code L90x8} (equal legs), {@code L100x65x7} (unequal, long leg first);
 * {@code L90x90x8} is the same section as {@code L90x8}. Tubes: {@code CHS88.9x4} (D and t in mm).
 * Lookup keys ignore case and spaces and accept × for x.
 */
final class SectionNames {

    private static final String NUMBER = "(\\d+(?:\\.\\d+)?)";
    private static final Pattern ANGLE = Pattern.compile("L" + NUMBER + "X" + NUMBER + "(?:X" + NUMBER + ")?");
    private static final Pattern TUBE = Pattern.compile("CHS" + NUMBER + "X" + NUMBER);

    /** D and t of a tube name, mm. */
    record TubeSize(double d, double t) { }

    private SectionNames() { }

    /** The lookup key: upper case, no spaces, × as X, numbers without trailing zeros, aliases folded. */
    static String key(String name) {
        String s = name.replaceAll("\\s+", "").replace('×', 'X').replace('*', 'X').toUpperCase(Locale.ROOT);
        Matcher angle = ANGLE.matcher(s);
        if (angle.matches()) {
            BigDecimal a = new BigDecimal(angle.group(1));
            BigDecimal second = new BigDecimal(angle.group(2));
            if (angle.group(3) == null) {
                return "L" + plain(a) + "X" + plain(second);
            }
            BigDecimal t = new BigDecimal(angle.group(3));
            BigDecimal longLeg = a.max(second);
            BigDecimal shortLeg = a.min(second);
            return longLeg.compareTo(shortLeg) == 0
                    ? "L" + plain(longLeg) + "X" + plain(t)
                    : "L" + plain(longLeg) + "X" + plain(shortLeg) + "X" + plain(t);
        }
        Matcher tube = TUBE.matcher(s);
        if (tube.matches()) {
            return "CHS" + plain(new BigDecimal(tube.group(1))) + "X" + plain(new BigDecimal(tube.group(2)));
        }
        return s;
    }

    /** The display name of an angle with legs a ≥ b and thickness t, mm. */
    static String angle(double a, double b, double t) {
        return a == b
                ? "L" + Formats.number(a) + "x" + Formats.number(t)
                : "L" + Formats.number(a) + "x" + Formats.number(b) + "x" + Formats.number(t);
    }

    /** The display name of a tube, mm. */
    static String tube(TubeSize size) {
        return "CHS" + Formats.number(size.d()) + "x" + Formats.number(size.t());
    }

    /** The size named by a tube name, if it is one (dimensions not yet checked). */
    static Optional<TubeSize> tubeSize(String name) {
        Matcher tube = TUBE.matcher(key(name));
        if (!tube.matches()) {
            return Optional.empty();
        }
        return Optional.of(new TubeSize(Double.parseDouble(tube.group(1)), Double.parseDouble(tube.group(2))));
    }

    private static String plain(BigDecimal v) {
        return v.stripTrailingZeros().toPlainString();
    }
}
