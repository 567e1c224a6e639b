package tetrapod.generate;

import java.math.BigDecimal;
import java.math.RoundingMode;

/** Lengths for messages: {@code 12.35 m}, rounded to 0.1 mm, no trailing zeros. */
final class Metres {

    private Metres() { }

    static String of(double metres) {
        if (!Double.isFinite(metres)) {
            return metres + " m";
        }
        BigDecimal rounded = BigDecimal.valueOf(metres).setScale(4, RoundingMode.HALF_UP).stripTrailingZeros();
        return (rounded.signum() == 0 ? "0" : rounded.toPlainString()) + " m";
    }
}
