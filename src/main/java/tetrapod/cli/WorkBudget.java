package tetrapod.cli;

import java.util.Locale;
import tetrapod.common.BadInputException;
import tetrapod.generate.Tower;
import tetrapod.load.TowerLoads;

/**
 * What one run may be asked to compute, checked by {@code validate} and {@code analyze} alike
 * once the tower is built, so that a model that would exhaust the memory or run for hours is
 * refused in a second with exit 2 instead (issue 13). The model file's own ranges are in
 * {@code io.PhysicalLimits}; these two depend on the built tower.
 */
final class WorkBudget {

    /**
     * Nodes of the built tower: 30,000 nodes are 180,000 degrees of freedom, whose factor and
     * basis responses fit the default heap of a 24 GB machine (docs/performance.md measures 56k DOF).
     */
    static final int MAX_NODES = 30_000;
    /**
     * Members × load cases of the sweep, each checked once: 5·10⁷, about five minutes at the
     * check rate measured on the bundled examples (about 6 µs a member and case on 2 cores;
     * issue 15 records the measurement). Beyond it the user is asked for a coarser sweep step.
     */
    static final long MAX_MEMBER_CASES = 50_000_000L;

    private WorkBudget() { }

    static void check(Tower tower, TowerLoads loads) throws BadInputException {
        int nodes = tower.frame().nodes().size();
        if (nodes > MAX_NODES) {
            throw BadInputException.at(tower.isGenerated() ? "segments" : "frame.nodes",
                    String.format(Locale.ROOT, "the tower has %,d nodes; at most %,d can be analysed (use fewer panels or"
                            + " redundants)", nodes, MAX_NODES));
        }
        long members = tower.frame().members().size();
        long cases = loads.caseKeys().size();
        if (members * cases > MAX_MEMBER_CASES) {
            throw BadInputException.at("loads.sweepStep", String.format(Locale.ROOT,
                    "%,d members × %,d load cases (sweep step %s°) are %.1e member checks; at most %.0e are done in one"
                            + " run: give a coarser sweepStep", members, cases, stepText(loads.sweepStep()),
                    (double) (members * cases), (double) MAX_MEMBER_CASES));
        }
    }

    private static String stepText(double step) {
        return step == Math.rint(step) ? String.valueOf((long) step) : String.valueOf(step);
    }
}
