package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import tetrapod.model.spec.ConnectionSpec;

/** Tensile stress areas against ISO 898-1. */
class MetricThreadsTest {

    /**
     * Nominal stress areas A_s of ISO 898-1 (table of thread sizes; recalled from memory, M24
     * = 353 mm² as the issue states). Tolerance 0.5 %: the table rounds to whole mm² (3 figures).
     */
    @ParameterizedTest(name = "M{0}: A_s = {1} mm²")
    @CsvSource({"12, 84.3", "16, 157", "20, 245", "24, 353", "30, 561", "36, 817", "48, 1470", "64, 2680"})
    void stressAreaAgainstIso898(int size, double published) {
        double area = MetricThreads.stressArea(size * 1e-3) * 1e6;
        assertEquals(published, area, published * 0.005);
    }

    @Test
    void rootAreaIsBelowStressAreaBelowShank() {
        double d = 0.020;
        assertTrue(MetricThreads.rootArea(d) < MetricThreads.stressArea(d));
        assertTrue(MetricThreads.stressArea(d) < MetricThreads.grossArea(d));
        // M20, P = 2.5: d3 = 20 − 1.226869·2.5 = 16.933 mm, π d3²/4 = 225.2 mm² (hand calculation)
        assertEquals(225.2, MetricThreads.rootArea(d) * 1e6, 0.1);
    }

    @Test
    void sizesAgreeWithTheSpecList() {
        assertEquals(ConnectionSpec.METRIC_SIZES_MM, MetricThreads.sizes());
        assertFalse(MetricThreads.isKnown(17));
        assertThrows(IllegalArgumentException.class, () -> MetricThreads.stressArea(0.017));
    }
}
