package tetrapod.analysis;

import java.util.Objects;
import tetrapod.solve.Solution;

/**
 * One load case as solved: its id, the combination it belongs to, its wind azimuth (null for no
 * wind) and the solver's answer (which holds the load vector that was solved).
 */
public record SolvedCase(String id, String combination, Double azimuthDeg, Solution solution) {
    public SolvedCase {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(combination, "combination");
        Objects.requireNonNull(solution, "solution");
    }
}
