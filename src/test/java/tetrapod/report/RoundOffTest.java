package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The digits left out of a solved vector: expected values worked by hand in decimal (the power of
 * ten at or below 1e-10 × the largest magnitude, then the nearest multiple of it), written as
 * decimal literals, each the double nearest to that decimal.
 */
class RoundOffTest {

    @Test
    void displacementsOfFourMetresKeepTenDecimalPlaces() {
        // 1e-10 × 4.30 m = 4.3e-10 m: the tenth decimal place
        RoundOff digits = RoundOff.forLargest(4.3037159126638445);
        assertEquals("0.0334798603", Double.toString(digits.apply(0.03347986031470872)));
        assertEquals("-0.0013031187", Double.toString(digits.apply(-0.0013031187236427898)));
        assertEquals("4.3037159127", Double.toString(digits.apply(4.3037159126638445)));
        assertEquals(0.0, digits.apply(3.143310349049627e-11));
    }

    @Test
    void forcesOfSixtyFiveMeganewtonsKeepMillinewtons() {
        // 1e-10 × 6.57e7 N = 6.57e-3 N: the third decimal place
        RoundOff digits = RoundOff.forLargest(65675646.3229823);
        assertEquals(-10458.748, digits.apply(-10458.747592065025));
        assertEquals(125585.634, digits.apply(125585.63391540607));
        assertEquals(0.0, digits.apply(2.3027382668880605e-08), "round-off of a bar without shear");
        assertEquals(6.5675646323E7, digits.apply(65675646.3229823));
    }

    @Test
    void aLargestAboveTenToTheTenRoundsToTens() {
        // 1e-10 × 3.2e11 = 32: the tens
        RoundOff digits = RoundOff.forLargest(3.2e11);
        assertEquals(1.234567891e10, digits.apply(1.2345678912e10));
        assertEquals(-40.0, digits.apply(-37.0));
    }

    @Test
    void negativeZeroAndAZeroVectorAreWrittenAsTheyAre() {
        assertEquals("0.0", Double.toString(RoundOff.forLargest(1).apply(-0.0)));
        assertEquals("0.0", Double.toString(RoundOff.forLargest(1).apply(-1e-12)));
        assertEquals(0.125, RoundOff.forLargest(0).apply(0.125), "nothing to scale by: unchanged");
    }
}
