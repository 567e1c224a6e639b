package tetrapod.load;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import tetrapod.model.spec.ActionFactorSet;
import tetrapod.model.spec.ActionFactors;
import tetrapod.model.spec.LoadAction;

/**
 * The unfactored (service) combinations the allowable-stress footing rules are checked under (a
 * factor of safety on uplift, an allowable bearing pressure, allowable rod stresses, sliding).
 * Each name begins with {@code service: } so that its cases are told from the factored ones.
 *
 * <ul>
 * <li>EN family, uniform wind and no wind: the characteristic combination of EN 1990 (6.14b),
 *     G + W, and with ice G + I + ψ0 Wi and G + ψ0 I + Wi (ψ0 = 0.5 as in {@link EnCombinations}).</li>
 * <li>ASCE 7 factors: the allowable stress design combinations of ASCE 7 §2.4.1, D + 0.6W and
 *     0.6D + 0.6W (the 0.6 brings the strength-level wind to service level), and with ice
 *     D + 0.7Di + 0.7Wi and 0.6D + 0.7Di + 0.7Wi (§2.4.3, recalled from memory).</li>
 * </ul>
 * The nodal loads of the file are added with factor 1.0, as in {@link DefaultCombinations}.
 */
public final class ServiceCombinations {

    /** Prefix of every service combination's name. */
    public static final String PREFIX = "service: ";

    private ServiceCombinations() { }

    /**
     * @param factors the model's action factors (ASCE 7 gives the ASD set, any other the characteristic one)
     * @param method  the wind method, or null for no wind
     */
    public static List<Combination> of(ActionFactors factors, String method, boolean ice, boolean nodal) {
        boolean asd = factors.set() == ActionFactorSet.ASCE7 && method != null && !"uniform".equals(method);
        DefaultCombinations.Symbols symbols = asd ? DefaultCombinations.Symbols.ASCE : DefaultCombinations.Symbols.EN;
        List<Map<LoadAction, Double>> sets = new ArrayList<>();
        if (method == null) {
            sets.add(Map.of(LoadAction.DEAD, 1.0));
            if (ice) {
                sets.add(Map.of(LoadAction.DEAD, 1.0, LoadAction.ICE, 1.0));
            }
        } else if (asd) {
            sets.add(Map.of(LoadAction.DEAD, 1.0, LoadAction.WIND, 0.6));
            sets.add(Map.of(LoadAction.DEAD, 0.6, LoadAction.WIND, 0.6));
            if (ice) {
                sets.add(Map.of(LoadAction.DEAD, 1.0, LoadAction.ICE, 0.7, LoadAction.WIND_ON_ICE, 0.7));
                sets.add(Map.of(LoadAction.DEAD, 0.6, LoadAction.ICE, 0.7, LoadAction.WIND_ON_ICE, 0.7));
            }
        } else {
            double psi = EnCombinations.PSI_0_ICE_WIND;
            sets.add(Map.of(LoadAction.DEAD, 1.0, LoadAction.WIND, 1.0));
            if (ice) {
                sets.add(Map.of(LoadAction.DEAD, 1.0, LoadAction.ICE, 1.0, LoadAction.WIND_ON_ICE, psi));
                sets.add(Map.of(LoadAction.DEAD, 1.0, LoadAction.ICE, psi, LoadAction.WIND_ON_ICE, 1.0));
            }
        }
        List<Combination> out = new ArrayList<>();
        for (Map<LoadAction, Double> set : sets) {
            Map<LoadAction, Double> f = new EnumMap<>(set);
            if (nodal) {
                f.put(LoadAction.NODAL, 1.0);
            }
            Combination named = DefaultCombinations.named(symbols, f);
            out.add(new Combination(PREFIX + named.name(), named.factors()));
        }
        return List.copyOf(out);
    }

    /** Whether a case or combination name is one of these. */
    public static boolean isService(String name) {
        return name != null && name.startsWith(PREFIX);
    }
}
