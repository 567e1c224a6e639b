package tetrapod.load;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tetrapod.model.spec.LoadAction;

/**
 * Default ultimate combinations by EN 1990 (6.10), Σ γ_G G + γ_Q,1 Q_k,1 + Σ γ_Q ψ0 Q_k,i with the
 * recommended γ_G = 1.35 (1.0 where the permanent action is favourable, as for uplift) and
 * γ_Q = 1.5 of EN 1990 Table A1.2(B). For ice with wind, ice and wind on ice each lead in turn with
 * the other accompanying at ψ0 = 0.5 (recalled from memory after EN 1993-3-1 Annex C and
 * ISO 12494; a National Annex may set other values).
 */
public final class En1990Combinations {

    public static final double GAMMA_G = 1.35;
    public static final double GAMMA_G_FAVOURABLE = 1.0;
    public static final double GAMMA_Q = 1.5;
    public static final double PSI_0_ICE_WIND = 0.5;

    private En1990Combinations() { }

    public static List<Combination> defaults(boolean ice) {
        DefaultCombinations.Symbols en = DefaultCombinations.Symbols.EN;
        List<Combination> list = new ArrayList<>();
        list.add(DefaultCombinations.named(en, Map.of(LoadAction.DEAD, GAMMA_G, LoadAction.WIND, GAMMA_Q)));
        list.add(DefaultCombinations.named(en, Map.of(LoadAction.DEAD, GAMMA_G_FAVOURABLE, LoadAction.WIND, GAMMA_Q)));
        if (ice) {
            double accompanying = GAMMA_Q * PSI_0_ICE_WIND;
            list.add(DefaultCombinations.named(en, Map.of(LoadAction.DEAD, GAMMA_G, LoadAction.ICE, GAMMA_Q,
                    LoadAction.WIND_ON_ICE, accompanying)));
            list.add(DefaultCombinations.named(en, Map.of(LoadAction.DEAD, GAMMA_G, LoadAction.ICE, accompanying,
                    LoadAction.WIND_ON_ICE, GAMMA_Q)));
        }
        return List.copyOf(list);
    }
}
