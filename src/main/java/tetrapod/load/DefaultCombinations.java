package tetrapod.load;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import tetrapod.model.spec.ActionFactors;
import tetrapod.model.spec.DesignBasis;
import tetrapod.model.spec.LoadAction;

/**
 * The combinations used when the model file gives none, per set of action factors (which follows
 * the design basis). The nodal loads of the file, when there are any, are added to every
 * combination with factor 1.0 (taken as given).
 *
 * <ul>
 * <li>en1993-3-1: EN 1990 (6.10) with the factors of EN 1993-3-1 Annex A for the reliability class
 *     (class 2: 1.1G + 1.4W, 1.0G + 1.4W); en1990: with EN 1990 Table A1.2(B) (1.35G + 1.5W,
 *     1.0G + 1.5W); with ice, ice leading with wind on ice accompanying and the reverse, ψ0 = 0.5
 *     ({@link EnCombinations}).</li>
 * <li>asce7: ASCE 7 strength design 1.2D + 1.0W, 0.9D + 1.0W, and with ice 1.2D + 1.0Di + 1.0Wi,
 *     0.9D + 1.0Di + 1.0Wi ({@link Asce7Combinations}).</li>
 * <li>uniform: characteristic sums 1.0G + 1.0W (and 1.0G + 1.0I + 1.0Wi), for hand calculations.</li>
 * <li>no wind: 1.0G (+ 1.0I with ice) for a generated tower; the nodal loads alone, 1.0Q, for an
 *     explicit frame (a benchmark is solved under the loads it gives).</li>
 * </ul>
 */
public final class DefaultCombinations {

    private DefaultCombinations() { }

    /**
     * @param factors   the partial factors for actions
     * @param method    the wind method (en1991, asce7, uniform) or null for no wind
     * @param ice       whether the model has ice
     * @param nodal     whether the model has nodal loads
     * @param generated whether the tower is generated (false: an explicit frame)
     */
    public static List<Combination> of(ActionFactors factors, String method, boolean ice, boolean nodal,
                                       boolean generated) {
        List<Combination> base;
        if (method == null) {
            base = new ArrayList<>();
            if (!generated) {
                return nodal ? List.of(named(Symbols.EN, Map.of(LoadAction.NODAL, 1.0))) : List.of(named(Symbols.EN,
                        Map.of(LoadAction.DEAD, 1.0)));
            }
            base.add(named(Symbols.EN, Map.of(LoadAction.DEAD, 1.0)));
            if (ice) {
                base.add(named(Symbols.EN, Map.of(LoadAction.DEAD, 1.0, LoadAction.ICE, 1.0)));
            }
        } else {
            base = "uniform".equals(method) ? uniform(ice) : switch (factors.set()) {
                case EN1993_3_1 -> EnCombinations.defaults(EnPartialFactors.annexA(factors.reliabilityClass()), ice);
                case EN1990 -> EnCombinations.defaults(EnPartialFactors.EN1990_BUILDINGS, ice);
                case ASCE7 -> Asce7Combinations.defaults(ice);
            };
        }
        if (!nodal) {
            return List.copyOf(base);
        }
        boolean asce = method != null && !"uniform".equals(method) && factors.set().family() == DesignBasis.US;
        Symbols symbols = asce ? Symbols.ASCE : Symbols.EN;
        List<Combination> withNodal = new ArrayList<>();
        for (Combination c : base) {
            Map<LoadAction, Double> f = new EnumMap<>(LoadAction.class);
            f.putAll(c.factors());
            f.put(LoadAction.NODAL, 1.0);
            withNodal.add(named(symbols, f));
        }
        return List.copyOf(withNodal);
    }

    private static List<Combination> uniform(boolean ice) {
        List<Combination> list = new ArrayList<>();
        list.add(named(Symbols.EN, Map.of(LoadAction.DEAD, 1.0, LoadAction.WIND, 1.0)));
        if (ice) {
            list.add(named(Symbols.EN, Map.of(LoadAction.DEAD, 1.0, LoadAction.ICE, 1.0, LoadAction.WIND_ON_ICE, 1.0)));
        }
        return list;
    }

    /** How a family of standards writes the actions. */
    enum Symbols {
        EN(Map.of(LoadAction.DEAD, "G", LoadAction.WIND, "W", LoadAction.ICE, "I", LoadAction.WIND_ON_ICE, "Wi",
                LoadAction.NODAL, "Q")),
        ASCE(Map.of(LoadAction.DEAD, "D", LoadAction.WIND, "W", LoadAction.ICE, "Di", LoadAction.WIND_ON_ICE, "Wi",
                LoadAction.NODAL, "Q"));

        private final Map<LoadAction, String> symbol;

        Symbols(Map<LoadAction, String> symbol) {
            this.symbol = symbol;
        }
    }

    /** A combination named by its factors: {@code 1.35G + 1.5W}. */
    static Combination named(Symbols symbols, Map<LoadAction, Double> factors) {
        StringBuilder name = new StringBuilder();
        for (LoadAction a : LoadAction.values()) {
            Double f = factors.get(a);
            if (f != null && f != 0) {
                if (name.length() > 0) {
                    name.append(" + ");
                }
                name.append(String.format(Locale.ROOT, f == Math.rint(f * 10) / 10 ? "%.1f" : "%s", f))
                        .append(symbols.symbol.get(a));
            }
        }
        return new Combination(name.toString(), factors);
    }
}
