package tetrapod.solve;

import java.util.List;
import java.util.Locale;
import tetrapod.common.UnstableStructureException;
import tetrapod.common.UnstableStructureException.FreeDof;

/**
 * The rule that every load reaches the supports. An auto-restraint ({@link StabilityInspector})
 * may only hold a direction that carries no load: where a load has a component along it, the
 * lattice model cannot carry that load, and a result would show it vanished into the ground of
 * the model with a perfect equilibrium figure. Such a case is refused as an unstable structure,
 * naming the node, the direction, the force, the case and what would carry it.
 */
public final class LoadPath {

    /** Largest force an auto-restraint may carry, as a fraction of the case's total load (issue 11). */
    public static final double LOST_LOAD_RATIO = 1e-6;

    private LoadPath() { }

    /**
     * The size of a load vector: Σ|F| over the force components of every node plus Σ|M|/L over
     * its moment components, N, with L the structure size in m.
     *
     * @param applied nodes × 6 components (Fx, Fy, Fz, Mx, My, Mz), tower axes (input)
     */
    static double totalLoad(double[] applied, double size) {
        double total = 0;
        for (int k = 0; k < applied.length; k++) {
            total += k % 6 < 3 ? Math.abs(applied[k]) : Math.abs(applied[k]) / size;
        }
        return total;
    }

    /**
     * Refuses a case whose auto-restraints carry more than {@link #LOST_LOAD_RATIO} of its total
     * load (a moment restraint against the total load × the structure size).
     *
     * @param forces    per auto-restraint of {@code model}, in its order, the force (N) or moment
     *                  (N·m) it exerts along its direction (input; entries beyond are ignored)
     * @param totalLoad the case's {@link #totalLoad}, N
     * @throws UnstableStructureException for the restraint carrying the most, relative to its limit
     */
    public static void requireCarried(StructuralModel model, String caseName, double[] forces, double totalLoad)
            throws UnstableStructureException {
        int worst = worst(model, forces, totalLoad);
        if (worst >= 0) {
            AutoRestraint r = model.autoRestraints().get(worst);
            throw new UnstableStructureException(message(r, caseName, forces[worst], totalLoad, model.size()),
                    List.of(new FreeDof(r.node(), r.dof())));
        }
    }

    /**
     * The auto-restraint whose force most exceeds its limit, or −1 when none exceeds it. A
     * non-finite force always exceeds it.
     */
    static int worst(StructuralModel model, double[] forces, double totalLoad) {
        List<AutoRestraint> autos = model.autoRestraints();
        int worst = -1;
        double worstRatio = 1;
        for (int a = 0; a < autos.size(); a++) {
            double limit = LOST_LOAD_RATIO * totalLoad * (autos.get(a).isRotation() ? model.size() : 1);
            double ratio = Math.abs(forces[a]) / limit;
            if (!(ratio <= worstRatio)) {
                worst = a;
                worstRatio = Double.isNaN(ratio) ? Double.POSITIVE_INFINITY : ratio;
            }
        }
        return worst;
    }

    private static String message(AutoRestraint r, String caseName, double force, double totalLoad, double size) {
        boolean moment = r.isRotation();
        String amount = String.format(Locale.ROOT, moment ? "%.4g kN·m of moment" : "%.4g kN of load",
                Math.abs(force) / 1e3);
        String along = r.isSkew()
                ? String.format(Locale.ROOT, "%s (%.3f, %.3f, %.3f)", moment ? "about" : "along",
                        r.direction().x(), r.direction().y(), r.direction().z())
                : (moment ? "about " : "along ") + r.dof();
        return String.format(Locale.ROOT, "unstable structure: in case '%s', %s at node %d acts %s, a direction "
                        + "nothing can carry (%s); it would vanish into an automatic restraint (more than %.0e of the "
                        + "case's total load, %.4g kN); %s",
                caseName, amount, r.node(), along, r.reason(), LOST_LOAD_RATIO, totalLoad / 1e3, fix(r));
    }

    /** What would carry the load, by the reason the direction is free. */
    private static String fix(AutoRestraint r) {
        return switch (r.reason()) {
            case StabilityInspector.PLANE_REASON, StabilityInspector.LINE_REASON ->
                    "brace the node in that direction (horizontals at its level, plan bracing) or use the "
                            + "continuous-legs idealisation, whose legs carry it by bending";
            case StabilityInspector.PIN_REASON ->
                    "apply moments only where a beam-column reaches, or make a member at the node continuous";
            default -> "hold the rotation about the leg's axis at a support (fixed supports) or apply no torque "
                    + "about that axis";
        };
    }
}
