package tetrapod.load;

import java.math.BigDecimal;

/** Numbers as people write them in names and messages: 45, 47.5, 0.1 (rounded to 1e-9). */
final class PlainNumbers {

    private PlainNumbers() { }

    static String of(double value) {
        BigDecimal d = BigDecimal.valueOf(Math.round(value * 1e9) / 1e9).stripTrailingZeros();
        return d.scale() < 0 ? d.setScale(0).toPlainString() : d.toPlainString();
    }
}
