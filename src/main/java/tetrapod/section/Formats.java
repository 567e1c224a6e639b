package tetrapod.section;

import java.math.BigDecimal;
import java.math.MathContext;

/** Numbers for names and messages: at most six significant digits, no trailing zeros. */
final class Formats {

    private Formats() { }

    static String number(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == 0) {
            return "0";
        }
        return new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros().toPlainString();
    }
}
