package tetrapod.load;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tetrapod.model.spec.LoadAction;

/**
 * Default ultimate combinations of the EN family, EN 1990 (6.10):
 * Σ γ_G G + γ_Q,1 Q_k,1 + Σ γ_Q ψ0 Q_k,i, with γ_G where the permanent action is unfavourable and
 * the favourable γ_G (1.0) for uplift (one combination when the two are equal, as in class 1); the factors are those of EN 1993-3-1 Annex A or of EN 1990
 * Table A1.2(B) ({@link EnPartialFactors}). For ice with wind, ice and wind on ice each lead in turn
 * with the other accompanying at ψ0 = 0.5 (recalled from memory after EN 1993-3-1 Annex C and
 * ISO 12494; a National Annex may set other values).
 */
public final class EnCombinations {

    public static final double PSI_0_ICE_WIND = 0.5;

    private EnCombinations() { }

    public static List<Combination> defaults(EnPartialFactors f, boolean ice) {
        DefaultCombinations.Symbols en = DefaultCombinations.Symbols.EN;
        List<Combination> list = new ArrayList<>();
        list.add(DefaultCombinations.named(en, Map.of(LoadAction.DEAD, f.gammaG(), LoadAction.WIND, f.gammaQ())));
        if (f.gammaGFavourable() != f.gammaG()) {
            list.add(DefaultCombinations.named(en, Map.of(LoadAction.DEAD, f.gammaGFavourable(), LoadAction.WIND, f.gammaQ())));
        }
        if (ice) {
            double accompanying = f.gammaQ() * PSI_0_ICE_WIND;
            list.add(DefaultCombinations.named(en, Map.of(LoadAction.DEAD, f.gammaG(), LoadAction.ICE, f.gammaQ(),
                    LoadAction.WIND_ON_ICE, accompanying)));
            list.add(DefaultCombinations.named(en, Map.of(LoadAction.DEAD, f.gammaG(), LoadAction.ICE, accompanying,
                    LoadAction.WIND_ON_ICE, f.gammaQ())));
        }
        return List.copyOf(list);
    }
}
