package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import tetrapod.common.BadInputException;
import tetrapod.generate.Tower;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.ActionFactorSet;
import tetrapod.model.spec.ActionFactors;
import tetrapod.model.spec.IceSpec;
import tetrapod.model.spec.LoadsSpec;
import tetrapod.model.spec.TerrainCategory;
import tetrapod.model.spec.WindSpec;

/**
 * The default EN combinations take the partial factors of EN 1993-3-1 Annex A Table A.1 for the
 * model's reliability class (values recalled from memory, see docs/methods.md):
 * <pre>
 *   class   γ_G unfav.   γ_G fav.   γ_Q
 *     1       1.0          1.0       1.2
 *     2       1.1          1.0       1.4
 *     3       1.2          1.0       1.6
 * </pre>
 * worked by hand on the one-panel tower of {@link OnePanelTowerTest}, whose EN 1991-1-4 wind at
 * azimuth 0 is F = c_f q_p A_s = 2286.80 N (worked there step by step and again here).
 */
class ReliabilityClassTest {

    private static final Tower TOWER = Towers.onePanel(2, 2, 3);
    private static final WindSpec WIND = new WindSpec.En1991(26, TerrainCategory.CAT_II, List.of(), 1, 1, 1, 1, 1.25);
    private static final IceSpec ICE = new IceSpec(new IceSpec.Given(20, false), 900, 18, Double.NaN);

    /** EN 1991-1-4 (4.3)-(4.8) and EN 1993-3-1 Annex B on the one panel, as in OnePanelTowerTest. */
    private static double handWind() {
        double area = 0.6 + 2 * 0.07 * Math.sqrt(13) + 0.24;
        double phi = area / 6;
        double l = Math.log(2 / 0.05);
        double vm = 0.19 * l * 26;
        double qp = (1 + 7 / l) * 0.5 * 1.25 * vm * vm;
        double cf = 1.76 * 2.25 * (1 - 1.5 * phi + phi * phi);
        return cf * qp * area;
    }

    private static double sum(List<NodeForce> loads, int component) {
        return loads.stream().mapToDouble(f -> component == 0 ? f.fx() : f.fz()).sum();
    }

    @ParameterizedTest(name = "class {0}")
    @CsvSource(delimiter = '|', value = {
        "1 | 1.0 | 1.0 | 1.2 | 1.0G + 1.2W | 1.0G + 1.2I + 0.6Wi; 1.0G + 0.6I + 1.2Wi",
        "2 | 1.1 | 1.0 | 1.4 | 1.1G + 1.4W; 1.0G + 1.4W | 1.1G + 1.4I + 0.7Wi; 1.1G + 0.7I + 1.4Wi",
        "3 | 1.2 | 1.0 | 1.6 | 1.2G + 1.6W; 1.0G + 1.6W | 1.2G + 1.6I + 0.8Wi; 1.2G + 0.8I + 1.6Wi"})
    void theCombinationsTakeTheFactorsOfTheClass(int reliabilityClass, double gammaG, double gammaGFav, double gammaQ,
                                                  String windNames, String iceNames) throws BadInputException {
        ActionFactors factors = new ActionFactors(ActionFactorSet.EN1993_3_1, reliabilityClass);
        TowerLoads loads = TowerLoads.build(TOWER,
                new LoadsSpec(List.of(), WIND, List.of(), ICE, List.of(), 5, factors));
        List<String> expected = new java.util.ArrayList<>(List.of(windNames.split("; ")));
        expected.addAll(List.of(iceNames.split("; ")));
        assertEquals(expected, loads.combinations().stream().map(Combination::name).toList());

        // Σ Fx of the unfavourable case at azimuth 0 = γ_Q F; Σ Fz = −γ_G G, G the self-weight
        double weight = -sum(SelfWeight.of(TOWER.frame(), TOWER.connectionAllowance()), 1);
        assertEquals(2286.80, handWind(), 0.01);
        LoadCase unfavourable = loads.loadCase(loads.combinations().get(0), 0.0);
        assertEquals(gammaQ * handWind(), sum(unfavourable.loads(), 0), 1e-9 * handWind());
        assertEquals(-gammaG * weight, sum(unfavourable.loads(), 1), 1e-9 * weight);
        if (gammaGFav != gammaG) {
            LoadCase favourable = loads.loadCase(loads.combinations().get(1), 0.0);
            assertEquals(-gammaGFav * weight, sum(favourable.loads(), 1), 1e-9 * weight);
        }
        // the accompanying wind on ice takes ψ0 = 0.5 of γ_Q
        Combination iceLeading = loads.combinations().get(loads.combinations().size() - 2);
        assertEquals(gammaQ, iceLeading.factor(tetrapod.model.spec.LoadAction.ICE), 1e-15);
        assertEquals(0.5 * gammaQ, iceLeading.factor(tetrapod.model.spec.LoadAction.WIND_ON_ICE), 1e-15);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "EN1990 | 1.35G + 1.5W; 1.0G + 1.5W",
        "ASCE7 | 1.2D + 1.0W; 0.9D + 1.0W"})
    void theBuildingAndAsceFactorsStaySelectable(ActionFactorSet set, String names) throws BadInputException {
        TowerLoads loads = TowerLoads.build(TOWER,
                new LoadsSpec(List.of(), WIND, List.of(), null, List.of(), 5, new ActionFactors(set, 2)));
        // EN 1990 Table A1.2(B); ASCE 7 §2.3.1 combinations 4 and 6
        assertEquals(List.of(names.split("; ")), loads.combinations().stream().map(Combination::name).toList());
    }
}
