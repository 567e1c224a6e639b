package tetrapod.size;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import tetrapod.model.Section;

/**
 * Detects that sizing goes round in circles and breaks the circle toward the heavier sections.
 * The designs analysed so far, in order, end with the one just analysed; when the next design is
 * one analysed before that, the designs from it to the last form a cycle. Each group is then
 * given a floor: the heaviest section (by mass per metre) it had in the cycle, and no lighter than
 * its floor so far. Floors only rise, and a cycle of different designs raises at least one, so
 * with a finite list of sections the cycles end.
 */
final class Cycles {

    private Cycles() { }

    /**
     * @param analysed the designs analysed, oldest first, the last being the one just analysed (input)
     * @param next     the design chosen from the last analysis (input)
     * @param floors   the floors so far (input, not modified)
     * @return the raised floors when {@code next} closes a cycle; empty when it does not (including
     *         when it equals the last design: that is convergence, not a cycle)
     */
    static Optional<Map<SizingGroup, Section>> raisedFloors(List<Map<SizingGroup, Section>> analysed,
                                                            Map<SizingGroup, Section> next,
                                                            Map<SizingGroup, Section> floors) {
        int last = analysed.size() - 1;
        if (last < 0 || next.equals(analysed.get(last))) {
            return Optional.empty();
        }
        int start = analysed.subList(0, last).indexOf(next);
        if (start < 0) {
            return Optional.empty();
        }
        Map<SizingGroup, Section> raised = new TreeMap<>(floors);
        for (Map<SizingGroup, Section> design : analysed.subList(start, analysed.size())) {
            design.forEach((g, s) -> raised.merge(g, s, (a, b) -> b.massPerMetre() > a.massPerMetre() ? b : a));
        }
        return Optional.of(raised);
    }
}
