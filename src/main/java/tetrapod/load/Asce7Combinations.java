package tetrapod.load;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tetrapod.model.spec.LoadAction;

/**
 * Default strength-design combinations of ASCE 7 §2.3 for a tower (no live, roof or snow load):
 * 1.2D + 1.0W and 0.9D + 1.0W (§2.3.1 combinations 4 and 6), and with atmospheric ice
 * 1.2D + 1.0Di + 1.0Wi and 0.9D + 1.0Di + 1.0Wi (§2.3.3, recalled from memory).
 */
public final class Asce7Combinations {

    private Asce7Combinations() { }

    public static List<Combination> defaults(boolean ice) {
        DefaultCombinations.Symbols asce = DefaultCombinations.Symbols.ASCE;
        List<Combination> list = new ArrayList<>();
        list.add(DefaultCombinations.named(asce, Map.of(LoadAction.DEAD, 1.2, LoadAction.WIND, 1.0)));
        list.add(DefaultCombinations.named(asce, Map.of(LoadAction.DEAD, 0.9, LoadAction.WIND, 1.0)));
        if (ice) {
            list.add(DefaultCombinations.named(asce, Map.of(LoadAction.DEAD, 1.2, LoadAction.ICE, 1.0,
                    LoadAction.WIND_ON_ICE, 1.0)));
            list.add(DefaultCombinations.named(asce, Map.of(LoadAction.DEAD, 0.9, LoadAction.ICE, 1.0,
                    LoadAction.WIND_ON_ICE, 1.0)));
        }
        return List.copyOf(list);
    }
}
