package tetrapod.size;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import tetrapod.model.spec.TowerSpec;

/**
 * What a sizing run found.
 *
 * @param outcome     how it ended
 * @param sized       the sized spec (only sections changed), or null when no design passes
 * @param target      the utilisation every member was kept at or below
 * @param groups      every group before and after, in group order
 * @param massBefore  bare steel mass of the first design analysed, kg
 * @param massAfter   bare steel mass of the sized design, kg (NaN-free: 0 when there is none)
 * @param history     every design analysed, in order
 * @param shortfalls  the groups no allowed section carries (empty unless {@link Outcome#INFEASIBLE})
 * @param connectionAllowance fraction added to the bare mass for connections
 */
public record SizingResult(Outcome outcome, TowerSpec sized, double target, List<GroupResult> groups,
                           double massBefore, double massAfter, List<Iteration> history, List<Shortfall> shortfalls,
                           double connectionAllowance) {

    public SizingResult {
        Objects.requireNonNull(outcome, "outcome");
        groups = List.copyOf(groups);
        history = List.copyOf(history);
        shortfalls = List.copyOf(shortfalls);
        if (outcome == Outcome.INFEASIBLE && sized != null) {
            throw new IllegalArgumentException("an infeasible sizing has no design");
        }
    }

    public Optional<TowerSpec> sizedSpec() {
        return Optional.ofNullable(sized);
    }

    /** The largest utilisation of the sized design (0 without one). */
    public double maxUtilisationAfter() {
        return groups.stream().filter(g -> g.after() != null).mapToDouble(g -> g.after().utilisation()).max().orElse(0);
    }
}
