package tetrapod.analysis;

import java.util.Objects;
import tetrapod.solve.Solution;

/**
 * One load case as solved: its id, the combination it belongs to, its wind azimuth (null for no
 * wind), the solver's answer (which holds the load vector that was solved), the elastic critical
 * load factor α_cr of its forces (EN 1993-1-1 5.2.1; +∞ when its forces cannot buckle the
 * structure) and the factor its wind forces were multiplied by for second-order effects
 * (EN 1993-1-1 5.2.2(5)B, {@link SecondOrder}; 1 when not amplified or without wind).
 */
public record SolvedCase(String id, String combination, Double azimuthDeg, Solution solution, double alphaCr,
                         double windAmplification) {
    public SolvedCase {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(combination, "combination");
        Objects.requireNonNull(solution, "solution");
    }
}
