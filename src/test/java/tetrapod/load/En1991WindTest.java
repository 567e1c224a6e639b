package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import tetrapod.model.spec.TerrainCategory;

/** EN 1991-1-4:2005 §4: the terrain table, the exposure factor and the peak velocity pressure. */
class En1991WindTest {

    /**
     * EN 1991-1-4 Table 4.1 (z0 and z_min per category), as reproduced by eurocodes-tools.com
     * ("roughness factor") and lisa.blue ("terrain category"): 0: 0.003/1, I: 0.01/1, II: 0.05/2,
     * III: 0.3/5, IV: 1.0/10 m.
     */
    @ParameterizedTest
    @CsvSource({"CAT_0, 0.003, 1", "CAT_I, 0.01, 1", "CAT_II, 0.05, 2", "CAT_III, 0.3, 5", "CAT_IV, 1.0, 10"})
    void table41Constants(TerrainCategory category, double z0, double zmin) {
        assertEquals(z0, En1991Wind.roughnessLength(category), 0);
        assertEquals(zmin, En1991Wind.minimumHeight(category), 0);
    }

    @Test
    void terrainFactorOfCategoryTwoIsPointNineteen() {
        // (4.5): k_r = 0.19 (z0/z0,II)^0.07 = 0.19 for z0 = z0,II
        assertEquals(0.19, En1991Wind.of(TerrainCategory.CAT_II, 26).terrainFactor(), 1e-15);
        // category IV by hand: 0.19 × 20^0.07 = 0.19 × e^(0.07 × 2.995732) = 0.19 × 1.233310 = 0.234329
        assertEquals(0.234329, En1991Wind.of(TerrainCategory.CAT_IV, 26).terrainFactor(), 1e-6);
    }

    @Test
    void exposureFactorOfCategoryTwoAtTenMetresMatchesFigure42() {
        // EN 1991-1-4 Figure 4.2 (c0 = k_I = 1): category II at z = 10 m reads about 2.35.
        assertEquals(2.35, En1991Wind.of(TerrainCategory.CAT_II, 26).exposureFactor(10), 0.01);
    }

    /**
     * With c0 = k_I = 1 the definitions (4.3)–(4.9) reduce to c_e(z) = k_r² L (L + 7), L = ln(z/z0):
     * q_p = (1 + 7/L) ½ρ (k_r L v_b)² and q_b = ½ρ v_b². Evaluated here independently of the code.
     */
    @ParameterizedTest
    @CsvSource({"CAT_0, 5", "CAT_0, 50", "CAT_I, 10", "CAT_I, 120", "CAT_II, 2", "CAT_II, 30", "CAT_II, 200",
        "CAT_III, 5", "CAT_III, 75", "CAT_IV, 10", "CAT_IV, 150"})
    void exposureFactorClosedForm(TerrainCategory category, double z) {
        double z0 = List.of(0.003, 0.01, 0.05, 0.3, 1.0).get(category.ordinal());
        double kr = 0.19 * Math.pow(z0 / 0.05, 0.07);
        double l = Math.log(z / z0);
        assertEquals(kr * kr * l * (l + 7), En1991Wind.of(category, 24).exposureFactor(z), 1e-12);
    }

    @Test
    void belowMinimumHeightTheProfileIsConstant() {
        // (4.4) and (4.7): c_r(z) = c_r(z_min), I_v(z) = I_v(z_min) for z < z_min (5 m in category III).
        En1991Wind wind = En1991Wind.of(TerrainCategory.CAT_III, 26);
        assertEquals(wind.peakPressure(5), wind.peakPressure(0.5), 0);
        assertEquals(wind.peakPressure(5), wind.peakPressure(3), 0);
    }

    @Test
    void peakPressureByHand() {
        // v_b,0 = 26 m/s, category II, z = 10 m, ρ = 1.25 kg/m³ (recommended, EN 1991-1-4 4.5(1) note 2):
        // q_b = 0.5 × 1.25 × 26² = 422.5 Pa (4.10); L = ln(200) = 5.298317;
        // c_e = 0.19² × 5.298317 × 12.298317 = 2.352290; q_p = 2.352290 × 422.5 = 993.843 Pa.
        En1991Wind wind = En1991Wind.of(TerrainCategory.CAT_II, 26);
        assertEquals(422.5, wind.basicPressure(), 1e-9);
        assertEquals(993.843, wind.peakPressure(10), 1e-3);
    }

    @Test
    void orographyAndSeasonEnterAsTheEquationsSay() {
        // c0 = 1.2, c_season = 0.9, category I, z = 20 m, v_b,0 = 25 m/s, k_I = 1:
        // v_b = 22.5 m/s; L = ln(2000); v_m = k_r L c0 v_b (4.3); I_v = 1/(c0 L) (4.7); q_p per (4.8).
        En1991Wind wind = new En1991Wind(TerrainCategory.CAT_I, 25, 0.9, 1.2, 1.0, 1.25, 1.0, List.of());
        double kr = 0.19 * Math.pow(0.01 / 0.05, 0.07);
        double l = Math.log(20 / 0.01);
        double vm = kr * l * 1.2 * 22.5;
        double expected = (1 + 7 / (1.2 * l)) * 0.5 * 1.25 * vm * vm;
        assertEquals(expected, wind.peakPressure(20), 1e-9);
    }

    @Test
    void directionFactorsBySectorOfThirtyDegrees() {
        // sectors centred on 0°, 30°, ... 330°, each 30° wide; azimuth = the direction the wind blows towards
        List<Double> cdir = List.of(0.70, 0.71, 0.72, 0.73, 0.74, 0.75, 0.76, 0.77, 0.78, 0.79, 0.80, 1.0);
        En1991Wind wind = new En1991Wind(TerrainCategory.CAT_II, 26, 1, 1, 1, 1.25, 1, cdir);
        assertEquals(0.70, wind.directionFactor(0), 0);
        assertEquals(0.70, wind.directionFactor(14.9), 0);
        assertEquals(0.71, wind.directionFactor(15.0), 0);
        assertEquals(0.73, wind.directionFactor(90), 0);
        assertEquals(1.0, wind.directionFactor(330), 0);
        assertEquals(0.70, wind.directionFactor(345), 0);
        assertEquals(1.0, wind.directionFactor(-20), 0);
        assertEquals(0.73 * 0.73, wind.directionalFactor(100), 1e-15);
        // the flow regime of tubes is decided with the lowest c_dir
        assertEquals(0.70 * wind.peakVelocity(30), wind.flowVelocity(30), 1e-12);
    }

    @Test
    void theProfileStopsAtTwoHundredMetres() {
        // Table 4.1: z_max = 200 m
        assertThrows(IllegalArgumentException.class, () -> En1991Wind.of(TerrainCategory.CAT_II, 26).peakPressure(210));
    }
}
